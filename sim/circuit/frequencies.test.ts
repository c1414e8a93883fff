import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { countFrequencies, expandFrequencies } from "./frequencies";

describe("frequency requests", () => {
  it("includes both ends of a log grid exactly, with the decade points on it", () => {
    const grid = expandFrequencies({ kind: "grid", from: 1, to: 100_000, pointsPerDecade: 20 });
    expect(grid.length).toBe(101);
    expect(grid[0]).toBe(1);
    expect(grid[grid.length - 1]).toBe(100_000);
    expect(grid).toContain(1000);
    expect(grid[1]).toBeCloseTo(10 ** (1 / 20), 14);
  });

  it("ends exactly at a top that is not on the grid", () => {
    const grid = expandFrequencies({ kind: "grid", from: 20, to: 15_000, pointsPerDecade: 10 });
    expect(grid[0]).toBe(20);
    expect(grid[grid.length - 1]).toBe(15_000);
    expect(grid.length).toBe(countFrequencies({ kind: "grid", from: 20, to: 15_000, pointsPerDecade: 10 }));
  });

  it("sorts a list and removes duplicates", () => {
    expect(Array.from(expandFrequencies({ kind: "list", frequencies: [1000, 20, 1000, 5] }))).toEqual([5, 20, 1000]);
  });

  it("is ascending with both ends for any grid (property)", () => {
    fc.assert(
      fc.property(
        fc.double({ min: 0.01, max: 1e5, noNaN: true }),
        fc.double({ min: 1, max: 1e4, noNaN: true }),
        fc.integer({ min: 1, max: 50 }),
        (from, span, pointsPerDecade) => {
          const to = from * span;
          const grid = expandFrequencies({ kind: "grid", from, to, pointsPerDecade });
          expect(grid[0]).toBe(from);
          expect(grid[grid.length - 1]).toBe(to);
          for (let i = 1; i < grid.length; i++) expect(grid[i]).toBeGreaterThan(grid[i - 1]);
          expect(grid.length).toBe(countFrequencies({ kind: "grid", from, to, pointsPerDecade }));
        },
      ),
    );
  });
});
