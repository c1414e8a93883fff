import { appUrl, sendMail } from "@/app/_server/mail";
import { invitationMail } from "@/app/_server/mail-templates/invitation";
import { type WorkspaceContext, workspaceIdFrom } from "@/app/_server/params";
import { readJson, route } from "@/app/_server/respond";
import { requireAction } from "@/app/_server/session";
import { invitationCreateSchema, invitationRevokeSchema } from "@/components/schemas/workspace";
import { createInvitation, listOpenInvitations, revokeInvitation } from "@/db/invitations";

export const GET = route(async (_request: Request, context: WorkspaceContext) => {
  const workspaceId = await workspaceIdFrom(context);
  await requireAction(workspaceId, "members.manage");
  return Response.json({ invitations: await listOpenInvitations(workspaceId) });
});

/** Invites an address with a role and mails the link; if the mail fails, no invitation is kept. */
export const POST = route(async (request: Request, context: WorkspaceContext) => {
  const workspaceId = await workspaceIdFrom(context);
  const { user, membership } = await requireAction(workspaceId, "members.manage");
  const input = await readJson(request, invitationCreateSchema);
  const invitation = await createInvitation({ workspaceId, actorId: user.id, email: input.email, role: input.role }, (token) =>
    sendMail({
      to: input.email,
      ...invitationMail({
        url: appUrl(`/invitations/${token}`),
        workspaceName: membership.name,
        inviterName: user.name || user.email,
        role: input.role,
      }),
    }),
  );
  return Response.json({ invitation }, { status: 201 });
});

export const DELETE = route(async (request: Request, context: WorkspaceContext) => {
  const workspaceId = await workspaceIdFrom(context);
  const { user } = await requireAction(workspaceId, "members.manage");
  const input = await readJson(request, invitationRevokeSchema);
  await revokeInvitation(workspaceId, user.id, input.invitationId);
  return new Response(null, { status: 204 });
});
