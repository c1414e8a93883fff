/**
 * The load test's short form: every scenario of `npm run loadtest` with small counts, asserting what must hold at
 * any load — no failed read, exactly one winner per round of concurrent saves from the same parent with every
 * other save refused with 409 naming the winner, and a history in PostgreSQL with no lost or duplicated revision.
 * Latency is measured by `npm run loadtest`, not asserted here.
 */
import { describe, expect, inject, it } from "vitest";
import { runLoadtest } from "../../scripts/lib/loadtest";

const baseUrl = inject("baseUrl");
const databaseUrl = inject("databaseUrl");

describe("load test, short form", () => {
  it("answers every read and keeps the concurrent-save contract", async () => {
    const rounds = 3;
    const writers = 20;
    const report = await runLoadtest({ baseUrl, databaseUrl, connections: 5, amount: 30, rounds, writers });
    expect(report.reads).toHaveLength(6);
    for (const read of report.reads) {
      expect({ name: read.name, errors: read.errors, statuses: read.statuses }).toEqual({ name: read.name, errors: 0, statuses: { 200: read.requests } });
      expect(read.requests).toBeGreaterThanOrEqual(30);
    }
    const w = report.writes;
    expect(w.unexpected).toEqual([]);
    // Optimistic concurrency (the revision contract of the design API): one save per parent wins, the rest get 409.
    expect(w.cleanRounds).toBe(rounds);
    expect(w.created).toBe(rounds);
    expect(w.conflicts).toBe(rounds * (writers - 1));
    // The first revision plus one per round, numbered 1…N without gap or repeat, each on the one before.
    expect(w.database).toEqual({ revisions: rounds + 1, numbersContiguous: true, parentsChain: true, winnersStored: true, headIsLast: true });
  }, 300_000);
});
