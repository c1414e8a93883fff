/**
 * |Zout(f)| over a list of frequencies: the impedance seen looking into `output` (plus to minus) with every drive
 * off, as the figures' output_impedance_1khz_ohm but at every frequency, for the bench's output-impedance plot.
 * Uses the same small-signal model as the AC analysis (linearised at the operating point at the AC temperature).
 */
import { elaborate } from "../circuit/elaborate";
import { checkTopology } from "../circuit/topology";
import { DEFAULT_TEMPERATURE_K } from "../circuit/types";
import { compileCircuit } from "./compile";
import { OperatingPointSolver } from "./op";
import { SmallSignalModel } from "./small-signal";

export interface OutputImpedanceSweep {
  /** Hz, as given */
  frequency: number[];
  /** |Zout|, Ω */
  magnitude_ohm: number[];
  /** arg Zout, degrees */
  phase_deg: number[];
}

export function outputImpedanceSweep(
  file: unknown,
  frequencies: readonly number[],
  options: { variant?: string } = {},
): OutputImpedanceSweep {
  const circuit = elaborate(file, { variant: options.variant });
  checkTopology(circuit);
  const compiled = compileCircuit(circuit);
  const temperature = circuit.analyses.ac?.temperature ?? circuit.analyses.op?.temperature ?? DEFAULT_TEMPERATURE_K;
  const model = new SmallSignalModel(compiled, new OperatingPointSolver(compiled).solve({ temperature }));
  const z = { re: 0, im: 0 };
  const magnitude_ohm: number[] = [];
  const phase_deg: number[] = [];
  for (const f of frequencies) {
    model.outputImpedance(f, z);
    magnitude_ohm.push(Math.hypot(z.re, z.im));
    phase_deg.push((Math.atan2(z.im, z.re) * 180) / Math.PI);
  }
  return { frequency: frequencies.slice(), magnitude_ohm, phase_deg };
}
