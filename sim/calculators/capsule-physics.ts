/**
 * Lumped physics of a condenser capsule: a circular membrane of radius a under uniform tension T, a gap d above a
 * rigid backplate, polarised to E0. SI units (m, N/m, kg/m², V, Pa, F, Hz).
 *
 * Model and its limits:
 * - The membrane is a tensioned membrane (no bending stiffness). Under a uniform pressure p its static profile is
 *   the parabola w(r) = p·(a² − r²)/(4T); its mean over the area is p·a²/(8T) (acoustics handbooks).
 * - The capsule is treated as a parallel-plate capacitor whose gap changes by the mean deflection, so at constant
 *   charge ΔV = E0·Δd/d, giving the open-circuit sensitivity M = E0·a²/(8·T·d) (formula from memory in the
 *   reference notes). The stiffness of the air trapped in the gap and behind the backplate is neglected, so real
 *   capsules are less sensitive than this.
 * - Collapse: a parallel-plate electrode on a linear spring k_s pulls in after travelling d/3, at
 *   V = √(8·k_s·d³ / (27·ε0·A)) (standard electrostatic-actuator result; from memory). The membrane's equivalent
 *   spring is taken from the same mean-deflection model: force p·πa² over mean deflection p·a²/(8T) gives
 *   k_s = 8πT. This is an estimate — the membrane is not a piston and its centre moves twice the mean — so treat
 *   the collapse voltage as an order of magnitude for the margin over the polarisation, not a rating.
 */
import { VACUUM_PERMITTIVITY_F_PER_M } from "../constants";
import { requirePositive } from "./validate";

/** First zero of the Bessel function J0 — the fundamental (0,1) mode of a clamped circular membrane. */
export const BESSEL_J0_FIRST_ZERO = 2.404825557695773;

/** Parallel-plate capacitance ε0·π·a²/d, F, of a circular plate of radius a (m) over a gap d (m). */
export function parallelPlateCapacitance(radiusM: number, gapM: number): number {
  requirePositive("Membrane radius", radiusM, "m");
  requirePositive("Gap", gapM, "m");
  return (VACUUM_PERMITTIVITY_F_PER_M * Math.PI * radiusM * radiusM) / gapM;
}

/** Mean deflection p·a²/(8T), m, of a membrane of radius a (m) and tension T (N/m) under pressure p (Pa, > 0). */
export function membraneMeanDeflection(pressurePa: number, radiusM: number, tensionNPerM: number): number {
  requirePositive("Pressure", pressurePa, "Pa");
  requirePositive("Membrane radius", radiusM, "m");
  requirePositive("Membrane tension", tensionNPerM, "N/m");
  return (pressurePa * radiusM * radiusM) / (8 * tensionNPerM);
}

/**
 * Fractional gap change per pascal, 1/Pa: mean deflection per Pa over the gap, a²/(8·T·d). This is the value the
 * circuit file's capsule field `strain_per_pa` expects.
 */
export function strainPerPascal(radiusM: number, tensionNPerM: number, gapM: number): number {
  requirePositive("Gap", gapM, "m");
  return membraneMeanDeflection(1, radiusM, tensionNPerM) / gapM;
}

/** Areal density σ = ρ·h, kg/m², of a membrane of thickness h (m) and material density ρ (kg/m³). */
export function membraneArealDensity(thicknessM: number, densityKgPerM3: number): number {
  requirePositive("Membrane thickness", thicknessM, "m");
  requirePositive("Membrane material density", densityKgPerM3, "kg/m³");
  return thicknessM * densityKgPerM3;
}

/** Fundamental resonance (2.405/(2πa))·√(T/σ), Hz, of a clamped circular membrane in vacuum (no air loading). */
export function membraneResonance(radiusM: number, tensionNPerM: number, arealDensityKgPerM2: number): number {
  requirePositive("Membrane radius", radiusM, "m");
  requirePositive("Membrane tension", tensionNPerM, "N/m");
  requirePositive("Membrane areal density", arealDensityKgPerM2, "kg/m²");
  return (BESSEL_J0_FIRST_ZERO / (2 * Math.PI * radiusM)) * Math.sqrt(tensionNPerM / arealDensityKgPerM2);
}

/** Equivalent piston spring of a tensioned membrane, N/m: k_s = 8πT (see the model notes above; depends on T only). */
export function membraneSpringStiffness(tensionNPerM: number): number {
  requirePositive("Membrane tension", tensionNPerM, "N/m");
  return 8 * Math.PI * tensionNPerM;
}

/**
 * Electrostatic collapse (pull-in) voltage √(8·k_s·d³/(27·ε0·A)), V, of a spring-suspended plate of area A = πa²
 * over a gap d, with k_s from `membraneSpringStiffness` (from memory; an estimate, see the model notes).
 */
export function collapseVoltage(radiusM: number, tensionNPerM: number, gapM: number): number {
  requirePositive("Membrane radius", radiusM, "m");
  requirePositive("Gap", gapM, "m");
  const spring = membraneSpringStiffness(tensionNPerM);
  const area = Math.PI * radiusM * radiusM;
  return Math.sqrt((8 * spring * gapM ** 3) / (27 * VACUUM_PERMITTIVITY_F_PER_M * area));
}

/** Open-circuit sensitivity M = E0·a²/(8·T·d), V/Pa, for a polarisation E0 (V, > 0). Air stiffness neglected. */
export function openCircuitSensitivity(
  polarisationV: number,
  radiusM: number,
  tensionNPerM: number,
  gapM: number,
): number {
  requirePositive("Polarisation voltage", polarisationV, "V");
  return polarisationV * strainPerPascal(radiusM, tensionNPerM, gapM);
}

export interface CapsuleGeometry {
  /** Membrane radius a, m. */
  radiusM: number;
  /** Membrane-to-backplate gap d, m. */
  gapM: number;
  /** Membrane tension T, N/m. */
  tensionNPerM: number;
  /** Membrane mass per area σ, kg/m². */
  arealDensityKgPerM2: number;
  /** Polarisation (external bias plus any electret voltage) E0, V. */
  polarisationV: number;
}

export interface CapsuleFigures {
  /** Rest capacitance, F. */
  capacitanceF: number;
  /** Fractional gap change per pascal, 1/Pa — the circuit file's `strain_per_pa`. */
  strain_per_pa: number;
  /** Open-circuit sensitivity, V/Pa. */
  sensitivityVPerPa: number;
  /** Fundamental membrane resonance, Hz. */
  resonanceHz: number;
  /** Estimated collapse voltage, V. */
  collapseVoltageV: number;
  /** Polarisation as a fraction of the estimated collapse voltage (dimensionless); well below 1 is wanted. */
  polarisationToCollapseRatio: number;
}

/** Every figure above for one capsule geometry. */
export function capsuleFigures(geometry: CapsuleGeometry): CapsuleFigures {
  const { radiusM, gapM, tensionNPerM, arealDensityKgPerM2, polarisationV } = geometry;
  const collapseVoltageV = collapseVoltage(radiusM, tensionNPerM, gapM);
  return {
    capacitanceF: parallelPlateCapacitance(radiusM, gapM),
    strain_per_pa: strainPerPascal(radiusM, tensionNPerM, gapM),
    sensitivityVPerPa: openCircuitSensitivity(polarisationV, radiusM, tensionNPerM, gapM),
    resonanceHz: membraneResonance(radiusM, tensionNPerM, arealDensityKgPerM2),
    collapseVoltageV,
    polarisationToCollapseRatio: polarisationV / collapseVoltageV,
  };
}
