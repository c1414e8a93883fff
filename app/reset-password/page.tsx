import type { Metadata } from "next";
import { AuthPanel } from "@/components/account/auth-panel";
import { ResetRequestForm } from "@/components/account/reset-forms";

export const metadata: Metadata = { title: "Reset your password" };

export default function ResetPasswordPage() {
  return (
    <AuthPanel eyebrow="Backplate account" title="Reset your password" lead={<p>We mail a link to the account's address; it works once, for 1 hour.</p>}>
      <ResetRequestForm />
    </AuthPanel>
  );
}
