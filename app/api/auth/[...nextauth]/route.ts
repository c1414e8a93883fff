import NextAuth from "next-auth";
import type { NextRequest } from "next/server";
import { authOptionsFor } from "@/app/_server/auth-options";

type Context = { params: Promise<{ nextauth: string[] }> };

/** next-auth's endpoints, with the options of this request (Secure cookies when it came over HTTPS). */
async function handler(request: NextRequest, context: Context) {
  return NextAuth(request, context, authOptionsFor(request.headers));
}

export { handler as GET, handler as POST };
