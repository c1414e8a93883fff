import { can, type Role } from "@/components/auth/roles";

/** The header's navigation. */
export interface NavLink {
  href: string;
  label: string;
}

export const PUBLIC_NAV: NavLink[] = [
  { href: "/#bench", label: "Bench" },
  { href: "/#figures", label: "Figures" },
  { href: "/#reviews", label: "Reviews" },
  { href: "/#safety", label: "Safety" },
];

/** A workspace's pages as the header lists them; settings and the audit log only for those whose role opens them. */
export function workspaceNav(slug: string, role: Role): NavLink[] {
  const base = `/w/${slug}`;
  const links: NavLink[] = [{ href: base, label: "Designs" }];
  if (can(role, "members.read")) links.push({ href: `${base}/members`, label: "Members" });
  if (can(role, "workspace.settings")) links.push({ href: `${base}/settings`, label: "Settings" });
  if (can(role, "audit.read")) links.push({ href: `${base}/audit`, label: "Audit" });
  return links;
}

/** The workspace slug in a path like /w/<slug>/members, or null. */
export function slugInPath(pathname: string | null): string | null {
  const match = /^\/w\/([^/?#]+)/.exec(pathname ?? "");
  return match ? decodeURIComponent(match[1]) : null;
}
