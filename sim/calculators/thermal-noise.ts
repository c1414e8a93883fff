/**
 * Johnson–Nyquist thermal noise of a resistance (Johnson 1928, Nyquist 1928): one-sided power density 4kTR,
 * white at audio frequencies.
 */
import { BOLTZMANN_J_PER_K, DBU_REFERENCE_VOLTS, DEFAULT_TEMPERATURE_K } from "../constants";
import { requireFinite, requirePositive } from "./validate";

/** Open-circuit noise density √(4kTR), V/√Hz, of a resistance R (Ω, > 0) at temperature T (K, > 0). */
export function thermalNoiseDensity(resistanceOhm: number, temperatureK: number = DEFAULT_TEMPERATURE_K): number {
  requirePositive("Resistance", resistanceOhm, "Ω");
  requirePositive("Temperature", temperatureK, "K");
  return Math.sqrt(4 * BOLTZMANN_J_PER_K * temperatureK * resistanceOhm);
}

/** Open-circuit RMS noise √(4kTRB), V, of a resistance R (Ω) over a bandwidth B (Hz, > 0) at T (K). */
export function thermalNoiseRms(
  resistanceOhm: number,
  bandwidthHz: number,
  temperatureK: number = DEFAULT_TEMPERATURE_K,
): number {
  requirePositive("Bandwidth", bandwidthHz, "Hz");
  return thermalNoiseDensity(resistanceOhm, temperatureK) * Math.sqrt(bandwidthHz);
}

/** Level in dBu (0 dBu = 0.7746 V RMS, common practice) of an RMS voltage (V, > 0). */
export function voltsToDbu(voltsRms: number): number {
  requirePositive("Voltage", voltsRms, "V");
  return 20 * Math.log10(voltsRms / DBU_REFERENCE_VOLTS);
}

/** RMS voltage (V) of a level in dBu. */
export function dbuToVolts(dbu: number): number {
  requireFinite("Level", dbu, "dBu");
  return DBU_REFERENCE_VOLTS * 10 ** (dbu / 20);
}
