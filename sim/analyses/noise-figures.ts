/**
 * Figures derived from the noise analysis.
 * - self_noise_dba_spl: the equivalent noise level of IEC 60268-4, L = 20·log10(e_A / (M · p0)), e_A the
 *   A-weighted output noise (V), M the sensitivity (V/Pa, open circuit at 1 kHz), p0 = 20 µPa. Null when there is
 *   no sensitivity (no capsule driven) or the result is not finite.
 * - the input-referred noise density of a stage: output density / |H(f)| at each frequency.
 */
import { inputReferredDensity } from "../calculators/noise-figure";
import { REFERENCE_PRESSURE_PA } from "../constants";
import type { AcResult, NoiseResult } from "../results";

/** IEC 60268-4 equivalent noise level, dB(A) SPL, from A-weighted output noise (V) and sensitivity (V/Pa). */
export function selfNoiseDbaSpl(
  aWeightedNoiseV: number | null,
  sensitivityVPerPa: number | null | undefined,
): number | null {
  if (aWeightedNoiseV === null || sensitivityVPerPa === null || sensitivityVPerPa === undefined) return null;
  if (!(sensitivityVPerPa > 0) || !(aWeightedNoiseV > 0)) return null;
  const level = 20 * Math.log10(aWeightedNoiseV / (sensitivityVPerPa * REFERENCE_PRESSURE_PA));
  return Number.isFinite(level) ? level : null;
}

/**
 * Input-referred noise density (V/√Hz per unit of the drive: V for a voltage input, Pa for a capsule) at each
 * noise frequency: the output density divided by |H(f)| of the same circuit's AC response at that frequency.
 * The AC result must hold the noise analysis's frequencies (same grid); a frequency missing from it is an error.
 */
export function inputReferredNoise(noise: NoiseResult, response: AcResult): number[] {
  const index = new Map<number, number>();
  response.frequency.forEach((f, i) => {
    index.set(f, i);
  });
  return noise.frequency.map((f, i) => {
    const at = index.get(f);
    if (at === undefined) {
      throw new RangeError(`The AC response has no point at ${f} Hz; run it on the noise analysis's frequencies.`);
    }
    return inputReferredDensity(noise.output_density[i], { re: response.re[at], im: response.im[at] });
  });
}
