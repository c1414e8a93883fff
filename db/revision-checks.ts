import "server-only";
import { eq, inArray, isNull } from "drizzle-orm";
import { allPass as everyPass, isSimError, runCircuit, type TargetCheck } from "@/sim";
import { getDb } from "./client";
import { AppError } from "./errors";
import { designRevisions, revisionChecks } from "./schema";

/** A revision's figures and target checks as stored in revision_checks. */
export interface RevisionChecks {
  revisionId: string;
  checks: TargetCheck[];
  figures: Record<string, unknown>;
  /** null when the revision has no targets */
  allPass: boolean | null;
  error: string | null;
  approvedAt: Date | null;
  computedAt: Date;
}

type Computed = Pick<RevisionChecks, "checks" | "figures" | "allPass" | "error">;

/**
 * Runs a circuit through the same engine the bench and the headless command use and checks its targets. The sweep
 * and the spread are left out: the checks need the figures of the design (and of each targeted variant) only, and
 * a Monte Carlo of hundreds of runs must not hold up a save.
 */
export function computeChecks(circuit: Record<string, unknown>): Computed {
  const analyses = (circuit.analyses ?? undefined) as Record<string, unknown> | undefined;
  const { sweep: _sweep, spread: _spread, ...kept } = analyses ?? {};
  const file = analyses ? { ...circuit, analyses: kept } : circuit;
  const hasTargets = Array.isArray(circuit.targets) && circuit.targets.length > 0;
  try {
    const document = runCircuit(file);
    const checks = document.checks ?? [];
    return { checks, figures: document.figures as Record<string, unknown>, allPass: hasTargets ? everyPass(checks) : null, error: null };
  } catch (error) {
    const message = isSimError(error) ? error.message : `The engine failed on this revision: ${(error as Error)?.message ?? String(error)}`;
    return { checks: [], figures: {}, allPass: hasTargets ? false : null, error: message };
  }
}

const columns = {
  revisionId: revisionChecks.revisionId,
  checks: revisionChecks.checks,
  figures: revisionChecks.figures,
  allPass: revisionChecks.allPass,
  error: revisionChecks.error,
  approvedAt: revisionChecks.approvedAt,
  computedAt: revisionChecks.computedAt,
};

/**
 * Computes and stores a revision's checks. An approved revision's record is locked: its checks are never
 * recomputed (a change to the engine or the targets makes a new revision, not a different approved one).
 */
export async function storeRevisionChecks(revisionId: string, circuit: Record<string, unknown>): Promise<RevisionChecks> {
  const existing = await getDb().select(columns).from(revisionChecks).where(eq(revisionChecks.revisionId, revisionId));
  if (existing[0]?.approvedAt) {
    throw new AppError("conflict", "This revision is approved: its figures and checks are locked. Save a new revision to change them.");
  }
  const computed = computeChecks(circuit);
  const [row] = await getDb()
    .insert(revisionChecks)
    .values({ revisionId, ...computed, computedAt: new Date() })
    .onConflictDoUpdate({
      target: revisionChecks.revisionId,
      set: { ...computed, computedAt: new Date() },
      // the lock holds even against a concurrent approval: an approved row is never overwritten
      setWhere: isNull(revisionChecks.approvedAt),
    })
    .returning(columns);
  if (!row) throw new AppError("conflict", "This revision was approved meanwhile: its checks are locked.");
  return row as RevisionChecks;
}

/** The stored checks of one revision, computed now when the revision has none yet (revisions saved before checks). */
export async function getRevisionChecks(revisionId: string): Promise<RevisionChecks> {
  const rows = await getDb().select(columns).from(revisionChecks).where(eq(revisionChecks.revisionId, revisionId));
  if (rows[0]) return rows[0] as RevisionChecks;
  const [revision] = await getDb().select({ circuit: designRevisions.circuit }).from(designRevisions).where(eq(designRevisions.id, revisionId));
  if (!revision) throw new AppError("not_found", "No such revision.");
  return storeRevisionChecks(revisionId, revision.circuit as Record<string, unknown>);
}

/** Stored checks of several revisions (the designs table); revisions without a row are absent. */
export async function checksByRevision(revisionIds: string[]): Promise<Map<string, RevisionChecks>> {
  if (revisionIds.length === 0) return new Map();
  const rows = await getDb().select(columns).from(revisionChecks).where(inArray(revisionChecks.revisionId, revisionIds));
  return new Map(rows.map((row) => [row.revisionId, row as RevisionChecks]));
}
