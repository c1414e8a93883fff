/**
 * Whether a request reached Backplate over HTTPS, which decides whether next-auth's cookies carry `Secure` (and the
 * `__Secure-` / `__Host-` name prefixes). Pure, so a unit test can read it without a server.
 *
 * Two signals: NEXTAUTH_URL is the app's public https:// address, or the proxy that ends TLS in front of the app
 * says so in X-Forwarded-Proto. Trusting the header is safe here: a client that fakes it over plain HTTP only gets
 * cookies its browser will not send back over HTTP, which locks itself out and nobody else.
 */
export function servedOverHttps(forwardedProto: string | null | undefined, appUrl: string | undefined): boolean {
  if (appUrl?.toLowerCase().startsWith("https://")) return true;
  // A chain of proxies lists one value each, nearest the client first.
  const first = forwardedProto?.split(",")[0]?.trim().toLowerCase();
  return first === "https";
}
