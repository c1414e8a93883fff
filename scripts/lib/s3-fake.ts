/**
 * The local S3-compatible fake (s3rver) that `npm start` and the tests run on 127.0.0.1, so uploads go through the
 * real S3 client (`@aws-sdk/client-s3`) exactly as they would to a real service. Objects live in a folder; the one
 * bucket is created at start. s3rver checks request signatures against its fixed key pair, given to the app below.
 * Production points S3_ENDPOINT at a real S3-compatible service instead and runs no fake.
 */
import fs from "node:fs";
import S3rver from "s3rver";

/** s3rver's built-in credentials: the only pair it accepts. */
export const S3_FAKE_ACCESS_KEY_ID = "S3RVER";
export const S3_FAKE_SECRET_ACCESS_KEY = "S3RVER";
export const S3_FAKE_BUCKET = "backplate";

export interface S3Fake {
  port: number;
  dir: string;
  bucket: string;
  /** what the app needs to reach it */
  env: Record<string, string>;
  stop(): Promise<void>;
}

export async function startS3Fake(options: { port: number; dir: string; bucket?: string }): Promise<S3Fake> {
  fs.mkdirSync(options.dir, { recursive: true });
  const bucket = options.bucket ?? S3_FAKE_BUCKET;
  const server = new S3rver({
    address: "127.0.0.1",
    port: options.port,
    silent: true,
    directory: options.dir,
    configureBuckets: [{ name: bucket }],
  });
  const address = await server.run();
  let stopped = false;
  return {
    port: address.port,
    dir: options.dir,
    bucket,
    env: {
      S3_ENDPOINT: `http://127.0.0.1:${address.port}`,
      S3_BUCKET: bucket,
      S3_ACCESS_KEY_ID: S3_FAKE_ACCESS_KEY_ID,
      S3_SECRET_ACCESS_KEY: S3_FAKE_SECRET_ACCESS_KEY,
      S3_REGION: "us-east-1",
    },
    async stop() {
      if (stopped) return;
      stopped = true;
      await server.close();
    },
  };
}
