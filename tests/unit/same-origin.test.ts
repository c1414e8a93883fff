/**
 * The API's cross-site request check, against the OWASP CSRF prevention cheat sheet's "verifying origin with
 * standard headers" (Origin must equal the target origin) and W3C Fetch Metadata (Sec-Fetch-Site: same-origin).
 */
import { describe, expect, it } from "vitest";
import { needsSameOriginCheck, ownOrigins, sameOriginProblem } from "@/app/_server/same-origin";

const origins = ownOrigins(new Headers({ host: "127.0.0.1:3000" }), "http://127.0.0.1:3000/api/x", "https://bench.larkfield.example");

describe("which requests are checked", () => {
  it("checks state changes to our API and leaves reads and next-auth's own routes alone", () => {
    for (const method of ["POST", "PUT", "PATCH", "DELETE", "post"]) expect(needsSameOriginCheck(method, "/api/workspaces")).toBe(true);
    for (const method of ["GET", "HEAD", "OPTIONS"]) expect(needsSameOriginCheck(method, "/api/workspaces")).toBe(false);
    expect(needsSameOriginCheck("POST", "/api/auth/callback/password")).toBe(false);
    expect(needsSameOriginCheck("POST", "/sign-in")).toBe(false);
  });
});

describe("the app's own origins", () => {
  it("are the public address and the address the request came to, forwarded by a proxy or not", () => {
    expect([...origins].sort()).toEqual(["http://127.0.0.1:3000", "https://bench.larkfield.example"]);
    const proxied = ownOrigins(new Headers({ host: "10.0.0.5:3000", "x-forwarded-host": "bench.larkfield.example", "x-forwarded-proto": "https" }), "http://10.0.0.5:3000/", undefined);
    expect([...proxied]).toEqual(["https://bench.larkfield.example"]);
  });
});

describe("the verdict", () => {
  it("lets our origin and same-origin fetch metadata through", () => {
    expect(sameOriginProblem(new Headers({ origin: "http://127.0.0.1:3000" }), origins)).toBeNull();
    expect(sameOriginProblem(new Headers({ origin: "https://bench.larkfield.example" }), origins)).toBeNull();
    expect(sameOriginProblem(new Headers({ "sec-fetch-site": "same-origin" }), origins)).toBeNull();
  });

  it("refuses another site, a look-alike, 'null' and a missing Origin, saying what to send", () => {
    expect(sameOriginProblem(new Headers({ origin: "https://evil.example" }), origins)).toMatch(/another site \(https:\/\/evil\.example\)/);
    expect(sameOriginProblem(new Headers({ origin: "https://bench.larkfield.example.evil.example" }), origins)).toMatch(/another site/);
    expect(sameOriginProblem(new Headers({ origin: "http://127.0.0.1:3001" }), origins)).toMatch(/another site/);
    expect(sameOriginProblem(new Headers({ origin: "null" }), origins)).toMatch(/another site/);
    // an Origin from elsewhere wins over a same-origin claim
    expect(sameOriginProblem(new Headers({ origin: "https://evil.example", "sec-fetch-site": "same-origin" }), origins)).toMatch(/another site/);
    expect(sameOriginProblem(new Headers({ "sec-fetch-site": "same-site" }), origins)).toMatch(/no Origin header\. Send Origin set to/);
    expect(sameOriginProblem(new Headers(), origins)).toMatch(/no Origin header/);
  });
});
