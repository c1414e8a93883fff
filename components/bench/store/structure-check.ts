/**
 * The checks that need no solve — the engine's `elaborate` and topology checks (a value that does not parse, a net
 * with no DC path, a source loop) — run on the main thread so the canvas can point at the part or net at once.
 * Solving itself stays in the results' worker.
 */
import { elaborate } from "@/sim/circuit/elaborate";
import { checkTopology } from "@/sim/circuit/topology";
import { isSimError, type SimErrorJson } from "@/sim/errors";
import type { BenchCircuit } from "../document/circuit";

export function structureProblem(circuit: BenchCircuit, variant?: string | null): SimErrorJson | null {
  if (circuit.parts.length === 0) return null;
  try {
    checkTopology(elaborate(circuit, { variant: variant ?? undefined }));
    return null;
  } catch (error) {
    if (isSimError(error)) return error.toJSON();
    throw error;
  }
}
