/**
 * `withDestination(circuit, destination, cableLengthM)`: the circuit as it would be plugged in — a `cable` part from
 * the output to a new far-end net and a `load` part (the destination's R ∥ C) across the far end, with the output
 * moved to the load. A cable of length 0 is left out (the load sits right on the output). Ids and net names are
 * chosen so they never collide with the circuit's own.
 */
import { CABLE_CAPACITANCE_F_PER_M, CABLE_RESISTANCE_OHM_PER_M, type Destination } from "./presets";

interface CircuitLike {
  parts: { id: string; pins: Record<string, string | undefined> }[];
  output: { plus: string; minus: string };
}

export interface CableOptions {
  capacitancePerM?: number;
  resistancePerM?: number;
}

/** Part ids the transform adds (with a suffix when taken). */
export const DESTINATION_CABLE_ID = "DEST_CABLE";
export const DESTINATION_LOAD_ID = "DEST_LOAD";
const FAR_END_NET = "destination";

function unique(base: string, taken: Set<string>): string {
  if (!taken.has(base)) return base;
  let n = 2;
  while (taken.has(`${base}_${n}`)) n++;
  return `${base}_${n}`;
}

export function withDestination<C extends CircuitLike>(
  circuit: C,
  destination: Pick<Destination, "resistanceOhm" | "capacitanceF">,
  cableLengthM: number,
  cable: CableOptions = {},
): C {
  if (!(destination.resistanceOhm > 0)) throw new RangeError("The destination's resistance must be greater than 0 Ω.");
  if (!(destination.capacitanceF >= 0)) throw new RangeError("The destination's capacitance must be 0 F or more.");
  if (!(cableLengthM >= 0) || !Number.isFinite(cableLengthM))
    throw new RangeError("The cable length must be 0 m or more.");
  const ids = new Set(circuit.parts.map((p) => p.id));
  const nets = new Set(circuit.parts.flatMap((p) => Object.values(p.pins)).filter((n): n is string => n !== undefined));
  const { plus, minus } = circuit.output;
  const load = {
    id: unique(DESTINATION_LOAD_ID, ids),
    kind: "load",
    values: { resistance: destination.resistanceOhm, capacitance: destination.capacitanceF },
  };
  if (cableLengthM === 0) {
    return { ...circuit, parts: [...circuit.parts, { ...load, pins: { p: plus, n: minus } }] };
  }
  const far = unique(FAR_END_NET, nets);
  const cablePart = {
    id: unique(DESTINATION_CABLE_ID, ids),
    kind: "cable",
    pins: { a: plus, b: far, ref: minus },
    values: {
      length: cableLengthM,
      capacitance_per_m: cable.capacitancePerM ?? CABLE_CAPACITANCE_F_PER_M,
      resistance_per_m: cable.resistancePerM ?? CABLE_RESISTANCE_OHM_PER_M,
    },
  };
  return {
    ...circuit,
    parts: [...circuit.parts, cablePart, { ...load, pins: { p: far, n: minus } }],
    output: { plus: far, minus },
  };
}
