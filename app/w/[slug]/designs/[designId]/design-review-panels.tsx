import { PageLink } from "@/components/ui/page-link";
import { can } from "@/components/auth/roles";
import { ChecksBadge, ChecksTable } from "@/components/reviews/checks-panel";
import { RequestReviewDialog } from "@/components/reviews/request-review-dialog";
import { TargetsEditor } from "@/components/reviews/targets-editor";
import { listEligibleReviewers, listReviews } from "@/db/reviews";
import type { WorkspaceMembership } from "@/db/memberships";
import { getRevisionChecks } from "@/db/revision-checks";

const REVIEW_WORDS = { open: "Open", approved: "Approved", rework: "Rework", withdrawn: "Withdrawn" } as const;

/** The design page's review side: the head's target checks (with the editor for designers) and the reviews. */
export async function DesignReviewPanels({
  slug,
  membership,
  userId,
  designId,
  head,
  revisions,
  variants,
}: {
  slug: string;
  membership: WorkspaceMembership;
  /** the signed-in person: the request dialog does not offer them as a reviewer */
  userId: string;
  designId: string;
  head: { id: string; number: number; circuit: Record<string, unknown> };
  revisions: { id: string; number: number }[];
  variants: string[];
}) {
  const [checks, reviews, reviewers] = await Promise.all([
    getRevisionChecks(head.id),
    listReviews(designId),
    can(membership.role, "review.request") ? listEligibleReviewers(membership.workspaceId, membership.allowSelfApproval, userId) : Promise.resolve([]),
  ]);
  return (
    <>
      <section aria-label="Targets" className="space-y-3 rounded-md border border-rule bg-paper p-4">
        <div className="flex items-center justify-between gap-2">
          <h2 className="font-display text-base font-semibold">Targets of r{head.number}</h2>
          <ChecksBadge allPass={checks.allPass} checks={checks.checks} />
        </div>
        <ChecksTable checks={checks.checks} error={checks.error} />
        {can(membership.role, "revision.create") ? (
          <details>
            <summary className="cursor-pointer text-sm text-brass-deep underline underline-offset-2">Edit targets</summary>
            <div className="mt-2">
              <TargetsEditor workspaceId={membership.workspaceId} designId={designId} head={head} variants={variants} />
            </div>
          </details>
        ) : null}
      </section>
      <section aria-label="Reviews" className="space-y-3 rounded-md border border-rule bg-paper p-4">
        <div className="flex items-center justify-between gap-2">
          <h2 className="font-display text-base font-semibold">Reviews</h2>
          {can(membership.role, "review.request") ? (
            <RequestReviewDialog designId={designId} revisions={revisions} reviewers={reviewers} />
          ) : null}
        </div>
        {reviews.length === 0 ? <p className="text-sm text-ink-soft">No review asked for yet.</p> : null}
        <ul className="divide-y divide-rule text-sm">
          {reviews.map((r) => (
            <li key={r.id} className="py-2">
              <PageLink href={`/w/${slug}/designs/${designId}/reviews/${r.id}`} className="block">
                <span className="font-mono font-semibold">r{r.revisionNumber}</span> · {REVIEW_WORDS[r.status]}
                <span className="block text-xs text-ink-soft">
                  asked by {r.requestedByName ?? "—"} of {r.reviewerNames.map((n) => n ?? "—").join(", ")}
                </span>
              </PageLink>
            </li>
          ))}
        </ul>
      </section>
    </>
  );
}
