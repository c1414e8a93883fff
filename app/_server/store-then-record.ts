import "server-only";
/**
 * The one order every upload follows so nothing is left half-stored: the object goes to storage first (if that
 * fails, nothing was written anywhere); then the row is written; if the row fails, the object is deleted again.
 */
import { randomUUID } from "node:crypto";
import { deleteObjectQuietly, putObject } from "./storage";

export async function storeThenRecord<T>(
  key: string,
  bytes: Uint8Array,
  contentType: string,
  record: () => Promise<T>,
): Promise<T> {
  await putObject(key, bytes, contentType);
  try {
    return await record();
  } catch (error) {
    await deleteObjectQuietly(key);
    throw error;
  }
}

/** A storage key that never reuses a person's file name as a path: design folder, kind, random id, tidy name. */
export function storageKey(designId: string, folder: "measurements" | "attachments" | "reports", filename: string): string {
  const tidy = filename.replace(/[^A-Za-z0-9._-]+/g, "-").replace(/^[-.]+/, "").slice(-80) || "file";
  return `designs/${designId}/${folder}/${randomUUID()}-${tidy}`;
}
