import type { Metadata } from "next";
import { requireWorkspacePage } from "@/app/_server/workspace-page";
import { PageFrame } from "@/components/ui/page-frame";
import { WorkspaceSettingsForm } from "@/components/workspaces/settings-form";

export const metadata: Metadata = { title: "Workspace settings" };

export default async function SettingsPage({ params }: { params: Promise<{ slug: string }> }) {
  const { slug } = await params;
  const { membership } = await requireWorkspacePage(slug, `/w/${slug}/settings`, "workspace.settings");
  return (
    <PageFrame eyebrow={membership.name} title="Settings">
      <WorkspaceSettingsForm
        workspaceId={membership.workspaceId}
        initial={{ name: membership.name, allowPublicLinks: membership.allowPublicLinks, allowSelfApproval: membership.allowSelfApproval }}
      />
    </PageFrame>
  );
}
