/**
 * Backplate's pure-function calculators and acoustic helpers, in one place. Every function takes and returns SI
 * units (unless its name says dB, dBu or mV), validates its inputs, and throws a `RangeError` saying what to fix.
 *
 * - Frequency weightings (IEC 61672-1): A, C, Z — gains and dB at a frequency or over a grid.
 * - Levels (IEC 60268-4): SPL ↔ Pa, sensitivity V/Pa ↔ dB re 1 V/Pa ↔ mV/Pa, equivalent noise level.
 * - Spectrum RMS by the circuit-file contract's trapezoid rule, optionally weighted (used by the noise analysis).
 * - Thermal noise √(4kTR) and dBu.
 * - Capsule physics: capacitance, membrane deflection and strain per pascal, resonance, collapse, sensitivity.
 * - Bias network: time constant, high-pass corner, bias-resistor noise (density, kT/C total, weighted RMS).
 * - Phantom powering (IEC 61938): voltage at the microphone, short circuit, maximum power, worst cases, fit verdict.
 * - Cable loading: cable capacitance, divider loss, loss at 1 kHz and −3 dB corner.
 * - Noise factor / noise figure, optimum source resistance, input-referred density of a stage.
 */
export * from "../acoustics/a-weighting";
export * from "../acoustics/c-weighting";
export {
  dbReVPerPaToSensitivity,
  equivalentNoiseLevel,
  mvPerPaToSensitivity,
  pascalsToSpl,
  sensitivityToDbReVPerPa,
  sensitivityToMvPerPa,
  splToPascals,
} from "../acoustics/spl";
export * from "../acoustics/weighted-rms";
export * from "../acoustics/weighting";
export * from "../acoustics/z-weighting";
export * from "./bias-network";
export * from "./cable-loading";
export * from "./capsule-physics";
export * from "./noise-figure";
export * from "./phantom";
export * from "./thermal-noise";
