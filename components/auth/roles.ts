/**
 * What each workspace role may do (glossary: owner manages; designer edits and saves; reviewer reads, remarks and
 * decides; viewer reads). One table, read by the server's checks and by the interface to show or hide controls.
 */
export const ROLES = ["owner", "designer", "reviewer", "viewer"] as const;
export type Role = (typeof ROLES)[number];

export const ACTIONS = [
  "design.read",
  "design.create",
  "design.edit",
  "design.delete",
  "revision.create",
  "review.request",
  "review.remark",
  "review.decide",
  "share.manage",
  "members.read",
  "members.manage",
  "workspace.settings",
  "workspace.delete",
  "audit.read",
] as const;
export type Action = (typeof ACTIONS)[number];

const ALLOWED: Record<Role, readonly Action[]> = {
  owner: ACTIONS,
  designer: ["design.read", "design.create", "design.edit", "design.delete", "revision.create", "review.request", "review.remark", "share.manage", "members.read"],
  reviewer: ["design.read", "review.remark", "review.decide", "members.read"],
  viewer: ["design.read", "members.read"],
};

export function can(role: Role, action: Action): boolean {
  return ALLOWED[role].includes(action);
}

export const ROLE_LABELS: Record<Role, string> = {
  owner: "Owner",
  designer: "Designer",
  reviewer: "Reviewer",
  viewer: "Viewer",
};
