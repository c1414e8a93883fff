import type { Metadata } from "next";
import Link from "next/link";
import { redirect } from "next/navigation";
import { EmailLinkSection } from "@/components/account/email-link-section";
import { PasswordSignInForm } from "@/components/account/sign-in-form";
import { safeCallbackPath, signInErrorMessage } from "@/components/account/sign-in-messages";
import { Notice } from "@/components/ui/notice";
import { getSessionUser } from "../_server/session";

export const metadata: Metadata = { title: "Sign in" };

type Search = Promise<{ callbackUrl?: string; error?: string; sent?: string; reset?: string }>;

export default async function SignInPage({ searchParams }: { searchParams: Search }) {
  const { callbackUrl, error, reset, sent } = await searchParams;
  if (await getSessionUser()) redirect(safeCallbackPath(callbackUrl));
  const message = signInErrorMessage(error);
  return (
    <div className="mx-auto grid w-full max-w-5xl gap-10 px-4 py-12 sm:px-6 md:grid-cols-[1fr_1.1fr]">
      <section>
        <p className="mb-2 font-mono text-xs uppercase tracking-[0.2em] text-brass-deep">Backplate account</p>
        <h1 className="text-3xl font-bold text-ink sm:text-4xl">Sign in to the bench</h1>
        <p className="mt-3 max-w-md text-ink-soft">
          Your workspaces, designs and reviews are behind this door. New here?{" "}
          <Link href="/sign-up" className="font-medium text-brass-deep underline underline-offset-2 hover:text-ink">
            Create an account
          </Link>
          .
        </p>
      </section>
      <section className="flex flex-col gap-6 rounded-lg border border-rule bg-paper-deep/60 p-6">
        {message ? <Notice tone="error">{message}</Notice> : null}
        {reset ? <Notice tone="done">Your password is changed. Sign in with the new one.</Notice> : null}
        <div>
          <h2 className="mb-4 text-lg font-bold">With your password</h2>
          <PasswordSignInForm callbackUrl={callbackUrl} />
        </div>
        <div className="border-t border-rule pt-6">
          <h2 className="text-lg font-bold">Or with a link by e-mail</h2>
          <p className="mb-4 mt-1 text-sm text-ink-soft">For an existing account: we mail you a link that signs you in once.</p>
          <EmailLinkSection callbackUrl={callbackUrl} alreadySent={sent === "1"} />
        </div>
      </section>
    </div>
  );
}
