import type { Metadata } from "next";
import { requireWorkspacePage } from "@/app/_server/workspace-page";
import { can } from "@/components/auth/roles";
import { DesignsTable } from "@/components/designs/designs-table";
import { NewDesignForm } from "@/components/designs/new-design-form";

export const dynamic = "force-dynamic";
export const metadata: Metadata = { title: "Designs" };

/** The workspace's designs as a table, with "New design" for designers and owners. */
export default async function WorkspaceDesignsPage({ params }: { params: Promise<{ slug: string }> }) {
  const { slug } = await params;
  const { membership } = await requireWorkspacePage(slug, `/w/${slug}`);
  return (
    <div className="mx-auto w-full max-w-6xl px-4 py-8 sm:px-6">
      <div className="mb-6 flex flex-wrap items-end justify-between gap-4">
        <div>
          <p className="mb-1 font-mono text-xs uppercase tracking-[0.2em] text-brass-deep">{membership.name}</p>
          <h1 className="text-3xl font-bold text-ink">Designs</h1>
        </div>
      </div>
      {can(membership.role, "design.create") ? (
        <div className="mb-6">
          <NewDesignForm workspaceId={membership.workspaceId} slug={slug} />
        </div>
      ) : null}
      <DesignsTable
        workspaceId={membership.workspaceId}
        slug={slug}
        canRestore={can(membership.role, "design.delete")}
      />
    </div>
  );
}
