import { describe, expect, it } from "vitest";
import { safeCallbackPath, signInErrorMessage } from "../../components/account/sign-in-messages";
import { decodeEncodedWords, decodeQuotedPrintable, parseMail } from "../../scripts/lib/mime-lite";

describe("the mail fake's MIME reading", () => {
  it("undoes quoted-printable soft breaks and =XX escapes (RFC 2045 §6.7)", () => {
    expect(decodeQuotedPrintable("https://app.test/x?token=3Dab=\r\ncd&email=3Da%40b")).toBe("https://app.test/x?token=abcd&email=a%40b");
    // UTF-8 bytes escaped one by one come back as one character (é is C3 A9).
    expect(decodeQuotedPrintable("caf=C3=A9")).toBe("café");
  });

  it("decodes RFC 2047 encoded words in a subject", () => {
    expect(decodeEncodedWords("=?UTF-8?Q?Join_Quillfeather_=E2=80=94_now?=")).toBe("Join Quillfeather — now");
    expect(decodeEncodedWords("=?UTF-8?B?SGVsbG8=?=")).toBe("Hello");
  });

  it("takes the text and html parts of a multipart/alternative message", () => {
    const raw = [
      "From: Backplate <bench@backplate.example>",
      "Subject: Sign in",
      'Content-Type: multipart/alternative; boundary="--b1"',
      "",
      "----b1",
      "Content-Type: text/plain; charset=utf-8",
      "Content-Transfer-Encoding: quoted-printable",
      "",
      "Open https://app.test/a?b=3Dc",
      "----b1",
      "Content-Type: text/html; charset=utf-8",
      "Content-Transfer-Encoding: base64",
      "",
      Buffer.from("<p>Open</p>").toString("base64"),
      "----b1--",
      "",
    ].join("\r\n");
    const mail = parseMail(raw, ["x@people.example"], new Date("2026-01-02T03:04:05Z"));
    expect(mail).toEqual({
      to: ["x@people.example"],
      from: "Backplate <bench@backplate.example>",
      subject: "Sign in",
      text: "Open https://app.test/a?b=c",
      html: "<p>Open</p>",
      date: "2026-01-02T03:04:05.000Z",
    });
  });
});

describe("sign-in page helpers", () => {
  it("keeps only same-site paths as the place to go after signing in", () => {
    expect(safeCallbackPath("/w/larkfield/members")).toBe("/w/larkfield/members");
    expect(safeCallbackPath("https://elsewhere.example/steal?x=1")).toBe("/steal?x=1");
    expect(safeCallbackPath("/sign-in?callbackUrl=/x")).toBe("/workspaces?open=first");
    expect(safeCallbackPath(undefined)).toBe("/workspaces?open=first");
  });

  it("explains next-auth's codes and passes the rate-limit message through", () => {
    expect(signInErrorMessage("CredentialsSignin")).toMatch(/do not match/);
    expect(signInErrorMessage("Too many wrong passwords. Wait 15 minutes and try again.")).toMatch(/Too many/);
    expect(signInErrorMessage(null)).toBeNull();
  });
});
