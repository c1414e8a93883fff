/**
 * Which engine error the canvas marks: the structure check's (elaborate + topology, run at once on the main thread
 * for the circuit as it is now) first; otherwise the live solve's (a DC solve that does not converge, a singular
 * matrix, …), but only while the part or net it names is still in the drawing — an error about a part just deleted
 * or renamed would point at nothing until the next solve answers.
 */
import type { SimErrorJson } from "@/sim/errors";
import type { BenchCircuit } from "../document/circuit";
import { netNames } from "../document/nets";

export function canvasProblem(
  structure: SimErrorJson | null,
  solve: SimErrorJson | null,
  circuit: BenchCircuit,
): SimErrorJson | null {
  if (structure) return structure;
  if (!solve) return null;
  if (solve.part !== undefined) return circuit.parts.some((p) => p.id === solve.part) ? solve : null;
  if (solve.net !== undefined) return netNames(circuit).includes(solve.net) ? solve : null;
  return null;
}
