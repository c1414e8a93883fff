/**
 * One interface over the IEC 61672-1 frequency weightings (A, C, Z), by name, with helpers that weight a whole
 * array of frequencies at once (a noise or frequency-response grid).
 */
import { aWeightingDb, aWeightingGain } from "./a-weighting";
import { cWeightingDb, cWeightingGain } from "./c-weighting";
import { zWeightingDb, zWeightingGain } from "./z-weighting";

export type WeightingName = "A" | "C" | "Z";

export interface FrequencyWeighting {
  readonly name: WeightingName;
  /** Linear amplitude gain at a frequency in Hz (≥ 0). */
  gain(frequencyHz: number): number;
  /** Gain in dB at a frequency in Hz (> 0). */
  db(frequencyHz: number): number;
}

export const WEIGHTINGS: Readonly<Record<WeightingName, FrequencyWeighting>> = {
  A: { name: "A", gain: aWeightingGain, db: aWeightingDb },
  C: { name: "C", gain: cWeightingGain, db: cWeightingDb },
  Z: { name: "Z", gain: zWeightingGain, db: zWeightingDb },
};

/** Looks a weighting up by name; throws a `RangeError` listing the known names otherwise. */
export function weightingByName(name: string): FrequencyWeighting {
  if (name === "A" || name === "C" || name === "Z") return WEIGHTINGS[name];
  throw new RangeError(`Unknown frequency weighting "${name}"; use "A", "C" or "Z" (IEC 61672-1).`);
}

/** Linear gains of `weighting` at each frequency (Hz). */
export function weightingGains(
  weighting: WeightingName | FrequencyWeighting,
  frequenciesHz: ArrayLike<number>,
): Float64Array {
  const w = typeof weighting === "string" ? weightingByName(weighting) : weighting;
  const out = new Float64Array(frequenciesHz.length);
  for (let i = 0; i < frequenciesHz.length; i++) out[i] = w.gain(frequenciesHz[i]);
  return out;
}

/** Weighting in dB at each frequency (Hz, each > 0). */
export function weightingDbs(
  weighting: WeightingName | FrequencyWeighting,
  frequenciesHz: ArrayLike<number>,
): Float64Array {
  const w = typeof weighting === "string" ? weightingByName(weighting) : weighting;
  const out = new Float64Array(frequenciesHz.length);
  for (let i = 0; i < frequenciesHz.length; i++) out[i] = w.db(frequenciesHz[i]);
  return out;
}
