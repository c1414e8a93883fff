/**
 * A-weighting, IEC 61672-1 (Annex E analytic form). The response is a product of real poles at
 * 20.6 Hz (double), 107.7 Hz, 737.9 Hz and 12194 Hz (double) with four zeros at 0 Hz; the +2.00 dB
 * normalisation makes it (almost exactly) 0 dB at 1 kHz. The constants are the standard's, not refitted,
 * so results agree with other implementations of the same formula.
 */
import { requireNonNegative, requirePositive } from "../calculators/validate";

/** Pole frequencies of the A-weighting, Hz (IEC 61672-1). */
export const A_WEIGHTING_POLES_HZ = { f1: 20.6, f2: 107.7, f3: 737.9, f4: 12194 } as const;

/** Normalisation added to the analytic response so that A(1 kHz) ≈ 0 dB (IEC 61672-1: +2.00 dB). */
export const A_WEIGHTING_NORMALISATION_DB = 2.0;

const NORMALISATION_GAIN = 10 ** (A_WEIGHTING_NORMALISATION_DB / 20);

/** Un-normalised analytic response R_A(f) (dimensionless); 0 at DC. */
function analyticResponse(frequencyHz: number): number {
  const { f1, f2, f3, f4 } = A_WEIGHTING_POLES_HZ;
  const f2sq = frequencyHz * frequencyHz;
  const numerator = f4 * f4 * f2sq * f2sq;
  const denominator = (f2sq + f1 * f1) * Math.sqrt((f2sq + f2 * f2) * (f2sq + f3 * f3)) * (f2sq + f4 * f4);
  return numerator / denominator;
}

/** Linear amplitude gain of the A-weighting at `frequencyHz` (Hz, ≥ 0); ≈ 1 at 1 kHz, 0 at DC. */
export function aWeightingGain(frequencyHz: number): number {
  requireNonNegative("A-weighting frequency", frequencyHz, "Hz");
  return analyticResponse(frequencyHz) * NORMALISATION_GAIN;
}

/** A-weighting in dB at `frequencyHz` (Hz, > 0: the weighting is −∞ dB at DC). */
export function aWeightingDb(frequencyHz: number): number {
  requirePositive("A-weighting frequency", frequencyHz, "Hz");
  return 20 * Math.log10(analyticResponse(frequencyHz)) + A_WEIGHTING_NORMALISATION_DB;
}
