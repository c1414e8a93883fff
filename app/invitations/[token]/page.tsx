import type { Metadata } from "next";
import Link from "next/link";
import { AuthPanel } from "@/components/account/auth-panel";
import { ROLE_LABELS } from "@/components/auth/roles";
import { tokenField } from "@/components/schemas/account";
import { primaryButton, secondaryButton } from "@/components/ui/buttons";
import { Notice } from "@/components/ui/notice";
import { AcceptInvitationButton } from "@/components/workspaces/accept-invitation";
import { type InvitationPreview, previewInvitation } from "@/db/invitations";
import { toAppError } from "../../_server/respond";
import { getSessionUser } from "../../_server/session";

export const metadata: Metadata = { title: "Invitation" };

export default async function InvitationPage({ params }: { params: Promise<{ token: string }> }) {
  const { token } = await params;
  let invitation: InvitationPreview | null = null;
  let problem: string | null = null;
  try {
    invitation = await previewInvitation(tokenField.parse(token));
  } catch (error) {
    problem = toAppError(error).message;
  }
  if (!invitation) {
    return (
      <AuthPanel eyebrow="Invitation" title="This invitation cannot be used" lead={<p>Invitation links work once, for 7 days.</p>}>
        <Notice tone="error">{problem}</Notice>
      </AuthPanel>
    );
  }
  const user = await getSessionUser();
  const here = `/invitations/${token}`;
  const rightPerson = user && user.email.toLowerCase() === invitation.email.toLowerCase();
  return (
    <AuthPanel
      eyebrow="Invitation"
      title={`Join ${invitation.workspaceName}`}
      lead={
        <p>
          {invitation.invitedByName ?? "An owner"} invites <strong>{invitation.email}</strong> as{" "}
          <strong>{ROLE_LABELS[invitation.role].toLowerCase()}</strong>. The invitation works until{" "}
          {invitation.expiresAt.toISOString().slice(0, 10)}.
        </p>
      }
    >
      {rightPerson ? (
        <AcceptInvitationButton token={token} workspaceName={invitation.workspaceName} />
      ) : user ? (
        <Notice tone="error">
          You are signed in as {user.email}, but the invitation is for {invitation.email}. Sign out from the account menu
          and sign in with that address.
        </Notice>
      ) : (
        <div className="flex flex-col gap-3">
          <p className="text-ink-soft">Sign in with {invitation.email}, or create an account with it, to accept.</p>
          <div className="flex flex-wrap gap-3">
            <Link href={`/sign-in?callbackUrl=${encodeURIComponent(here)}`} className={primaryButton}>
              Sign in
            </Link>
            <Link
              href={`/sign-up?callbackUrl=${encodeURIComponent(here)}&email=${encodeURIComponent(invitation.email)}`}
              className={secondaryButton}
            >
              Create an account
            </Link>
          </div>
        </div>
      )}
    </AuthPanel>
  );
}
