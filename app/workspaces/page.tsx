import type { Metadata } from "next";
import { redirect } from "next/navigation";
import { WorkspaceList } from "@/components/workspaces/workspace-list";
import { PageFrame } from "@/components/ui/page-frame";
import { listMembershipsForUser } from "@/db/memberships";
import { getSessionUser } from "../_server/session";

export const metadata: Metadata = { title: "Workspaces" };

type Search = Promise<{ open?: string }>;

/** The workspace list and switcher. `?open=first` (where sign-in lands) goes straight to the first workspace. */
export default async function WorkspacesPage({ searchParams }: { searchParams: Search }) {
  const user = await getSessionUser();
  if (!user) redirect("/sign-in?callbackUrl=/workspaces");
  const { open } = await searchParams;
  if (open === "first") {
    const [first] = await listMembershipsForUser(user.id);
    redirect(first ? `/w/${first.slug}` : "/workspaces");
  }
  return (
    <PageFrame eyebrow="Your workspaces" title="Workspaces" lead="Each workspace is a team or a company with its own designs and members.">
      <WorkspaceList />
    </PageFrame>
  );
}
