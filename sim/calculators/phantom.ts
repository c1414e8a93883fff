/**
 * Phantom powering per IEC 61938: the supply feeds both signal legs through equal resistors, and the microphone
 * takes its current common-mode from the two legs in parallel, so it sees V_supply − I·R/2. SI units (V, A, Ω, W).
 */
import { requireFraction, requireNonNegative, requirePositive } from "./validate";

export type PhantomSystemName = "P48" | "P24" | "P12";

export interface PhantomSystem {
  name: PhantomSystemName;
  /** Nominal supply voltage, V. */
  supplyV: number;
  /** Permitted deviation of the supply either way, V. */
  supplyToleranceV: number;
  /** Feed resistor in each leg, Ω. */
  feedResistorOhm: number;
  /** Largest current the microphone may draw (both legs together), A. */
  maxCurrentA: number;
  /** Which entries were not confirmed against the standard's text (from memory). */
  fromMemory: readonly ("supplyToleranceV" | "maxCurrentA")[];
}

/**
 * The IEC 61938 systems as given in the project's reference notes. P48: 48 ± 4 V, 6.8 kΩ per leg (6.81 kΩ is the
 * usual part), 10 mA. P24: 24 ± 4 V (tolerance from memory), 1.2 kΩ, 10 mA (from memory). P12: 12 ± 1 V (from
 * memory; some summaries give ± 3 V), 680 Ω, 15 mA.
 */
export const PHANTOM_SYSTEMS: Readonly<Record<PhantomSystemName, PhantomSystem>> = {
  P48: { name: "P48", supplyV: 48, supplyToleranceV: 4, feedResistorOhm: 6800, maxCurrentA: 10e-3, fromMemory: [] },
  P24: {
    name: "P24",
    supplyV: 24,
    supplyToleranceV: 4,
    feedResistorOhm: 1200,
    maxCurrentA: 10e-3,
    fromMemory: ["supplyToleranceV", "maxCurrentA"],
  },
  P12: {
    name: "P12",
    supplyV: 12,
    supplyToleranceV: 1,
    feedResistorOhm: 680,
    maxCurrentA: 15e-3,
    fromMemory: ["supplyToleranceV"],
  },
};

/**
 * Default absolute tolerance of each feed resistor for worst-case figures: 1 % (common practice: 1 % metal-film
 * parts). Leg-to-leg matching (0.1–0.5 % in various sources) matters for common-mode rejection, not for the
 * voltage available, so it is not modelled here.
 */
export const DEFAULT_FEED_RESISTOR_TOLERANCE = 0.01;

/** Looks a system up by name; throws a `RangeError` listing the known ones otherwise. */
export function phantomSystem(name: string): PhantomSystem {
  if (name === "P48" || name === "P24" || name === "P12") return PHANTOM_SYSTEMS[name];
  throw new RangeError(`Unknown phantom system "${name}"; use "P48", "P24" or "P12" (IEC 61938).`);
}

/** Resistance the microphone sees common-mode, Ω: the two feed resistors in parallel, R/2. */
function commonModeResistance(feedResistorOhm: number): number {
  return requirePositive("Feed resistor", feedResistorOhm, "Ω") / 2;
}

/** Short-circuit current V_supply / (R/2), A — the most the supply can deliver. */
export function phantomShortCircuitCurrent(system: PhantomSystem): number {
  requirePositive("Phantom supply voltage", system.supplyV, "V");
  return system.supplyV / commonModeResistance(system.feedResistorOhm);
}

/**
 * Voltage available at the microphone, V, when it draws `currentA` (A, ≥ 0): V_supply − I·R/2. Throws when the
 * draw exceeds the short-circuit current (the supply cannot deliver it).
 */
export function phantomVoltageAtMicrophone(system: PhantomSystem, currentA: number): number {
  requireNonNegative("Microphone current", currentA, "A");
  const shortCircuit = phantomShortCircuitCurrent(system);
  if (currentA > shortCircuit) {
    throw new RangeError(
      `${system.name} cannot deliver ${(currentA * 1e3).toFixed(2)} mA: its short-circuit current is ${(shortCircuit * 1e3).toFixed(2)} mA. Lower the draw.`,
    );
  }
  return system.supplyV - currentA * commonModeResistance(system.feedResistorOhm);
}

/** Maximum power into a matched load (R/2), W: V_supply² / (4·R/2). */
export function phantomMaxPower(system: PhantomSystem): number {
  requirePositive("Phantom supply voltage", system.supplyV, "V");
  return (system.supplyV * system.supplyV) / (4 * commonModeResistance(system.feedResistorOhm));
}

