import { PageLink } from "@/components/ui/page-link";
import { ChecksBadge } from "@/components/reviews/checks-panel";
import { getRevisionChecks } from "@/db/revision-checks";

/** The bench's target badge: whether the saved revision on the bench meets the design's targets (checked on save). */
export async function BenchChecks({ revisionId, designPath }: { revisionId: string; designPath: string }) {
  const checks = await getRevisionChecks(revisionId);
  const missed = checks.checks.filter((c) => !c.pass).map((c) => `${c.figure}${c.variant ? ` (${c.variant})` : ""}`);
  return (
    <span className="ml-2 inline-flex items-center gap-1.5" title={missed.length ? `Missed: ${missed.join(", ")}` : undefined}>
      <ChecksBadge allPass={checks.allPass} checks={checks.checks} />
      {missed.length ? (
        <PageLink href={designPath} className="underline" data-testid="bench-missed">
          missed: {missed.join(", ")}
        </PageLink>
      ) : null}
    </span>
  );
}
