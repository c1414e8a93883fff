/**
 * What the sign-in page says for next-auth's error codes (they arrive as ?error=… after a redirect or as the result
 * of signIn()). A message thrown by authorize() (the rate limit) arrives as itself and is shown as it is.
 */
const MESSAGES: Record<string, string> = {
  CredentialsSignin: "That e-mail and password do not match an account. Check both, or reset your password.",
  UnknownEmail: "No Backplate account uses that e-mail address. Create an account first, or check the spelling.",
  Verification: "That sign-in link has expired or was used already. Ask for a new link below.",
  EmailSignin: "The sign-in link could not be sent. Check the address and try again in a moment.",
  AccessDenied: "That account may not sign in this way.",
  SessionRequired: "Sign in to open that page.",
};

export function signInErrorMessage(code: string | null | undefined): string | null {
  if (!code) return null;
  return MESSAGES[code] ?? (code.length > 20 ? code : "Sign-in failed. Try again in a moment.");
}

/** Where to go after signing in: a same-site path only (never an outside address). */
export function safeCallbackPath(raw: string | null | undefined, fallback = "/workspaces?open=first"): string {
  if (!raw) return fallback;
  try {
    const url = new URL(raw, "http://backplate.local");
    if (url.origin !== "http://backplate.local" && typeof window !== "undefined" && url.origin !== window.location.origin) {
      return fallback;
    }
    const path = `${url.pathname}${url.search}${url.hash}`;
    return path.startsWith("/sign-in") ? fallback : path;
  } catch {
    return fallback;
  }
}