export interface PhantomWorstCase {
  /** Lowest voltage at the microphone: low supply, high resistors, V; 0 when that supply cannot deliver the draw. */
  minVoltageV: number;
  /** Highest voltage at the microphone: high supply, low resistors, V (what parts must withstand). */
  maxVoltageV: number;
  /** Short-circuit current at the low corner (low supply, high resistors), A. */
  minShortCircuitCurrentA: number;
  /** Short-circuit current at the high corner, A. */
  maxShortCircuitCurrentA: number;
}

/**
 * Worst cases over the supply tolerance and a feed-resistor tolerance (fraction, default 1 %), for a draw of
 * `currentA` (A, ≥ 0).
 */
export function phantomWorstCase(
  system: PhantomSystem,
  currentA: number,
  resistorTolerance: number = DEFAULT_FEED_RESISTOR_TOLERANCE,
): PhantomWorstCase {
  requireNonNegative("Microphone current", currentA, "A");
  requireFraction("Feed-resistor tolerance", resistorTolerance);
  requireNonNegative("Phantom supply tolerance", system.supplyToleranceV, "V");
  const lowSupply = system.supplyV - system.supplyToleranceV;
  const highSupply = system.supplyV + system.supplyToleranceV;
  requirePositive("Phantom supply at its low limit", lowSupply, "V");
  const highR = commonModeResistance(system.feedResistorOhm) * (1 + resistorTolerance);
  const lowR = commonModeResistance(system.feedResistorOhm) * (1 - resistorTolerance);
  return {
    minVoltageV: Math.max(0, lowSupply - currentA * highR),
    maxVoltageV: Math.max(0, highSupply - currentA * lowR),
    minShortCircuitCurrentA: lowSupply / highR,
    maxShortCircuitCurrentA: highSupply / lowR,
  };
}

export type PhantomVerdict = "fits" | "exceeds_current_limit" | "voltage_too_low";

export interface PhantomFit {
  fits: boolean;
  verdict: PhantomVerdict;
  /** A sentence a designer can act on. */
  message: string;
  /** Standard's current limit minus the draw, A (negative when over). */
  currentMarginA: number;
  /** Worst-case voltage at the microphone minus the voltage the circuit needs, V (negative when short). */
  voltageMarginV: number;
  /** Worst-case (lowest) voltage at the microphone for this draw, V. */
  worstCaseVoltageV: number;
}

/**
 * Does a draw of `currentA` fit the system? It must stay within the standard's current limit and, at the worst
 * case (low supply, high resistors), leave at least `minimumVoltageV` (V, default 0) at the microphone.
 */
export function phantomFit(
  system: PhantomSystem,
  currentA: number,
  minimumVoltageV = 0,
  resistorTolerance: number = DEFAULT_FEED_RESISTOR_TOLERANCE,
): PhantomFit {
  requireNonNegative("Voltage the microphone needs", minimumVoltageV, "V");
  const worstCaseVoltageV = phantomWorstCase(system, currentA, resistorTolerance).minVoltageV;
  const currentMarginA = system.maxCurrentA - currentA;
  const voltageMarginV = worstCaseVoltageV - minimumVoltageV;
  const mA = (a: number) => `${(a * 1e3).toFixed(2)} mA`;
  if (currentMarginA < 0) {
    return {
      fits: false,
      verdict: "exceeds_current_limit",
      message: `${mA(currentA)} is over the ${system.name} limit of ${mA(system.maxCurrentA)} (IEC 61938); reduce the draw by ${mA(-currentMarginA)}.`,
      currentMarginA,
      voltageMarginV,
      worstCaseVoltageV,
    };
  }
  if (voltageMarginV < 0) {
    return {
      fits: false,
      verdict: "voltage_too_low",
      message: `At ${mA(currentA)} a worst-case ${system.name} supply leaves ${worstCaseVoltageV.toFixed(2)} V, ${(-voltageMarginV).toFixed(2)} V short of the ${minimumVoltageV.toFixed(2)} V needed; draw less current or need less voltage.`,
      currentMarginA,
      voltageMarginV,
      worstCaseVoltageV,
    };
  }
  return {
    fits: true,
    verdict: "fits",
    message: `Fits ${system.name}: ${mA(currentMarginA)} below the current limit and ${voltageMarginV.toFixed(2)} V above the voltage needed in the worst case.`,
    currentMarginA,
    voltageMarginV,
    worstCaseVoltageV,
  };
}
