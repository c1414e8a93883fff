/**
 * Signs in over HTTP through next-auth's real endpoints (GET /api/auth/csrf, POST /api/auth/callback/password) and
 * keeps the cookies, so app tests can call the API as a given person.
 */
export interface HttpSession {
  cookie: string;
  fetch(path: string, init?: { method?: string; body?: unknown; headers?: Record<string, string> }): Promise<Response>;
}

/** The Origin a page of the app would send; the API refuses state changes without it (proxy.ts). */
export function originHeader(baseUrl: string): { origin: string } {
  return { origin: new URL(baseUrl).origin };
}

function mergeCookies(jar: Map<string, string>, response: Response) {
  for (const line of response.headers.getSetCookie()) {
    const [pair] = line.split(";");
    const eq = pair.indexOf("=");
    jar.set(pair.slice(0, eq).trim(), pair.slice(eq + 1));
  }
}

function cookieHeader(jar: Map<string, string>): string {
  return [...jar].map(([k, v]) => `${k}=${v}`).join("; ");
}

export function sessionFromJar(baseUrl: string, jar: Map<string, string>): HttpSession {
  return {
    get cookie() {
      return cookieHeader(jar);
    },
    fetch(path, init = {}) {
      return fetch(`${baseUrl}${path}`, {
        method: init.method ?? "GET",
        headers: {
          cookie: cookieHeader(jar),
          ...originHeader(baseUrl),
          ...(init.body === undefined ? {} : { "content-type": "application/json" }),
          ...init.headers,
        },
        body: init.body === undefined ? undefined : typeof init.body === "string" ? init.body : JSON.stringify(init.body),
        redirect: "manual",
      });
    },
  };
}

export interface SignInResult {
  ok: boolean;
  /** next-auth's error code or message from the redirect, when sign-in failed */
  error: string | null;
  session: HttpSession;
}

/** Signs in with a password. `address` sets X-Forwarded-For, so rate-limit tests do not share 127.0.0.1's counter. */
export async function signInWithPassword(
  baseUrl: string,
  email: string,
  password: string,
  address?: string,
): Promise<SignInResult> {
  const jar = new Map<string, string>();
  const extra: Record<string, string> = address ? { "x-forwarded-for": address } : {};
  const csrfResponse = await fetch(`${baseUrl}/api/auth/csrf`, { headers: extra });
  mergeCookies(jar, csrfResponse);
  const { csrfToken } = (await csrfResponse.json()) as { csrfToken: string };
  const response = await fetch(`${baseUrl}/api/auth/callback/password`, {
    method: "POST",
    headers: { "content-type": "application/x-www-form-urlencoded", cookie: cookieHeader(jar), ...extra },
    body: new URLSearchParams({ csrfToken, email, password, json: "true" }),
    redirect: "manual",
  });
  mergeCookies(jar, response);
  const location = response.headers.get("location") ?? (await response.json().catch(() => ({}))).url ?? "";
  const error = location ? new URL(location, baseUrl).searchParams.get("error") : null;
  const ok = !error && [...jar.keys()].some((name) => name.endsWith("next-auth.session-token"));
  return { ok, error, session: sessionFromJar(baseUrl, jar) };
}
