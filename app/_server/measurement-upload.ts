import "server-only";
/**
 * Saving an uploaded measurement: the file is read again on the server with the same parser as the preview, the
 * preview's mapping is checked, and only a file that parses is stored (original to object storage, curve to
 * PostgreSQL, in that order).
 */
import { parseMeasurement } from "@/components/measurements/parse-measurement";
import { readMeasurementTable } from "@/components/measurements/read-table";
import { measurementMappingSchema } from "@/components/schemas/measurement";
import { AppError } from "@/db/errors";
import { assertMeasurementTarget, insertMeasurement } from "@/db/measurements";
import { storageKey, storeThenRecord } from "./store-then-record";

export interface MeasurementUpload {
  workspaceId: string;
  designId: string;
  userId: string;
  filename: string;
  bytes: Uint8Array;
  /** the preview's choices, as the JSON text the form sends */
  mappingJson: string;
  revisionId: string | null;
}

function mappingFrom(json: string) {
  let raw: unknown;
  try {
    raw = JSON.parse(json);
  } catch {
    throw new AppError("bad_request", "The column mapping is missing. Choose the columns in the preview and save again.");
  }
  return measurementMappingSchema.parse(raw);
}

export async function uploadMeasurement(input: MeasurementUpload): Promise<{ id: string; points: number }> {
  const mapping = mappingFrom(input.mappingJson);
  const table = readMeasurementTable(input.bytes);
  if (!table.ok) throw new AppError("invalid_input", table.message, { fields: { file: table.message } });
  const parsed = parseMeasurement(table.table, mapping);
  if (!parsed.ok) throw new AppError("invalid_input", parsed.message, { fields: { [parsed.field ?? "file"]: parsed.message } });
  await assertMeasurementTarget(input.workspaceId, input.designId, input.revisionId);
  const key = storageKey(input.designId, "measurements", input.filename);
  // The original goes to storage as plain text: it is kept for the record and never served back.
  const row = await storeThenRecord(key, input.bytes, "text/plain; charset=utf-8", () =>
    insertMeasurement({
      workspaceId: input.workspaceId,
      designId: input.designId,
      revisionId: input.revisionId,
      storageKey: key,
      originalFilename: input.filename.slice(0, 200),
      sizeBytes: input.bytes.byteLength,
      curve: parsed.curve,
      mapping,
      uploadedBy: input.userId,
    }),
  );
  return { id: row.id, points: parsed.curve.frequency.length };
}
