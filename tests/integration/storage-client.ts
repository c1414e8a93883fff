/**
 * The test's own view of the storage fake, through a separate S3 client: what objects the bucket holds, and a
 * frequency-response file generated from a known curve.
 */
import { ListObjectsV2Command, S3Client } from "@aws-sdk/client-s3";

export function testS3(env: Record<string, string | undefined> = process.env) {
  const s3 = new S3Client({
    endpoint: env.S3_ENDPOINT,
    region: env.S3_REGION ?? "us-east-1",
    credentials: { accessKeyId: env.S3_ACCESS_KEY_ID ?? "", secretAccessKey: env.S3_SECRET_ACCESS_KEY ?? "" },
    forcePathStyle: true,
    requestChecksumCalculation: "WHEN_REQUIRED",
    responseChecksumValidation: "WHEN_REQUIRED",
  });
  return {
    s3,
    async keys(prefix: string): Promise<string[]> {
      const out = await s3.send(new ListObjectsV2Command({ Bucket: env.S3_BUCKET, Prefix: prefix }));
      return (out.Contents ?? []).map((o) => o.Key ?? "");
    },
  };
}

/** First-order high-pass magnitude, dB (handbook formula for an RC high-pass). */
export const highPassDb = (f: number, fc: number) => 20 * Math.log10(f / Math.sqrt(f * f + fc * fc));

/** A measured sweep as a bench rig would write it: 1/6-octave points 20 Hz–20 kHz of a high-pass, plus a rig gain. */
export function sweepCsv(cornerHz: number, rigGainDb: number): { csv: string; frequency: number[]; level: number[] } {
  const frequency = Array.from({ length: 61 }, (_, i) => 20 * 2 ** (i / 6));
  const level = frequency.map((f) => highPassDb(f, cornerHz) + rigGainDb);
  const lines = frequency.map((f, i) => `${f.toFixed(4)},${level[i].toFixed(5)}`);
  return { csv: `# Larkfield test rig\nFrequency (Hz),Level (dB)\n${lines.join("\n")}\n`, frequency: frequency.map((f) => Number(f.toFixed(4))), level };
}
