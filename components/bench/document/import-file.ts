/**
 * Reading a circuit file a person brings (upload or paste): JSON, then the engine's own checks (`elaborate`), so a
 * file the bench opens is a file the solver and the API accept. Problems come back as the engine's messages with the
 * part, net and field at fault, never as an exception.
 */
import { elaborate } from "@/sim/circuit/elaborate";
import { validateCircuitFile } from "@/sim/circuit/schema";
import { isSimError, type SimErrorJson } from "@/sim/errors";
import { type BenchDocument, openDocument } from "./document";

export type ImportResult = { ok: true; document: BenchDocument } | { ok: false; errors: SimErrorJson[] };

export function importCircuitText(text: string): ImportResult {
  let json: unknown;
  try {
    json = JSON.parse(text);
  } catch (error) {
    const detail = error instanceof Error ? error.message : String(error);
    return {
      ok: false,
      errors: [
        {
          code: "malformed_json",
          message: `The file is not valid JSON (${detail}). Export it again or fix the syntax.`,
        },
      ],
    };
  }
  const validation = validateCircuitFile(json);
  if (!validation.ok) return { ok: false, errors: validation.errors.map((e) => e.toJSON()) };
  try {
    elaborate(json);
  } catch (error) {
    if (isSimError(error)) return { ok: false, errors: [error.toJSON()] };
    throw error;
  }
  return { ok: true, document: openDocument(json) };
}
