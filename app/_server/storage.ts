import "server-only";
/**
 * Object storage through the S3 client. `npm start` and the tests point it at the local s3rver fake; production sets
 * S3_ENDPOINT (and the keys) to a real S3-compatible service. Every failure to reach it becomes one AppError
 * ("unavailable", 503) so callers can undo what they did and the person is told to try again.
 */
import {
  DeleteObjectCommand,
  GetObjectCommand,
  PutObjectCommand,
  S3Client,
  type S3ClientConfig,
} from "@aws-sdk/client-s3";
import { AppError } from "@/db/errors";

/** How long a storage request may take to connect before the upload is refused with a 503 (ms). */
const CONNECT_TIMEOUT_MS = 3_000;
const REQUEST_TIMEOUT_MS = 30_000;

let client: { key: string; s3: S3Client } | null = null;

function settings() {
  const endpoint = process.env.S3_ENDPOINT;
  const bucket = process.env.S3_BUCKET;
  if (!endpoint || !bucket) {
    throw new AppError("unavailable", "File storage is not configured (S3_ENDPOINT, S3_BUCKET). Tell an owner.");
  }
  return {
    endpoint,
    bucket,
    region: process.env.S3_REGION || "us-east-1",
    accessKeyId: process.env.S3_ACCESS_KEY_ID ?? "",
    secretAccessKey: process.env.S3_SECRET_ACCESS_KEY ?? "",
  };
}

function s3(): { s3: S3Client; bucket: string } {
  const s = settings();
  const key = `${s.endpoint}|${s.region}|${s.accessKeyId}`;
  if (!client || client.key !== key) {
    const config: S3ClientConfig = {
      endpoint: s.endpoint,
      region: s.region,
      credentials: { accessKeyId: s.accessKeyId, secretAccessKey: s.secretAccessKey },
      // Path-style addressing (bucket in the path), as s3rver and most self-hosted services expect.
      forcePathStyle: true,
      // Without these the client frames the body in aws-chunked encoding with a checksum trailer, which s3rver
      // stores verbatim inside the object (a corrupted file).
      requestChecksumCalculation: "WHEN_REQUIRED",
      responseChecksumValidation: "WHEN_REQUIRED",
      maxAttempts: 2,
      requestHandler: { connectionTimeout: CONNECT_TIMEOUT_MS, requestTimeout: REQUEST_TIMEOUT_MS },
    };
    client = { key, s3: new S3Client(config) };
  }
  return { s3: client.s3, bucket: s.bucket };
}

function unavailable(error: unknown): AppError {
  if (error instanceof AppError) return error;
  console.error("storage:", error instanceof Error ? error.message : error);
  return new AppError("unavailable", "File storage is not answering, so nothing was stored. Try again in a moment.");
}

export async function putObject(key: string, body: Uint8Array, contentType: string): Promise<void> {
  const { s3: c, bucket } = s3();
  try {
    await c.send(
      new PutObjectCommand({ Bucket: bucket, Key: key, Body: body, ContentType: contentType, ContentLength: body.byteLength }),
    );
  } catch (error) {
    throw unavailable(error);
  }
}

export async function getObject(key: string): Promise<Uint8Array> {
  const { s3: c, bucket } = s3();
  try {
    const out = await c.send(new GetObjectCommand({ Bucket: bucket, Key: key }));
    if (!out.Body) throw new Error("empty body");
    return await out.Body.transformToByteArray();
  } catch (error) {
    if ((error as { name?: string }).name === "NoSuchKey") {
      throw new AppError("gone", "The stored file is missing from storage. Upload it again.");
    }
    throw unavailable(error);
  }
}

/** Removes an object; used to undo an upload whose row could not be written. Never throws (it is already cleanup). */
export async function deleteObjectQuietly(key: string): Promise<boolean> {
  try {
    const { s3: c, bucket } = s3();
    await c.send(new DeleteObjectCommand({ Bucket: bucket, Key: key }));
    return true;
  } catch (error) {
    console.error(`storage: could not remove ${key} after a failed save:`, error instanceof Error ? error.message : error);
    return false;
  }
}
