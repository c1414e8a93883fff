/**
 * The session-cookie reader that replaces getServerSession on every request must read exactly what next-auth
 * writes: its own encode() (next-auth/jwt, the library's reference implementation) makes the cookies here.
 */
import { encode } from "next-auth/jwt";
import { describe, expect, it } from "vitest";
import { decodeSessionCookie, joinCookieChunks } from "@/app/_server/session-cookie";

const SECRET = "unit-test-secret-not-for-production";

describe("decodeSessionCookie", () => {
  it("reads a cookie next-auth encoded, twice the same (the second from the cache)", async () => {
    const cookie = await encode({ token: { sub: "u-1", name: "Ada Example", email: "ada@example.test" }, secret: SECRET });
    const first = await decodeSessionCookie(cookie, SECRET);
    expect(first).toMatchObject({ sub: "u-1", name: "Ada Example", email: "ada@example.test" });
    expect(await decodeSessionCookie(cookie, SECRET)).toEqual(first);
  });

  it("refuses a cookie made with another secret, or altered", async () => {
    const cookie = await encode({ token: { sub: "u-2" }, secret: "another-secret" });
    expect(await decodeSessionCookie(cookie, SECRET)).toBeNull();
    const ours = await encode({ token: { sub: "u-3" }, secret: SECRET });
    const altered = `${ours.slice(0, -6)}${ours.slice(-6) === "AAAAAA" ? "BBBBBB" : "AAAAAA"}`;
    expect(await decodeSessionCookie(altered, SECRET)).toBeNull();
    expect(await decodeSessionCookie("not a token", SECRET)).toBeNull();
  });

  it("refuses an expired cookie, also once it is cached", async () => {
    // maxAge in seconds; next-auth allows 15 s of clock skew, so -60 s is expired outright
    const expired = await encode({ token: { sub: "u-4" }, secret: SECRET, maxAge: -60 });
    expect(await decodeSessionCookie(expired, SECRET)).toBeNull();
    const realNow = Date.now;
    const cookie = await encode({ token: { sub: "u-5" }, secret: SECRET, maxAge: 60 });
    expect(await decodeSessionCookie(cookie, SECRET)).toMatchObject({ sub: "u-5" });
    try {
      Date.now = () => realNow() + 120_000;
      expect(await decodeSessionCookie(cookie, SECRET)).toBeNull();
    } finally {
      Date.now = realNow;
    }
  });
});

describe("joinCookieChunks", () => {
  it("prefers the whole cookie, else joins next-auth's numbered chunks in index order", () => {
    const name = "next-auth.session-token";
    expect(joinCookieChunks(name, [{ name, value: "whole" }, { name: `${name}.0`, value: "x" }])).toBe("whole");
    const chunks = [
      { name: `${name}.10`, value: "k" },
      { name: `${name}.1`, value: "b" },
      { name: `${name}.0`, value: "a" },
      { name: `${name}.2`, value: "c" },
      { name: `${name}.extra`, value: "ignored" },
    ];
    expect(joinCookieChunks(name, chunks)).toBe("abck");
    expect(joinCookieChunks(name, [{ name: "other", value: "v" }])).toBeNull();
  });
});
