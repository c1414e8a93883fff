import { MAX_CIRCUIT_BYTES } from "@/components/schemas/design";

export type CircuitText = { ok: true; circuit: Record<string, unknown> } | { ok: false; message: string };

/**
 * Reads pasted or uploaded circuit-file text in the browser before it is sent: too large or not a JSON object is
 * said at once, with what to fix. The server checks again, and the engine checks the circuit itself.
 */
export function readCircuitText(text: string): CircuitText {
  const bytes = new TextEncoder().encode(text).length;
  if (bytes > MAX_CIRCUIT_BYTES) {
    return { ok: false, message: `The file is ${(bytes / 1e6).toFixed(2)} MB; circuit files are limited to 1 MB.` };
  }
  if (!text.trim()) return { ok: false, message: "Paste a circuit file or choose one to upload." };
  let data: unknown;
  try {
    data = JSON.parse(text);
  } catch (error) {
    const detail = error instanceof Error ? error.message : "";
    return { ok: false, message: `This is not valid JSON (${detail}). A circuit file is a JSON object starting with {.` };
  }
  if (typeof data !== "object" || data === null || Array.isArray(data)) {
    return { ok: false, message: "A circuit file is a JSON object (starting with {) with format, version, parts and output." };
  }
  return { ok: true, circuit: data as Record<string, unknown> };
}
