/**
 * Z-weighting ("zero"), IEC 61672-1: flat, 0 dB at every frequency. Kept as a weighting in its own right so that
 * callers can pass "no weighting" through the same interface as A and C.
 */
import { requireNonNegative, requirePositive } from "../calculators/validate";

/** Linear gain of the Z-weighting: 1 at every frequency (Hz, ≥ 0). */
export function zWeightingGain(frequencyHz: number): number {
  requireNonNegative("Z-weighting frequency", frequencyHz, "Hz");
  return 1;
}

/** Z-weighting in dB: 0 at every frequency (Hz, > 0, for symmetry with A and C). */
export function zWeightingDb(frequencyHz: number): number {
  requirePositive("Z-weighting frequency", frequencyHz, "Hz");
  return 0;
}
