/**
 * Cross-site request forgery guard for the API: a state-changing request must show that it came from one of
 * Backplate's own pages — an Origin header equal to the app's origin, or (browsers that omit Origin) Sec-Fetch-Site:
 * same-origin. A form or script on another site cannot forge either. Pure (no Next imports) for proxy.ts and tests.
 */

const SAFE_METHODS = new Set(["GET", "HEAD", "OPTIONS"]);

/** next-auth's own routes check their own double-submit CSRF token (GET /api/auth/csrf). */
const OWN_CSRF_PREFIX = "/api/auth/";

export function needsSameOriginCheck(method: string, pathname: string): boolean {
  return !SAFE_METHODS.has(method.toUpperCase()) && pathname.startsWith("/api/") && !pathname.startsWith(OWN_CSRF_PREFIX);
}

/** The origins the app answers as: the public address (NEXTAUTH_URL) and the address this request was sent to. */
export function ownOrigins(headers: Headers, requestUrl: string, publicUrl: string | undefined): Set<string> {
  const origins = new Set<string>();
  if (publicUrl) {
    try {
      origins.add(new URL(publicUrl).origin);
    } catch {
      // a malformed NEXTAUTH_URL is reported where mail links are made; the request's own origin still counts
    }
  }
  const url = new URL(requestUrl);
  const host = headers.get("x-forwarded-host") ?? headers.get("host") ?? url.host;
  const proto = (headers.get("x-forwarded-proto") ?? url.protocol.replace(":", "")).split(",")[0].trim();
  origins.add(`${proto}://${host}`);
  return origins;
}

/** Null when the request may go on, else the message of the 403. */
export function sameOriginProblem(headers: Headers, origins: Set<string>): string | null {
  const origin = headers.get("origin");
  if (origin) {
    if (origins.has(origin)) return null;
    return `This request came from another site (${origin}). Changes to Backplate can only be made from Backplate's own pages.`;
  }
  if (headers.get("sec-fetch-site") === "same-origin") return null;
  return "This request has no Origin header. Send Origin set to Backplate's address (for example Origin: " +
    `${[...origins][0]}) with every POST, PUT, PATCH or DELETE to the API.`;
}
