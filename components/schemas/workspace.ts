/** Inputs of workspaces, memberships and invitations, shared by forms and route handlers. */
import { z } from "zod";
import { ROLES } from "@/components/auth/roles";
import { emailField } from "./account";

export const roleField = z.enum(ROLES, { error: `Choose one of the roles: ${ROLES.join(", ")}.` });

export const workspaceNameField = z
  .string({ error: "Enter the workspace's name." })
  .trim()
  .min(2, "Use at least 2 characters for the workspace's name.")
  .max(80, "Keep the workspace's name under 80 characters.");

export const workspaceCreateSchema = z.object({ name: workspaceNameField });
export type WorkspaceCreateInput = z.input<typeof workspaceCreateSchema>;

export const workspaceSettingsSchema = z
  .object({
    name: workspaceNameField.optional(),
    allowPublicLinks: z.boolean({ error: "Allow public bench links must be on or off." }).optional(),
    allowSelfApproval: z.boolean({ error: "Allow self-approval must be on or off." }).optional(),
  })
  .refine((value) => Object.values(value).some((v) => v !== undefined), {
    message: "Change at least one setting.",
    path: ["name"],
  });
export type WorkspaceSettingsInput = z.input<typeof workspaceSettingsSchema>;

export const uuidField = (what: string) => z.uuid({ error: `That is not a valid ${what} id.` });

export const memberRoleChangeSchema = z.object({ userId: uuidField("member"), role: roleField });
export type MemberRoleChangeInput = z.input<typeof memberRoleChangeSchema>;

export const memberRemoveSchema = z.object({ userId: uuidField("member") });
export type MemberRemoveInput = z.input<typeof memberRemoveSchema>;

export const invitationCreateSchema = z.object({ email: emailField, role: roleField });
export type InvitationCreateInput = z.input<typeof invitationCreateSchema>;

export const invitationRevokeSchema = z.object({ invitationId: uuidField("invitation") });
export type InvitationRevokeInput = z.input<typeof invitationRevokeSchema>;

/** Paging through the audit log: newest first, `before` an entry id from the previous page. */
export const auditQuerySchema = z.object({
  before: z.coerce.number({ error: "before must be an entry number." }).int().positive().optional(),
  limit: z.coerce.number({ error: "limit must be a number." }).int().min(1).max(200, "limit is at most 200.").optional(),
});
