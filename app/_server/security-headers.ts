/**
 * The response headers that keep Backplate's pages from being framed, sniffed or made to run foreign script.
 * Pure (no Next imports) so proxy.ts and the unit tests read one definition; the headers every response carries
 * (nosniff, Referrer-Policy, Permissions-Policy) are listed in next.config.mjs.
 */

/**
 * The page policy. Scripts: only those carrying this request's nonce, and what they load ('strict-dynamic'), which
 * covers Next's inline bootstrap, its chunks and Plotly/React Flow loaded as chunks. Styles: 'unsafe-inline',
 * because React Flow positions nodes with style attributes and Plotly writes <style> rules and style attributes at
 * run time — neither can carry a nonce. Workers: the bench solver is a module worker from /_next/static ('self');
 * blob: for libraries that spin a worker from a blob.
 */
export function contentSecurityPolicy(nonce: string): string {
  return [
    "default-src 'self'",
    // No 'unsafe-eval': the bench's plots are SVG traces, and Plotly's run-time code paths (WebGL trace compilers,
    // map workers, a `new Function` fallback behind globalThis) are never reached, and zod is kept from probing for
    // eval in the browser (components/zod-browser-config.ts) — tests/app/security.test.ts
    // draws the bench in Chromium under this policy and fails on any violation report or console error.
    `script-src 'self' 'nonce-${nonce}' 'strict-dynamic'`,
    "style-src 'self' 'unsafe-inline'",
    "img-src 'self' data: blob:",
    "font-src 'self'",
    "connect-src 'self'",
    "worker-src 'self' blob:",
    "frame-ancestors 'none'",
    "object-src 'none'",
    "base-uri 'self'",
    "form-action 'self'",
  ].join("; ");
}

/** A random nonce per request: 16 bytes, base64 (CSP wants base64 and at least 128 bits). */
export function newNonce(): string {
  const bytes = new Uint8Array(16);
  crypto.getRandomValues(bytes);
  return btoa(String.fromCharCode(...bytes));
}
