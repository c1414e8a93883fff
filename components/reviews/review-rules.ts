/**
 * Who may be asked to review and who may decide, as plain functions the server enforces and the interface reads to
 * show or hide controls. Reviewers and owners review; designers only where the workspace lets designers approve
 * (its allow_self_approval setting), and then a designer may also approve a revision they saved.
 */
import { can, type Role } from "@/components/auth/roles";

export interface WorkspaceRules {
  allowSelfApproval: boolean;
}

export function canBeAskedToReview(role: Role, rules: WorkspaceRules): boolean {
  return role === "owner" || role === "reviewer" || (role === "designer" && rules.allowSelfApproval);
}

/**
 * The people a requester may ask: members whose role can review, less the requester (nobody reviews their own
 * request). The request dialog offers exactly these and the server accepts only these.
 */
export function reviewersOfferedTo<T extends { id: string; role: Role }>(members: T[], requesterId: string, rules: WorkspaceRules): T[] {
  return members.filter((m) => m.id !== requesterId && canBeAskedToReview(m.role, rules));
}

export interface DecideContext extends WorkspaceRules {
  role: Role;
  /** the person is one of the review's requested reviewers */
  isRequestedReviewer: boolean;
  /** the person saved the revision under review */
  isAuthor: boolean;
}

/** null when the decision is allowed, else the reason (shown to the person as is). */
export function decideRefusal(verdict: "approve" | "rework", context: DecideContext): string | null {
  if (context.role === "viewer") return "Viewers read designs only; deciding is for reviewers and owners. Ask an owner for the reviewer role.";
  const mayDecide = can(context.role, "review.decide") || (context.role === "designer" && context.isRequestedReviewer && context.allowSelfApproval);
  if (!mayDecide) {
    return context.role === "designer"
      ? "Designers decide only when asked to review in a workspace that lets designers approve. Ask a reviewer or an owner."
      : `Your role (${context.role}) does not allow deciding. Ask an owner.`;
  }
  if (verdict === "approve" && context.isAuthor && !context.allowSelfApproval) {
    return "You saved this revision, and this workspace does not allow approving your own revision. Ask another reviewer to approve it (an owner can allow self-approval in the workspace settings).";
  }
  return null;
}
