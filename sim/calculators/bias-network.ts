/**
 * The capsule's bias (charging) network: a resistor R from the polarisation supply to the diaphragm, the capsule
 * capacitance C to the backplate. R and C set the charging time and the acoustic high-pass corner, and R's thermal
 * noise, filtered by the same RC, is the floor of every condenser microphone. SI units (Ω, F, s, Hz, K, V).
 */
import { logFrequencyGrid, rmsFromPowerDensity } from "../acoustics/weighted-rms";
import type { WeightingName } from "../acoustics/weighting";
import { BOLTZMANN_J_PER_K, DEFAULT_TEMPERATURE_K } from "../constants";
import { requirePositive } from "./validate";

/**
 * Grid density for the weighted-noise integral. The density is smooth in log f, so 200 points per decade puts the
 * trapezoid rule's error far below 0.1 % (checked against an independent Simpson integral in the tests).
 */
export const BIAS_NOISE_POINTS_PER_DECADE = 200;

/** Audio band used for weighted self-noise figures, Hz (common practice: 20 Hz–20 kHz). */
export const AUDIO_BAND_HZ = { from: 20, to: 20000 } as const;

/** Charging time constant τ = R·C, s. */
export function chargingTimeConstant(resistanceOhm: number, capacitanceF: number): number {
  requirePositive("Bias resistance", resistanceOhm, "Ω");
  requirePositive("Capsule capacitance", capacitanceF, "F");
  return resistanceOhm * capacitanceF;
}

/** High-pass corner 1/(2πRC), Hz, that the bias resistor sets against the capsule (into a high-impedance stage). */
export function biasHighPassCorner(resistanceOhm: number, capacitanceF: number): number {
  return 1 / (2 * Math.PI * chargingTimeConstant(resistanceOhm, capacitanceF));
}

/**
 * Power density of the bias resistor's noise at the capsule, e²(f) = 4kTR / (1 + (2πfRC)²), V²/Hz
 * (Johnson–Nyquist noise of R, low-passed by the capsule's C).
 */
export function biasNoisePowerDensity(
  frequencyHz: number,
  resistanceOhm: number,
  capacitanceF: number,
  temperatureK: number = DEFAULT_TEMPERATURE_K,
): number {
  if (!Number.isFinite(frequencyHz) || frequencyHz < 0) {
    throw new RangeError(`Frequency must be a finite number of at least 0 Hz; got ${String(frequencyHz)}.`);
  }
  requirePositive("Temperature", temperatureK, "K");
  const wRC = 2 * Math.PI * frequencyHz * chargingTimeConstant(resistanceOhm, capacitanceF);
  return (4 * BOLTZMANN_J_PER_K * temperatureK * resistanceOhm) / (1 + wRC * wRC);
}

/** Amplitude density √e²(f), V/√Hz, of the bias resistor's noise at the capsule. */
export function biasNoiseDensity(
  frequencyHz: number,
  resistanceOhm: number,
  capacitanceF: number,
  temperatureK: number = DEFAULT_TEMPERATURE_K,
): number {
  return Math.sqrt(biasNoisePowerDensity(frequencyHz, resistanceOhm, capacitanceF, temperatureK));
}

/**
 * Total noise power over all frequencies, kT/C, V² — independent of R (standard result): a larger R concentrates
 * the same power below the audio band rather than removing it.
 */
export function biasNoiseTotalPower(capacitanceF: number, temperatureK: number = DEFAULT_TEMPERATURE_K): number {
  requirePositive("Capsule capacitance", capacitanceF, "F");
  requirePositive("Temperature", temperatureK, "K");
  return (BOLTZMANN_J_PER_K * temperatureK) / capacitanceF;
}

export interface WeightedBandOptions {
  /** Band start, Hz [20]. */
  fromHz?: number;
  /** Band end, Hz [20 000]. */
  toHz?: number;
  /** Weighting [A]. */
  weighting?: WeightingName;
  /** Temperature, K [298.15]. */
  temperatureK?: number;
}

/**
 * Weighted RMS of the bias resistor's noise at the capsule over a band, V — by the contract's trapezoid rule on a
 * fine log grid, so it agrees with what the noise analysis reports for the bare RC.
 */
export function biasNoiseWeightedRms(
  resistanceOhm: number,
  capacitanceF: number,
  options: WeightedBandOptions = {},
): number {
  const {
    fromHz = AUDIO_BAND_HZ.from,
    toHz = AUDIO_BAND_HZ.to,
    weighting = "A",
    temperatureK = DEFAULT_TEMPERATURE_K,
  } = options;
  const grid = logFrequencyGrid(fromHz, toHz, BIAS_NOISE_POINTS_PER_DECADE);
  const psd = grid.map((f) => biasNoisePowerDensity(f, resistanceOhm, capacitanceF, temperatureK));
  return rmsFromPowerDensity(grid, psd, weighting);
}
