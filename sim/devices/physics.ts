/** Thermal voltage and thermal-noise helpers shared by the device models. SI units. */
import { BOLTZMANN_J_PER_K, ELEMENTARY_CHARGE_C } from "../constants";

/** Vt = kT/q, V */
export function thermalVoltage(temperatureK: number): number {
  return (BOLTZMANN_J_PER_K * temperatureK) / ELEMENTARY_CHARGE_C;
}

/** Johnson–Nyquist current noise of a conductance g: 4kTg, A²/Hz */
export function thermalCurrentPsd(temperatureK: number, conductance: number): number {
  return 4 * BOLTZMANN_J_PER_K * temperatureK * conductance;
}

/** Johnson–Nyquist voltage noise of a resistance r: 4kTr, V²/Hz */
export function thermalVoltagePsd(temperatureK: number, resistance: number): number {
  return 4 * BOLTZMANN_J_PER_K * temperatureK * resistance;
}

/** Shot noise of a DC current: 2q|I|, A²/Hz */
export function shotPsd(current: number): number {
  return 2 * ELEMENTARY_CHARGE_C * Math.abs(current);
}
