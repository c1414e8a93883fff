/**
 * Acoustic and microphone levels (IEC 60268-4): sound pressure level re 20 µPa, sensitivity in V/Pa, dB re 1 V/Pa
 * and mV/Pa, and the equivalent noise level of a microphone from its self-noise and sensitivity.
 * Pressures are RMS pascals; voltages RMS volts.
 */

import { requireFinite, requirePositive } from "../calculators/validate";
import { REFERENCE_PRESSURE_PA } from "../constants";

export { rmsFromAmplitudeDensity, rmsFromPowerDensity } from "./weighted-rms";

/** Sound pressure level, dB SPL re 20 µPa, of an RMS pressure in Pa (> 0). 1 Pa ≈ 93.98 dB SPL. */
export function pascalsToSpl(pressurePa: number): number {
  requirePositive("Sound pressure", pressurePa, "Pa");
  return 20 * Math.log10(pressurePa / REFERENCE_PRESSURE_PA);
}

/** RMS pressure in Pa of a sound pressure level in dB SPL re 20 µPa. */
export function splToPascals(splDb: number): number {
  requireFinite("Sound pressure level", splDb, "dB SPL");
  return REFERENCE_PRESSURE_PA * 10 ** (splDb / 20);
}

/** Sensitivity in dB re 1 V/Pa of a sensitivity in V/Pa (> 0). */
export function sensitivityToDbReVPerPa(voltsPerPascal: number): number {
  requirePositive("Sensitivity", voltsPerPascal, "V/Pa");
  return 20 * Math.log10(voltsPerPascal);
}

/** Sensitivity in V/Pa of a level in dB re 1 V/Pa. */
export function dbReVPerPaToSensitivity(dbReVPerPa: number): number {
  requireFinite("Sensitivity level", dbReVPerPa, "dB re 1 V/Pa");
  return 10 ** (dbReVPerPa / 20);
}

/** mV/Pa of a sensitivity in V/Pa (> 0). */
export function sensitivityToMvPerPa(voltsPerPascal: number): number {
  requirePositive("Sensitivity", voltsPerPascal, "V/Pa");
  return voltsPerPascal * 1000;
}

/** V/Pa of a sensitivity in mV/Pa (> 0). */
export function mvPerPaToSensitivity(millivoltsPerPascal: number): number {
  requirePositive("Sensitivity", millivoltsPerPascal, "mV/Pa");
  return millivoltsPerPascal / 1000;
}

/**
 * Equivalent noise level, dB SPL (IEC 60268-4): the SPL whose output equals the self-noise,
 * L = 20·log10(Vn / (M · 20 µPa)) — i.e. 93.98 dB + 20·log10(Vn/M). Pass an A-weighted Vn for dB(A).
 * @param noiseVoltsRms self-noise at the output, V RMS (> 0)
 * @param sensitivityVoltsPerPascal sensitivity at the same output, V/Pa (> 0)
 */
export function equivalentNoiseLevel(noiseVoltsRms: number, sensitivityVoltsPerPascal: number): number {
  requirePositive("Self-noise voltage", noiseVoltsRms, "V");
  requirePositive("Sensitivity", sensitivityVoltsPerPascal, "V/Pa");
  return 20 * Math.log10(noiseVoltsRms / (sensitivityVoltsPerPascal * REFERENCE_PRESSURE_PA));
}
