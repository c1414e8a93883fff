import { randomUUID } from "node:crypto";
import { describe, expect, inject, it } from "vitest";
import { DEMO_PEOPLE } from "../../db/demo-people";
import { originHeader, signInWithPassword } from "./http-session";
import { linkIn, mailTo, NEW_PASSWORD, signUp } from "./people";

const baseUrl = inject("baseUrl");

async function post(path: string, body: unknown, method = "POST") {
  return fetch(`${baseUrl}${path}`, { method, headers: { "content-type": "application/json", ...originHeader(baseUrl) }, body: JSON.stringify(body) });
}

/** Asks next-auth's e-mail provider for a link as a browser would (CSRF token and cookie first). */
async function requestEmailLink(email: string) {
  const csrf = await fetch(`${baseUrl}/api/auth/csrf`);
  const cookie = csrf.headers.getSetCookie().map((c) => c.split(";")[0]).join("; ");
  const { csrfToken } = await csrf.json();
  const response = await fetch(`${baseUrl}/api/auth/signin/email`, {
    method: "POST",
    headers: { "content-type": "application/x-www-form-urlencoded", cookie },
    body: new URLSearchParams({ csrfToken, email, callbackUrl: `${baseUrl}/workspaces`, json: "true" }),
    redirect: "manual",
  });
  return (await response.json()) as { url: string };
}

describe("sign-up", () => {
  it("creates an account that can sign in, and refuses the same address again", async () => {
    const person = await signUp(baseUrl, "newcomer");
    const me = await (await person.session.fetch("/api/account")).json();
    expect(me.user).toMatchObject({ email: person.email, name: person.name });
    const again = await post("/api/account/sign-up", { name: "Someone", email: person.email.toUpperCase(), password: NEW_PASSWORD });
    expect(again.status).toBe(409);
    expect((await again.json()).error.fields.email).toMatch(/already uses this e-mail/);
  });

  it("says what to fix for a short password, a bad address and no name", async () => {
    const response = await post("/api/account/sign-up", { name: " ", email: "nobody-at-example", password: "short" });
    expect(response.status).toBe(422);
    const { error } = await response.json();
    expect(error.fields).toMatchObject({
      name: "Enter your name.",
      email: expect.stringMatching(/e-mail address like/),
      password: "Use at least 10 characters.",
    });
  });
});

describe("sign-in links by e-mail through the SMTP fake", () => {
  it("mails a link to an existing account that signs in once", async () => {
    const person = await signUp(baseUrl, "linker");
    const answer = await requestEmailLink(person.email);
    expect(new URL(answer.url).searchParams.get("error")).toBeNull();
    const mail = await mailTo(baseUrl, person.email, /sign-in link/);
    const link = linkIn(mail.text, "/api/auth/callback/email");
    const followed = await fetch(link, { redirect: "manual" });
    expect(followed.status).toBe(302);
    const cookie = followed.headers.getSetCookie().map((c) => c.split(";")[0]).join("; ");
    expect(cookie).toMatch(/next-auth\.session-token=/);
    const session = await (await fetch(`${baseUrl}/api/auth/session`, { headers: { cookie } })).json();
    expect(session.user.email).toBe(person.email);
    // The link is used up.
    const second = await fetch(link, { redirect: "manual" });
    expect(second.headers.get("location")).toMatch(/error=Verification/);
  });

  it("refuses an address without an account and sends nothing", async () => {
    const email = `nobody-${randomUUID().slice(0, 6)}@people.example`;
    const answer = await requestEmailLink(email);
    expect(new URL(answer.url).searchParams.get("error")).toBe("UnknownEmail");
    await expect(mailTo(baseUrl, email, undefined, 800)).rejects.toThrow(/no mail/);
  });
});

describe("password reset and account settings", () => {
  it("resets a password by mail; the old one stops working; the link works once", async () => {
    const person = await signUp(baseUrl, "resetter");
    const asked = await post("/api/account/password-reset", { email: person.email });
    expect(asked.status).toBe(202);
    const mail = await mailTo(baseUrl, person.email, /Reset your Backplate password/);
    const token = linkIn(mail.text, "/reset-password/").split("/reset-password/")[1];
    const done = await post("/api/account/password-reset", { token, password: "brand-new-password-9" }, "PUT");
    expect(done.status).toBe(200);
    expect((await signInWithPassword(baseUrl, person.email, NEW_PASSWORD, "192.0.2.50")).ok).toBe(false);
    expect((await signInWithPassword(baseUrl, person.email, "brand-new-password-9")).ok).toBe(true);
    const again = await post("/api/account/password-reset", { token, password: "another-password-10" }, "PUT");
    expect(again.status).toBe(410);
    const unknown = await post("/api/account/password-reset", { token: "B".repeat(43), password: "another-password-10" }, "PUT");
    expect(unknown.status).toBe(404);
    // An unknown address gets the same answer and no mail.
    const stranger = `nobody-${randomUUID().slice(0, 6)}@people.example`;
    expect((await post("/api/account/password-reset", { email: stranger })).status).toBe(202);
  });

  it("changes the name, and the password only with the right current one", async () => {
    const person = await signUp(baseUrl, "renamer");
    const renamed = await person.session.fetch("/api/account", { method: "PATCH", body: { name: "Wren Halloway" } });
    expect((await renamed.json()).user.name).toBe("Wren Halloway");
    const wrong = await person.session.fetch("/api/account", { method: "PATCH", body: { currentPassword: "not-it-at-all", newPassword: "changed-password-1" } });
    expect(wrong.status).toBe(422);
    expect((await wrong.json()).error.fields.currentPassword).toMatch(/not your current password/);
    expect((await signInWithPassword(baseUrl, person.email, NEW_PASSWORD)).ok).toBe(true);
    const right = await person.session.fetch("/api/account", { method: "PATCH", body: { currentPassword: NEW_PASSWORD, newPassword: "changed-password-1" } });
    expect(right.status).toBe(200);
    expect((await signInWithPassword(baseUrl, person.email, "changed-password-1")).ok).toBe(true);
  });
});

describe("rate limit on wrong passwords", () => {
  it("after five wrong passwords for an e-mail even the right one is refused with a clear message", async () => {
    const person = await signUp(baseUrl, "guessed");
    for (let i = 0; i < 5; i++) {
      const attempt = await signInWithPassword(baseUrl, person.email, `wrong-guess-${i}`, `203.0.113.${10 + i}`);
      expect(attempt.error).toBe("CredentialsSignin");
    }
    const blocked = await signInWithPassword(baseUrl, person.email, NEW_PASSWORD, "203.0.113.99");
    expect(blocked.ok).toBe(false);
    expect(blocked.error).toMatch(/Too many wrong passwords/);
    // Another person from another address is not affected.
    expect((await signInWithPassword(baseUrl, DEMO_PEOPLE[4].email, "bench-demo-2026", "203.0.113.120")).ok).toBe(true);
  });

  it("a client address that keeps guessing across e-mails is refused too", async () => {
    const address = `198.51.100.${Math.floor(Math.random() * 200) + 20}`;
    for (let i = 0; i < 20; i++) await signInWithPassword(baseUrl, `guess-${i}-${randomUUID().slice(0, 4)}@people.example`, "whatever-it-is", address);
    const person = await signUp(baseUrl, "sharedoffice");
    const blocked = await signInWithPassword(baseUrl, person.email, NEW_PASSWORD, address);
    expect(blocked.error).toMatch(/Too many wrong passwords/);
  });
});
