/**
 * When the sign-in cookies carry `Secure`: whenever the person reaches the app over HTTPS (RFC 6265bis §4.1.2.5 —
 * a Secure cookie is sent only over secure channels; the __Secure-/__Host- prefixes of §4.1.3 require it), told by
 * an https NEXTAUTH_URL or by X-Forwarded-Proto from a TLS-ending proxy (the de-facto header, MDN). The cookie
 * attributes themselves are next-auth's own defaults, read from the library rather than restated.
 */
import { describe, expect, it } from "vitest";
import { servedOverHttps } from "@/app/_server/secure-cookies";
// next-auth v4 keeps its cookie defaults in core/lib/cookie (not in its exports map, so reached by path).
import { defaultCookies } from "../../node_modules/next-auth/core/lib/cookie.js";

describe("served over HTTPS", () => {
  it("follows an https NEXTAUTH_URL whatever the request says", () => {
    expect(servedOverHttps(null, "https://bench.larkfield.example")).toBe(true);
    expect(servedOverHttps("http", "HTTPS://bench.larkfield.example")).toBe(true);
  });

  it("follows X-Forwarded-Proto when NEXTAUTH_URL is plain http, nearest proxy's value first", () => {
    expect(servedOverHttps("https", "http://127.0.0.1:3000")).toBe(true);
    expect(servedOverHttps("HTTPS, http", "http://127.0.0.1:3000")).toBe(true);
    expect(servedOverHttps("http, https", "http://127.0.0.1:3000")).toBe(false);
    expect(servedOverHttps(null, "http://127.0.0.1:3000")).toBe(false);
    expect(servedOverHttps(undefined, undefined)).toBe(false);
    expect(servedOverHttps("", undefined)).toBe(false);
  });
});

describe("the cookies next-auth sets with that answer", () => {
  it("are HttpOnly and SameSite=Lax always, and Secure with the __Secure-/__Host- names only over HTTPS", () => {
    const secure = defaultCookies(servedOverHttps("https", "http://127.0.0.1:3000"));
    expect(secure.sessionToken).toMatchObject({ name: "__Secure-next-auth.session-token", options: { httpOnly: true, sameSite: "lax", secure: true, path: "/" } });
    expect(secure.csrfToken).toMatchObject({ name: "__Host-next-auth.csrf-token", options: { httpOnly: true, sameSite: "lax", secure: true } });
    const plain = defaultCookies(servedOverHttps(null, "http://127.0.0.1:3000"));
    expect(plain.sessionToken).toMatchObject({ name: "next-auth.session-token", options: { httpOnly: true, sameSite: "lax", secure: false } });
  });
});
