/**
 * Physical constants and reference values shared by the engine and the calculators. SI units throughout.
 * Each value names its source; the engine and the calculators import from here so that a figure computed in one
 * place agrees with the same figure computed in another.
 */

/** Boltzmann constant k, J/K. Exact by definition (SI Brochure, 9th edition, 2019). */
export const BOLTZMANN_J_PER_K = 1.380649e-23;

/** Elementary charge q, C. Exact by definition (SI Brochure, 9th edition, 2019). */
export const ELEMENTARY_CHARGE_C = 1.602176634e-19;

/** Vacuum permittivity ε0, F/m (CODATA 2018 recommended value). Air is taken as vacuum (εr ≈ 1.0006). */
export const VACUUM_PERMITTIVITY_F_PER_M = 8.8541878128e-12;

/** Reference sound pressure for SPL in air, Pa: 20 µPa (IEC 60268-4 / ISO 1683; common practice). */
export const REFERENCE_PRESSURE_PA = 20e-6;

/**
 * Default analysis temperature, K: 25 °C. The circuit-file contract uses 298.15 K when an analysis gives no
 * `temperature`.
 */
export const DEFAULT_TEMPERATURE_K = 298.15;

/**
 * Reference noise temperature T0 used in the definition of noise factor, K: 290 K (IRE/IEEE definition of noise
 * figure, following Friis 1944; from memory).
 */
export const NOISE_FIGURE_REFERENCE_TEMPERATURE_K = 290;

/** Voltage for 0 dBu, V: √(1 mW × 600 Ω) ≈ 0.7746 V (common practice in audio). */
export const DBU_REFERENCE_VOLTS = Math.sqrt(0.6);
