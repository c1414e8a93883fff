import { describe, expect, it } from "vitest";
import { resultsCsv } from "./results-csv";
import { bodeTraces, noiseTraces, unwrapDegrees } from "./traces";

describe("results CSV", () => {
  it("writes a header and one row per frequency; other grids fill where frequencies coincide (RFC 4180 quoting)", () => {
    const csv = resultsCsv([
      { name: "Design magnitude_db", frequency: [10, 100, 1000], values: [-1, -0.5, 0] },
      { name: 'Pinned, "before"', frequency: [100, 1000], values: [-0.4, 0.1] },
    ]);
    expect(csv).toBe('frequency_hz,Design magnitude_db,"Pinned, ""before"""\n10,-1,\n100,-0.5,-0.4\n1000,0,0.1\n');
  });
});

describe("plot traces", () => {
  it("each curve gives a magnitude trace and a phase trace on the second axis; the spread band comes first", () => {
    const curve = {
      id: "live",
      label: "Design",
      frequency: [1, 10],
      magnitude_db: [0, 1],
      phase_deg: [0, -5],
      style: "live" as const,
    };
    const traces = bodeTraces([curve], { frequency: [1, 10], p5_db: [-1, 0], p95_db: [1, 2] }) as Record<
      string,
      unknown
    >[];
    expect(traces).toHaveLength(4);
    expect(traces[1].fill).toBe("tonexty");
    expect(traces[3].yaxis).toBe("y2");
  });

  it("leaves out noise contributions below 1e-4 of the total power at every frequency", () => {
    const traces = noiseTraces({
      frequency: [1, 2],
      output_density: [1e-8, 1e-8],
      contributions: { R1: [9.9e-9, 9.9e-9], C1: [1e-11, 1e-11] },
    }) as { name: string }[];
    expect(traces.map((t) => t.name)).toEqual(["Total", "R1"]);
  });
});

describe("phase unwrapping", () => {
  it("removes ±360° wraps of the principal value, keeping the first point", () => {
    expect(unwrapDegrees([170, 179, -179, -170])).toEqual([170, 179, 181, 190]);
    expect(unwrapDegrees([-170, -179, 179, 170])).toEqual([-170, -179, -181, -190]);
    expect(unwrapDegrees([0, -45, -90])).toEqual([0, -45, -90]);
  });
});
