/**
 * Destinations: what the microphone's output drives — a console or recorder input (invented names, impedances
 * typical of the trade) or a custom R ∥ C — reached through a cable of a chosen length. Impedances follow common
 * practice: transformer-coupled inputs about 1–1.2 kΩ, active inputs 1.2–4 kΩ, a measurement input 1 MΩ ∥ 100 pF.
 */

export type DestinationKind = "transformer" | "active" | "recorder" | "measurement" | "custom";

export interface Destination {
  id: string;
  name: string;
  kind: DestinationKind;
  /** input resistance, Ω (> 0) */
  resistanceOhm: number;
  /** input capacitance, F (≥ 0) */
  capacitanceF: number;
}

/** Typical microphone cable (common practice): about 100 pF/m conductor to conductor, 0.05 Ω/m. */
export const CABLE_CAPACITANCE_F_PER_M = 100e-12;
export const CABLE_RESISTANCE_OHM_PER_M = 0.05;
export const DEFAULT_CABLE_LENGTH_M = 5;
/** Longest run the bench offers, m (a stage snake; beyond this the lumped cable model needs more segments). */
export const MAX_CABLE_LENGTH_M = 300;

export const DESTINATION_PRESETS: readonly Destination[] = [
  {
    id: "millrace-transformer",
    name: "Millrace transformer input",
    kind: "transformer",
    resistanceOhm: 1.2e3,
    capacitanceF: 470e-12,
  },
  {
    id: "saltmarsh-transformer",
    name: "Saltmarsh vintage-style input",
    kind: "transformer",
    resistanceOhm: 1.0e3,
    capacitanceF: 680e-12,
  },
  { id: "ashgrove-active", name: "Ashgrove active input", kind: "active", resistanceOhm: 2.4e3, capacitanceF: 150e-12 },
  {
    id: "lanternfield-active",
    name: "Lanternfield desk channel",
    kind: "active",
    resistanceOhm: 1.5e3,
    capacitanceF: 220e-12,
  },
  {
    id: "ridgeway-recorder",
    name: "Ridgeway field recorder",
    kind: "recorder",
    resistanceOhm: 2.0e3,
    capacitanceF: 100e-12,
  },
  {
    id: "larkfield-measurement",
    name: "Bench measurement input",
    kind: "measurement",
    resistanceOhm: 1e6,
    capacitanceF: 100e-12,
  },
];

export function findPreset(id: string): Destination | undefined {
  return DESTINATION_PRESETS.find((d) => d.id === id);
}

/** "1.2 kΩ ∥ 470 pF" — how a destination's impedance reads in the interface. */
export function describeImpedance(d: Pick<Destination, "resistanceOhm" | "capacitanceF">): string {
  const r =
    d.resistanceOhm >= 1e6
      ? `${d.resistanceOhm / 1e6} MΩ`
      : d.resistanceOhm >= 1e3
        ? `${d.resistanceOhm / 1e3} kΩ`
        : `${d.resistanceOhm} Ω`;
  if (d.capacitanceF === 0) return r;
  const pf = d.capacitanceF * 1e12;
  const c = pf >= 1000 ? `${+(pf / 1000).toPrecision(3)} nF` : `${+pf.toPrecision(3)} pF`;
  return `${r} ∥ ${c}`;
}
