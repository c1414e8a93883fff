import "server-only";
import { MAX_CIRCUIT_BYTES } from "@/components/schemas/design";
import { checkTopology, elaborate, isSimError } from "@/sim";
import { AppError } from "./errors";

/**
 * The gate every stored circuit passes: at most 1 MB of JSON and accepted by the engine's own parser (`elaborate`)
 * and its topology checks (every net has a DC path, the output nets exist, no source loops), so a revision in the database always opens on the bench. A refusal carries the engine's message and the part, net
 * or field at fault, so the person knows what to fix.
 */
export function checkCircuit(circuit: unknown): Record<string, unknown> {
  const bytes = Buffer.byteLength(JSON.stringify(circuit ?? null));
  if (bytes > MAX_CIRCUIT_BYTES) {
    throw new AppError(
      "payload_too_large",
      `The circuit file is ${(bytes / 1e6).toFixed(2)} MB; the limit is ${MAX_CIRCUIT_BYTES / 1e6} MB. Remove unused parts or notes.`,
    );
  }
  try {
    checkTopology(elaborate(circuit));
  } catch (error) {
    if (isSimError(error)) {
      const where = error.part ? ` (part ${error.part})` : error.net ? ` (net ${error.net})` : "";
      throw new AppError("invalid_input", `The circuit was not saved${where}: ${error.message}`, {
        fields: { circuit: error.message },
        detail: error.toJSON(),
      });
    }
    throw error;
  }
  return circuit as Record<string, unknown>;
}
