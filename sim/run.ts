/**
 * `runCircuit(file, { variant })`: the document the headless command prints for one circuit file (already parsed
 * from JSON). Throws `SimError` on bad input.
 */
import { simulate } from "./analyses/simulate";
import type { OutputDocument } from "./results";
import { type RunOptions, runWith } from "./runner";

export type { RunOptions } from "./runner";

export function runCircuit(file: unknown, options: RunOptions = {}): OutputDocument {
  return runWith(simulate, file, options);
}
