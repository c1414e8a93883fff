import "server-only";
import bcrypt from "bcryptjs";
import { DrizzleAdapter } from "@auth/drizzle-adapter";
import type { NextAuthOptions } from "next-auth";
import type { Adapter } from "next-auth/adapters";
import CredentialsProvider from "next-auth/providers/credentials";
import EmailProvider from "next-auth/providers/email";
import { signInSchema } from "@/components/schemas/account";
import { getDb } from "@/db/client";
import { accounts, sessions, users, verificationTokens } from "@/db/schema";
import { findUserByEmail, getUserById } from "@/db/users";
import { appUrl, mailFrom, sendMail } from "./mail";
import { signInLinkMail } from "./mail-templates/sign-in-link";
import { servedOverHttps } from "./secure-cookies";
import {
  clientAddress,
  RATE_LIMITED_MESSAGE,
  recordRightPassword,
  recordWrongPassword,
  signInBlocked,
} from "./sign-in-limits";

/**
 * Sign-in for Backplate. Sessions are signed cookies (JWT strategy: the credentials provider needs it, and it keeps
 * app servers stateless). Pages are Backplate's own (/sign-in); next-auth's errors land there too.
 */
/** How long an e-mailed sign-in link works, s. */
const SIGN_IN_LINK_MAX_AGE_S = 24 * 60 * 60;

export const authOptions: NextAuthOptions = {
  // The adapter stores the e-mailed links' tokens (hashed) and marks the address verified; sessions stay cookies.
  // @auth/drizzle-adapter is typed for @auth/core; its adapter methods are the ones next-auth v4 calls.
  adapter: DrizzleAdapter(getDb(), {
    usersTable: users,
    accountsTable: accounts,
    sessionsTable: sessions,
    verificationTokensTable: verificationTokens,
  }) as unknown as Adapter,
  session: { strategy: "jwt", maxAge: 30 * 24 * 60 * 60 },
  pages: { signIn: "/sign-in", error: "/sign-in", verifyRequest: "/sign-in?sent=1" },
  providers: [
    CredentialsProvider({
      id: "password",
      name: "E-mail and password",
      credentials: { email: { label: "E-mail", type: "email" }, password: { label: "Password", type: "password" } },
      async authorize(credentials, req) {
        const parsed = signInSchema.safeParse(credentials ?? {});
        if (!parsed.success) return null;
        const { email, password } = parsed.data;
        const address = clientAddress(req?.headers);
        // Checked before bcrypt, so a locked-out address cannot keep guessing even with the right password.
        if (await signInBlocked(email, address)) throw new Error(RATE_LIMITED_MESSAGE);
        const user = await findUserByEmail(email);
        const ok = user?.passwordHash ? await bcrypt.compare(password, user.passwordHash) : false;
        if (!user || !ok) {
          await recordWrongPassword(email, address);
          return null;
        }
        await recordRightPassword(email);
        return { id: user.id, email: user.email, name: user.name };
      },
    }),
    EmailProvider({
      server: process.env.SMTP_URL ?? "",
      from: mailFrom(),
      maxAge: SIGN_IN_LINK_MAX_AGE_S,
      async sendVerificationRequest({ identifier, url }) {
        await sendMail({ to: identifier, ...signInLinkMail(url) });
      },
    }),
  ],
  callbacks: {
    /** Links go to existing accounts only, so a link never creates a person (sign-up does, with a password). */
    async signIn({ user, account, email }) {
      if (account?.provider !== "email") return true;
      const existing = user.email ? await findUserByEmail(user.email) : null;
      if (existing) return true;
      return email?.verificationRequest ? appUrl("/sign-in?error=UnknownEmail") : false;
    },
    async jwt({ token, user, trigger }) {
      if (user) token.sub = user.id;
      // After the account page changes the name, the client calls update() and the cookie takes the new name.
      if (trigger === "update" && token.sub) {
        const fresh = await getUserById(token.sub);
        if (fresh) {
          token.name = fresh.name;
          token.email = fresh.email;
        }
      }
      return token;
    },
    async session({ session, token }) {
      if (session.user && token.sub) (session.user as { id?: string }).id = token.sub;
      return session;
    },
  },
};

/**
 * The options for one request. next-auth's cookies are always HttpOnly and SameSite=Lax; `useSecureCookies` adds
 * Secure (and the __Secure-/__Host- names) when the request came over HTTPS (secure-cookies.ts), including behind a
 * TLS-ending proxy whose NEXTAUTH_URL still says http. Sign-in and every session read must use the same value, or
 * the session cookie is written under one name and looked for under another.
 */
export function authOptionsFor(requestHeaders: Pick<Headers, "get">): NextAuthOptions {
  return { ...authOptions, useSecureCookies: servedOverHttps(requestHeaders.get("x-forwarded-proto"), process.env.NEXTAUTH_URL) };
}
