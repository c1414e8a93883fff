import type { Metadata } from "next";
import Link from "next/link";
import { AuthPanel } from "@/components/account/auth-panel";
import { ResetCompleteForm } from "@/components/account/reset-forms";
import { tokenField } from "@/components/schemas/account";
import { Notice } from "@/components/ui/notice";
import { checkPasswordReset } from "@/db/password-resets";
import { toAppError } from "../../_server/respond";

export const metadata: Metadata = { title: "Choose a new password" };

export default async function ResetPasswordTokenPage({ params }: { params: Promise<{ token: string }> }) {
  const { token } = await params;
  let problem: string | null = null;
  let email = "";
  try {
    email = (await checkPasswordReset(tokenField.parse(token))).email;
  } catch (error) {
    problem = toAppError(error).message;
  }
  return (
    <AuthPanel eyebrow="Backplate account" title="Choose a new password" lead={email ? <p>For {email}.</p> : <p>From the link in your mail.</p>}>
      {problem ? (
        <>
          <Notice tone="error">{problem}</Notice>
          <Link href="/reset-password" className="text-brass-deep underline underline-offset-2">
            Ask for a new reset link
          </Link>
        </>
      ) : (
        <ResetCompleteForm token={token} />
      )}
    </AuthPanel>
  );
}
