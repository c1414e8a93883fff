/** Headers of every response (pages, API, static files); the page CSP is added per request in proxy.ts. */
export const securityHeaders = [
  { key: "X-Content-Type-Options", value: "nosniff" },
  { key: "Referrer-Policy", value: "strict-origin-when-cross-origin" },
  { key: "Permissions-Policy", value: "camera=(), microphone=(), geolocation=(), payment=(), usb=(), interest-cohort=()" },
  { key: "X-Frame-Options", value: "DENY" },
];

/** @type {import('next').NextConfig} */
const nextConfig = {
  reactStrictMode: true,
  poweredByHeader: false,
  // The browser tests build into their own folder so a running `npm start` keeps its build.
  distDir: process.env.BACKPLATE_DIST_DIR || ".next",
  experimental: {
    // proxy.ts sees every request, and Next hands a route at most this much of a body that went through it (10 MB
    // by default), silently cut. Above the largest upload (attachments: 20 MB + the form around it), so a file over
    // the limit reaches read-upload.ts whole enough to be refused as too large (413), never as a broken form.
    proxyClientMaxBodySize: "24mb",
  },
  // pg is a Node library with optional native bindings: keep it out of the server bundle.
  serverExternalPackages: ["pg"],
  // Every response, static files included; the page policy (CSP, with a nonce) is set per request in proxy.ts.
  async headers() {
    return [{ source: "/:path*", headers: securityHeaders }];
  },
};

export default nextConfig;
