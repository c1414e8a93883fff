import type { Metadata } from "next";
import { requireWorkspacePage } from "@/app/_server/workspace-page";
import { PageFrame } from "@/components/ui/page-frame";
import { AuditTable } from "@/components/workspaces/audit-table";

export const metadata: Metadata = { title: "Audit log" };

export default async function AuditPage({ params }: { params: Promise<{ slug: string }> }) {
  const { slug } = await params;
  const { membership } = await requireWorkspacePage(slug, `/w/${slug}/audit`, "audit.read");
  return (
    <PageFrame eyebrow={membership.name} title="Audit log" width="max-w-6xl" lead="Who changed what in this workspace, newest first.">
      <AuditTable workspaceId={membership.workspaceId} />
    </PageFrame>
  );
}
