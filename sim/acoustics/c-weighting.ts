/**
 * C-weighting, IEC 61672-1 (Annex E analytic form): double real poles at 20.6 Hz and 12194 Hz, two zeros at
 * 0 Hz, and a +0.06 dB normalisation so that C(1 kHz) ≈ 0 dB.
 */
import { requireNonNegative, requirePositive } from "../calculators/validate";
import { A_WEIGHTING_POLES_HZ } from "./a-weighting";

/** Pole frequencies of the C-weighting, Hz (IEC 61672-1; the same outer poles as the A-weighting). */
export const C_WEIGHTING_POLES_HZ = { f1: A_WEIGHTING_POLES_HZ.f1, f4: A_WEIGHTING_POLES_HZ.f4 } as const;

/** Normalisation added to the analytic response (IEC 61672-1: +0.06 dB). */
export const C_WEIGHTING_NORMALISATION_DB = 0.06;

const NORMALISATION_GAIN = 10 ** (C_WEIGHTING_NORMALISATION_DB / 20);

/** Un-normalised analytic response R_C(f) (dimensionless); 0 at DC. */
function analyticResponse(frequencyHz: number): number {
  const { f1, f4 } = C_WEIGHTING_POLES_HZ;
  const f2sq = frequencyHz * frequencyHz;
  return (f4 * f4 * f2sq) / ((f2sq + f1 * f1) * (f2sq + f4 * f4));
}

/** Linear amplitude gain of the C-weighting at `frequencyHz` (Hz, ≥ 0); ≈ 1 at 1 kHz, 0 at DC. */
export function cWeightingGain(frequencyHz: number): number {
  requireNonNegative("C-weighting frequency", frequencyHz, "Hz");
  return analyticResponse(frequencyHz) * NORMALISATION_GAIN;
}

/** C-weighting in dB at `frequencyHz` (Hz, > 0: the weighting is −∞ dB at DC). */
export function cWeightingDb(frequencyHz: number): number {
  requirePositive("C-weighting frequency", frequencyHz, "Hz");
  return 20 * Math.log10(analyticResponse(frequencyHz)) + C_WEIGHTING_NORMALISATION_DB;
}
