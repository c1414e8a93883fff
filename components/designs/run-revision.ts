/**
 * Runs a stored circuit through the engine for a read-only page: the headless command's document, or the engine's
 * message when the circuit cannot be solved (a stored revision always parses, but a variant named by a bench link
 * may be gone, or the solver may not converge). Never throws, so the page always renders the rest.
 */
import { isSimError, type OutputDocument, runCircuit } from "@/sim";

export type RevisionRun = { ok: true; document: OutputDocument; ms: number } | { ok: false; message: string; part?: string; net?: string };

export function runRevision(circuit: unknown, variant?: string): RevisionRun {
  const started = performance.now();
  try {
    const document = runCircuit(circuit, variant ? { variant } : {});
    return { ok: true, document, ms: performance.now() - started };
  } catch (error) {
    if (isSimError(error)) return { ok: false, message: error.message, part: error.part, net: error.net };
    return { ok: false, message: `The engine stopped: ${error instanceof Error ? error.message : String(error)}` };
  }
}
