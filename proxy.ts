import { type NextRequest, NextResponse } from "next/server";
import { contentSecurityPolicy, newNonce } from "@/app/_server/security-headers";
import { needsSameOriginCheck, ownOrigins, sameOriginProblem } from "@/app/_server/same-origin";

/**
 * Runs before every page and route: refuses cross-site state changes to the API (403 in the one error shape) and
 * gives each page its Content-Security-Policy with a fresh nonce, which Next reads from the request's CSP header
 * and puts on its own scripts. Pages are dynamic already (the root layout reads the session), so every render gets
 * its nonce. API responses keep their own headers (an attachment download carries a stricter sandbox policy).
 */
export function proxy(request: NextRequest) {
  const { pathname } = request.nextUrl;
  if (needsSameOriginCheck(request.method, pathname)) {
    const problem = sameOriginProblem(request.headers, ownOrigins(request.headers, request.url, process.env.NEXTAUTH_URL));
    if (problem) return Response.json({ error: { code: "forbidden", message: problem } }, { status: 403 });
  }
  if (pathname.startsWith("/api/")) return NextResponse.next();

  const policy = contentSecurityPolicy(newNonce());
  const requestHeaders = new Headers(request.headers);
  requestHeaders.set("Content-Security-Policy", policy);
  const response = NextResponse.next({ request: { headers: requestHeaders } });
  response.headers.set("Content-Security-Policy", policy);
  return response;
}

export const config = {
  // Static chunks and fonts need no policy of their own (a policy applies to the document that loads them).
  matcher: ["/((?!_next/static|_next/image|favicon.ico).*)"],
};
