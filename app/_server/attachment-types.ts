import "server-only";
/**
 * What an attachment is, told from its first bytes (never from the name or the browser's claim), and how it is sent
 * back: always as a download with a fixed safe type, so nothing uploaded can run as a page on Backplate's origin.
 */
import { looksBinary } from "@/components/measurements/read-table";
import { ATTACHMENT_LIMITS_TEXT } from "@/components/schemas/attachment";
import { AppError } from "@/db/errors";

export { MAX_ATTACHMENT_BYTES } from "@/components/schemas/attachment";

const startsWith = (bytes: Uint8Array, sig: number[], at = 0) => sig.every((b, i) => bytes[at + i] === b);

export function sniffAttachmentType(bytes: Uint8Array, filename: string): string {
  if (startsWith(bytes, [0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a])) return "image/png";
  if (startsWith(bytes, [0xff, 0xd8, 0xff])) return "image/jpeg";
  if (startsWith(bytes, [0x25, 0x50, 0x44, 0x46, 0x2d])) return "application/pdf";
  if (startsWith(bytes, [0x52, 0x49, 0x46, 0x46]) && startsWith(bytes, [0x57, 0x45, 0x42, 0x50], 8)) return "image/webp";
  if (/\.(txt|csv|tsv)$/i.test(filename) && !looksBinary(bytes)) return "text/plain; charset=utf-8";
  throw new AppError("unsupported_media_type", `That file is not one Backplate keeps. Attach ${ATTACHMENT_LIMITS_TEXT}.`);
}

/** Headers of every attachment download: a download, never rendered inline, never sniffed into something else. */
export function attachmentHeaders(filename: string, contentType: string, size: number): HeadersInit {
  const ascii = filename.replace(/[^A-Za-z0-9._-]+/g, "_").slice(-120) || "attachment";
  return {
    "Content-Type": contentType,
    "Content-Length": String(size),
    "Content-Disposition": `attachment; filename="${ascii}"; filename*=UTF-8''${encodeURIComponent(filename)}`,
    "X-Content-Type-Options": "nosniff",
    "Content-Security-Policy": "default-src 'none'; sandbox",
    "Cache-Control": "private, no-store",
  };
}
