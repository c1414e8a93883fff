/**
 * RMS of a noise spectrum given as a power density on a sorted frequency grid — the rule the circuit-file contract
 * fixes for the noise analysis's `rms` and `rms_a_weighted`: √(trapezoid rule of the power density, linear in f,
 * over the grid points, both ends included), where a weighting multiplies each point's power density by the
 * weighting's linear gain squared (a weighting is an amplitude response; power goes as its square).
 */
import { requireNonNegative } from "../calculators/validate";
import { type FrequencyWeighting, type WeightingName, weightingByName } from "./weighting";

/**
 * RMS value (V, or the density's own unit × √Hz) of a power spectral density.
 * @param frequenciesHz grid in Hz, ascending (equal neighbours allowed: they add nothing), every value ≥ 0.
 * @param powerDensity power spectral density at each frequency (V²/Hz), ≥ 0, same length as the grid.
 * @param weighting optional frequency weighting ("A", "C", "Z" or a weighting object); none means flat.
 * A single point spans no bandwidth and gives 0.
 */
export function rmsFromPowerDensity(
  frequenciesHz: ArrayLike<number>,
  powerDensity: ArrayLike<number>,
  weighting?: WeightingName | FrequencyWeighting,
): number {
  if (frequenciesHz.length === 0) {
    throw new RangeError("The frequency grid is empty; give at least one frequency (Hz).");
  }
  if (frequenciesHz.length !== powerDensity.length) {
    throw new RangeError(
      `The frequency grid has ${frequenciesHz.length} points but the power density has ${powerDensity.length}; give one density per frequency.`,
    );
  }
  const w =
    weighting === undefined ? undefined : typeof weighting === "string" ? weightingByName(weighting) : weighting;
  const weighted = (i: number): number => {
    const f = requireNonNegative(`Frequency at index ${i}`, frequenciesHz[i], "Hz");
    const s = requireNonNegative(`Power density at index ${i}`, powerDensity[i], "V²/Hz");
    if (w === undefined) return s;
    const g = w.gain(f);
    return s * g * g;
  };
  let sum = 0;
  let previous = weighted(0);
  for (let i = 1; i < frequenciesHz.length; i++) {
    const width = frequenciesHz[i] - frequenciesHz[i - 1];
    if (!(width >= 0)) {
      throw new RangeError(
        `Frequencies must be sorted ascending; index ${i} (${frequenciesHz[i]} Hz) is below index ${i - 1} (${frequenciesHz[i - 1]} Hz).`,
      );
    }
    const current = weighted(i);
    sum += 0.5 * width * (previous + current);
    previous = current;
  }
  return Math.sqrt(sum);
}

/** As `rmsFromPowerDensity`, for an amplitude density in V/√Hz (each value ≥ 0), squared point by point. */
export function rmsFromAmplitudeDensity(
  frequenciesHz: ArrayLike<number>,
  amplitudeDensity: ArrayLike<number>,
  weighting?: WeightingName | FrequencyWeighting,
): number {
  const power = new Float64Array(amplitudeDensity.length);
  for (let i = 0; i < amplitudeDensity.length; i++) {
    const v = requireNonNegative(`Amplitude density at index ${i}`, amplitudeDensity[i], "V/√Hz");
    power[i] = v * v;
  }
  return rmsFromPowerDensity(frequenciesHz, power, weighting);
}

/**
 * Log-spaced grid from `fromHz` to `toHz` (both included), `pointsPerDecade` per decade — the grid shape the
 * contract's noise and AC analyses use; handy for integrating a closed-form density.
 */
export function logFrequencyGrid(fromHz: number, toHz: number, pointsPerDecade: number): Float64Array {
  if (!Number.isFinite(fromHz) || fromHz <= 0 || !Number.isFinite(toHz) || toHz <= fromHz) {
    throw new RangeError(`A log grid needs 0 < from < to (Hz), both finite; got from ${fromHz} Hz, to ${toHz} Hz.`);
  }
  if (!Number.isInteger(pointsPerDecade) || pointsPerDecade < 1) {
    throw new RangeError(`Points per decade must be a whole number of at least 1; got ${pointsPerDecade}.`);
  }
  const decades = Math.log10(toHz / fromHz);
  const intervals = Math.max(1, Math.ceil(decades * pointsPerDecade - 1e-9));
  const grid = new Float64Array(intervals + 1);
  for (let i = 0; i <= intervals; i++) grid[i] = fromHz * 10 ** ((decades * i) / intervals);
  grid[intervals] = toHz;
  return grid;
}
