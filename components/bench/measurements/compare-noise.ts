/**
 * A measured noise spectrum against the simulated output noise density. Unlike a frequency response, noise is an
 * absolute level (the rig's gain is already divided out when the spectrum is stored), so nothing is aligned: both
 * curves are compared in dBV/√Hz (re 1 V/√Hz) — the stored unit — with the simulation's V/√Hz converted by
 * 20·log10 and interpolated onto the measured frequencies the same way as a response (compare.ts).
 */
import { type Curve, type Deviation, interpolateLogF, maxDeviation } from "./compare";

/** V/√Hz → dBV/√Hz; NaN for a density that is not above zero (left out of the comparison). */
export const densityToDbv = (v: number) => (v > 0 ? 20 * Math.log10(v) : Number.NaN);

export interface NoiseComparison {
  frequency: number[];
  measured_dbv: number[];
  simulated_dbv: number[];
  /** measured − simulated, dB */
  difference_db: number[];
  band: { fromHz: number; toHz: number };
  max: Deviation | null;
}

export type NoiseComparisonResult = { ok: true; comparison: NoiseComparison } | { ok: false; message: string };

export function compareNoise(
  simulated: { frequency: readonly number[]; output_density: readonly number[] },
  measured: Curve,
  band: { fromHz: number; toHz: number },
): NoiseComparisonResult {
  const simDbv = simulated.output_density.map(densityToDbv);
  const out: NoiseComparison = {
    frequency: [],
    measured_dbv: [],
    simulated_dbv: [],
    difference_db: [],
    band: { fromHz: Math.min(band.fromHz, band.toHz), toHz: Math.max(band.fromHz, band.toHz) },
    max: null,
  };
  measured.frequency.forEach((f, i) => {
    const s = interpolateLogF(simulated.frequency, simDbv, f);
    if (!Number.isFinite(s)) return;
    out.frequency.push(f);
    out.measured_dbv.push(measured.level_db[i]);
    out.simulated_dbv.push(s);
    out.difference_db.push(measured.level_db[i] - s);
  });
  if (out.frequency.length === 0) {
    return { ok: false, message: "The measured spectrum lies outside the simulated noise range. Measure within the simulated frequencies." };
  }
  out.max = maxDeviation(out.frequency, out.difference_db, band.fromHz, band.toHz);
  return { ok: true, comparison: out };
}
