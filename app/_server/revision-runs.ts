import "server-only";
import { type RevisionRun, runRevision } from "@/components/designs/run-revision";

/**
 * The engine's run of a saved revision, kept per process. A revision is immutable (db/schema.ts: never updated), so
 * its run for a given variant never changes; pages that show it (a design's overview, a bench link) would otherwise
 * solve the same circuit on every request — the bulk of their time, and under load a queue that times requests out.
 */
const MAX_RUNS = 200;
const runs = new Map<string, RevisionRun>();

export function runSavedRevision(revisionId: string, circuit: unknown, variant?: string): RevisionRun {
  const key = `${revisionId}\u0000${variant ?? ""}`;
  const cached = runs.get(key);
  if (cached) {
    // refresh its place, so the oldest-used run is the one dropped when full
    runs.delete(key);
    runs.set(key, cached);
    return cached;
  }
  const run = runRevision(circuit, variant);
  runs.set(key, run);
  if (runs.size > MAX_RUNS) runs.delete(runs.keys().next().value as string);
  return run;
}
