import type { Metadata } from "next";
import Link from "next/link";
import { redirect } from "next/navigation";
import { AuthPanel } from "@/components/account/auth-panel";
import { safeCallbackPath } from "@/components/account/sign-in-messages";
import { SignUpForm } from "@/components/account/sign-up-form";
import { getSessionUser } from "../_server/session";

export const metadata: Metadata = { title: "Create an account" };

type Search = Promise<{ callbackUrl?: string; email?: string }>;

export default async function SignUpPage({ searchParams }: { searchParams: Search }) {
  const { callbackUrl, email } = await searchParams;
  if (await getSessionUser()) redirect(safeCallbackPath(callbackUrl, "/workspaces"));
  const signInHref = callbackUrl ? `/sign-in?callbackUrl=${encodeURIComponent(callbackUrl)}` : "/sign-in";
  return (
    <AuthPanel
      eyebrow="Backplate account"
      title="Create your account"
      lead={
        <p>
          One account for every workspace you are invited to. Already have one?{" "}
          <Link href={signInHref} className="font-medium text-brass-deep underline underline-offset-2 hover:text-ink">
            Sign in
          </Link>
          .
        </p>
      }
    >
      <SignUpForm callbackUrl={callbackUrl} email={email} />
    </AuthPanel>
  );
}
