/**
 * Noise factor and noise figure of an amplifier from its input-referred noise, in the two-generator model: a
 * voltage-noise density e_n in series with the input and a current-noise density i_n into it, taken as
 * uncorrelated. Against a source resistance R_s at the reference temperature T0:
 *   F = (4kT0·R_s + e_n² + i_n²·R_s²) / (4kT0·R_s) = 1 + e_n²/(4kT0·R_s) + i_n²·R_s/(4kT0),   NF = 10·log10 F.
 * F is the Friis definition (Friis 1944: input signal-to-noise over output signal-to-noise, with the source at
 * T0 = 290 K per the IRE/IEEE definition — from memory). SI units (V/√Hz, A/√Hz, Ω, K).
 */
import { BOLTZMANN_J_PER_K, NOISE_FIGURE_REFERENCE_TEMPERATURE_K } from "../constants";
import { requireNonNegative, requirePositive } from "./validate";

export interface AmplifierNoise {
  /** Input-referred voltage-noise density e_n, V/√Hz (≥ 0). */
  voltageNoiseDensity: number;
  /** Input-referred current-noise density i_n, A/√Hz (≥ 0) [0]. */
  currentNoiseDensity?: number;
}

function checkedNoise(amplifier: AmplifierNoise) {
  return {
    en: requireNonNegative("Voltage-noise density", amplifier.voltageNoiseDensity, "V/√Hz"),
    in: requireNonNegative("Current-noise density", amplifier.currentNoiseDensity ?? 0, "A/√Hz"),
  };
}

/**
 * Total noise density referred to the input with the source connected, √(4kT·R_s + e_n² + i_n²·R_s²), V/√Hz.
 * Divide by the source's own √(4kT·R_s) and square to get F.
 */
export function totalInputNoiseDensity(
  amplifier: AmplifierNoise,
  sourceResistanceOhm: number,
  temperatureK: number = NOISE_FIGURE_REFERENCE_TEMPERATURE_K,
): number {
  const { en, in: inoise } = checkedNoise(amplifier);
  const rs = requirePositive("Source resistance", sourceResistanceOhm, "Ω");
  requirePositive("Temperature", temperatureK, "K");
  return Math.sqrt(4 * BOLTZMANN_J_PER_K * temperatureK * rs + en * en + inoise * inoise * rs * rs);
}

/** Noise factor F (dimensionless, ≥ 1) of the amplifier against a source resistance R_s (Ω) at T (K, default 290 K). */
export function noiseFactor(
  amplifier: AmplifierNoise,
  sourceResistanceOhm: number,
  temperatureK: number = NOISE_FIGURE_REFERENCE_TEMPERATURE_K,
): number {
  const { en, in: inoise } = checkedNoise(amplifier);
  const rs = requirePositive("Source resistance", sourceResistanceOhm, "Ω");
  const fourKT = 4 * BOLTZMANN_J_PER_K * requirePositive("Temperature", temperatureK, "K");
  return 1 + (en * en) / (fourKT * rs) + (inoise * inoise * rs) / fourKT;
}

/** Noise figure NF = 10·log10 F, dB. */
export function noiseFigureDb(
  amplifier: AmplifierNoise,
  sourceResistanceOhm: number,
  temperatureK: number = NOISE_FIGURE_REFERENCE_TEMPERATURE_K,
): number {
  return 10 * Math.log10(noiseFactor(amplifier, sourceResistanceOhm, temperatureK));
}

/**
 * Source resistance that minimises F, e_n/i_n (Ω), and that minimum, F_min = 1 + e_n·i_n/(2kT) — the standard
 * noise-matching result for uncorrelated generators. Needs both densities > 0.
 */
export function optimumNoiseMatch(
  amplifier: AmplifierNoise,
  temperatureK: number = NOISE_FIGURE_REFERENCE_TEMPERATURE_K,
): { sourceResistanceOhm: number; minimumNoiseFactor: number; minimumNoiseFigureDb: number } {
  const en = requirePositive("Voltage-noise density", amplifier.voltageNoiseDensity, "V/√Hz");
  const inoise = requirePositive("Current-noise density", amplifier.currentNoiseDensity ?? 0, "A/√Hz");
  requirePositive("Temperature", temperatureK, "K");
  const minimumNoiseFactor = 1 + (en * inoise) / (2 * BOLTZMANN_J_PER_K * temperatureK);
  return {
    sourceResistanceOhm: en / inoise,
    minimumNoiseFactor,
    minimumNoiseFigureDb: 10 * Math.log10(minimumNoiseFactor),
  };
}

/**
 * Input-referred noise density of a stage, output density / |gain| (V/√Hz, or the output's unit per √Hz).
 * @param outputDensity noise density at the output (≥ 0)
 * @param gain the stage's gain at the same frequency — a real number (any sign; its magnitude is used) or a
 *   complex value given as { re, im }; must not be zero.
 */
export function inputReferredDensity(outputDensity: number, gain: number | { re: number; im: number }): number {
  requireNonNegative("Output noise density", outputDensity, "per √Hz");
  const magnitude = typeof gain === "number" ? Math.abs(gain) : Math.hypot(gain.re, gain.im);
  requirePositive("Gain magnitude", magnitude, "(dimensionless; a stage with zero gain has no input-referred noise)");
  return outputDensity / magnitude;
}
