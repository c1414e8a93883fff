import type { Metadata } from "next";
import { requireWorkspacePage } from "@/app/_server/workspace-page";
import { PageFrame } from "@/components/ui/page-frame";
import { MembersPanel } from "@/components/workspaces/members-panel";

export const metadata: Metadata = { title: "Members" };

export default async function MembersPage({ params }: { params: Promise<{ slug: string }> }) {
  const { slug } = await params;
  const { user, membership } = await requireWorkspacePage(slug, `/w/${slug}/members`, "members.read");
  return (
    <PageFrame
      eyebrow={membership.name}
      title="Members"
      width="max-w-5xl"
      lead="Owners manage members and settings; designers create and save; reviewers remark and decide; viewers read."
    >
      <MembersPanel workspaceId={membership.workspaceId} myUserId={user.id} myRole={membership.role} />
    </PageFrame>
  );
}
