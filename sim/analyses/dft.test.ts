import { describe, expect, it } from "vitest";
import { distortionOf, harmonicAmplitudes, resampleUniform } from "./dft";

const TOLERANCE = 1e-9;

describe("DFT over whole periods", () => {
  it("recovers the known harmonics of a synthetic signal", () => {
    // Orthogonality of the discrete Fourier basis over whole periods (any signal-processing text): each harmonic's
    // peak amplitude comes back exactly, the mean in bin 0.
    const periods = 3;
    const n = 96;
    const samples = Array.from({ length: n }, (_, i) => {
      const th = (2 * Math.PI * periods * i) / n;
      return 0.3 + Math.sin(th) + 0.1 * Math.cos(2 * th) + 0.01 * Math.sin(3 * th + 0.3);
    });
    const h = harmonicAmplitudes(samples, periods, 5);
    expect(h[0]).toBeCloseTo(0.3, 12);
    expect(Math.abs(h[1] - 1)).toBeLessThan(TOLERANCE);
    expect(Math.abs(h[2] - 0.1)).toBeLessThan(TOLERANCE);
    expect(Math.abs(h[3] - 0.01)).toBeLessThan(TOLERANCE);
    expect(h[4]).toBeLessThan(TOLERANCE);
    // THD = √(0.1² + 0.01²)/1 (definition of THD over harmonics 2…10)
    const d = distortionOf([...samples.slice(0, 32), samples[0]], 1);
    expect(d.harmonics_db[0]).toBeCloseTo(-20, 9);
    expect(d.harmonics_db[1]).toBeCloseTo(-40, 9);
    expect(d.harmonics_db[2]).toBe(-200);
    expect(d.thd_percent).toBeCloseTo(100 * Math.hypot(0.1, 0.01), 9);
  });

  it("symmetric hard clipping has odd harmonics only", () => {
    // Half-wave symmetry x(t + T/2) = −x(t) cancels every even Fourier coefficient (Fourier-series property).
    const n = 256;
    const record = Array.from({ length: n + 1 }, (_, i) =>
      Math.max(-0.5, Math.min(0.5, Math.sin((2 * Math.PI * i) / n))),
    );
    const d = distortionOf(record, 1);
    const even = [0, 2, 4, 6, 8].map((k) => d.harmonics_db[k]);
    const odd = [1, 3, 5].map((k) => d.harmonics_db[k]);
    for (const e of even) expect(e).toBeLessThan(-100); // round-off only
    for (const o of odd) expect(o).toBeGreaterThan(-40);
  });

  it("resampling a non-uniform record to whole periods leaves the harmonics unchanged", () => {
    // Four-point Lagrange interpolation is exact to O(h⁴) (numerical-analysis text): at 400 uneven points per
    // period the harmonics come back to 1e-6.
    const times: number[] = [];
    const values: number[] = [];
    for (let i = 0; i <= 800; i++) {
      const t = (i + 0.3 * Math.sin(i)) / 400;
      times.push(t);
      values.push(Math.sin(2 * Math.PI * t) + 0.05 * Math.sin(4 * Math.PI * t));
    }
    const record = resampleUniform(times, values, 0.5, 1, 64);
    const d = distortionOf(record, 1);
    expect(Math.abs(d.fundamental - 1)).toBeLessThan(1e-6);
    expect(d.harmonics_db[0]).toBeCloseTo(20 * Math.log10(0.05), 4);
  });
});
