import "server-only";
/**
 * Reads a multipart upload with a byte limit that holds before the body is read whole: a declared Content-Length
 * over the limit is refused at once, and a body without one is read chunk by chunk and dropped as soon as it passes
 * the limit. Only then is the form parsed.
 */
import { AppError } from "@/db/errors";

/** Room for the form's boundaries and small fields around the file, bytes. */
const FORM_OVERHEAD_BYTES = 64_000;

const mb = (bytes: number) => `${Math.round(bytes / 100_000) / 10} MB`;

export interface Upload {
  file: File;
  bytes: Uint8Array;
  fields: Record<string, string>;
}

async function readCapped(request: Request, cap: number, what: string): Promise<Uint8Array<ArrayBuffer>> {
  const reader = request.body?.getReader();
  if (!reader) throw new AppError("bad_request", `Choose a ${what} to upload.`);
  const chunks: Uint8Array[] = [];
  let total = 0;
  for (;;) {
    const { done, value } = await reader.read();
    if (done) break;
    total += value.byteLength;
    if (total > cap) {
      await reader.cancel();
      throw new AppError("payload_too_large", `The ${what} is larger than ${mb(cap - FORM_OVERHEAD_BYTES)}.`);
    }
    chunks.push(value);
  }
  const body = new Uint8Array(total);
  let at = 0;
  for (const chunk of chunks) {
    body.set(chunk, at);
    at += chunk.byteLength;
  }
  return body;
}

export async function readUpload(request: Request, limitBytes: number, what: string): Promise<Upload> {
  const type = request.headers.get("content-type") ?? "";
  if (!type.startsWith("multipart/form-data")) {
    throw new AppError("unsupported_media_type", `Send the ${what} as multipart/form-data with a "file" field.`);
  }
  const cap = limitBytes + FORM_OVERHEAD_BYTES;
  const declared = Number(request.headers.get("content-length") ?? 0);
  if (declared > cap) throw new AppError("payload_too_large", `The ${what} is larger than ${mb(limitBytes)}.`);
  const raw = await readCapped(request, cap, what);
  let form: FormData;
  try {
    form = await new Response(raw, { headers: { "content-type": type } }).formData();
  } catch {
    throw new AppError("bad_request", `The upload could not be read as a form. Choose the ${what} again.`);
  }
  const file = form.get("file");
  if (!(file instanceof File)) throw new AppError("invalid_input", `Choose a ${what} to upload.`, { fields: { file: `Choose a ${what}.` } });
  if (file.size > limitBytes) throw new AppError("payload_too_large", `The ${what} is larger than ${mb(limitBytes)}.`);
  const fields: Record<string, string> = {};
  for (const [key, value] of form.entries()) if (typeof value === "string") fields[key] = value;
  return { file, bytes: new Uint8Array(await file.arrayBuffer()), fields };
}
