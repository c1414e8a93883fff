import "server-only";
import { ROLE_LABELS, type Role } from "@/components/auth/roles";
import { mailBodies } from "./layout";

const ROLE_MEANING: Record<Role, string> = {
  owner: "manage members and settings, and everything else",
  designer: "create and edit designs and save revisions",
  reviewer: "read designs, remark on them and decide",
  viewer: "read the designs",
};

export function invitationMail(options: { url: string; workspaceName: string; inviterName: string; role: Role }) {
  return {
    subject: `${options.inviterName} invites you to ${options.workspaceName} on Backplate`,
    ...mailBodies({
      heading: `Join ${options.workspaceName}`,
      lines: [
        `${options.inviterName} invites you to the workspace ${options.workspaceName} as ${ROLE_LABELS[options.role].toLowerCase()}: you can ${ROLE_MEANING[options.role]}.`,
        "The link works for 7 days. Sign in, or create an account with this address, to accept.",
      ],
      action: { label: "Open the invitation", url: options.url },
      footer: "Not expecting this? Ignore the mail; nothing happens unless the link is used.",
    }),
  };
}
