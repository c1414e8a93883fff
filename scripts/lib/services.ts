/**
 * Starts what the app needs beside itself — PostgreSQL, the mail fake and the storage fake — for `npm start` (a kept
 * cluster, mail and object folders under .data/) and for the tests (a throwaway cluster, mail and object folders on
 * free ports).
 */
import os from "node:os";
import path from "node:path";
import fs from "node:fs";
import { applyMigrations } from "../../db/migrate";
import { launcherConfig, PROJECT_ROOT } from "./config";
import { type MailFake, startMailFake } from "./mail-fake";
import { type Cluster, destroyCluster, freePort, startCluster } from "./postgres";
import { type S3Fake, startS3Fake } from "./s3-fake";

export interface Services {
  databaseUrl: string;
  pgDataDir: string;
  pgPort: number;
  /** Folder where the mail fake keeps what it receives (null when SMTP_URL names a real server). */
  mailDir: string | null;
  smtpPort: number | null;
  /** The storage fake (null when S3_ENDPOINT names a real service). */
  s3: S3Fake | null;
  /** Environment variables the app needs to reach these services. */
  env: Record<string, string>;
  stop(): Promise<void>;
}

export async function startDevServices(log: (line: string) => void): Promise<Services> {
  const cluster = await startCluster({
    dataDir: launcherConfig.pgDataDir,
    port: launcherConfig.pgPort,
    database: launcherConfig.database,
    log,
  });
  await applyMigrations(cluster.url);
  log("Migrations applied");
  // A real server named in SMTP_URL wins; the fake runs only when none is.
  let mail: MailFake | null = null;
  if (process.env.SMTP_URL) {
    log(`Mail goes to SMTP_URL (${new URL(process.env.SMTP_URL).host}); no mail fake`);
  } else {
    mail = await startMailFake({ port: launcherConfig.smtpPort, dir: path.join(PROJECT_ROOT, ".data", "mail") });
    log(`Mail fake listening on 127.0.0.1:${mail.port}; captured mail at /dev/mail`);
  }
  // Likewise a real S3-compatible service named in S3_ENDPOINT wins over the storage fake.
  let s3: S3Fake | null = null;
  if (process.env.S3_ENDPOINT) {
    log(`Files go to S3_ENDPOINT (${new URL(process.env.S3_ENDPOINT).host}); no storage fake`);
  } else {
    s3 = await startS3Fake({ port: launcherConfig.s3Port, dir: path.join(PROJECT_ROOT, ".data", "s3") });
    log(`Storage fake listening on 127.0.0.1:${s3.port}; objects under .data/s3`);
  }
  return wrap(cluster, mail, s3, false);
}

/** A fresh cluster in the system temp folder, removed by `stop()`. */
export async function startTestServices(log: (line: string) => void = () => {}): Promise<Services> {
  const dataDir = fs.mkdtempSync(path.join(os.tmpdir(), "backplate-test-"));
  fs.chmodSync(dataDir, 0o755);
  const cluster = await startCluster({
    dataDir: path.join(dataDir, "pg"),
    port: await freePort(),
    database: "backplate_test",
    throwaway: true,
    log,
  });
  await applyMigrations(cluster.url);
  const mail = await startMailFake({ port: await freePort(), dir: path.join(dataDir, "mail") });
  const s3 = await startS3Fake({ port: await freePort(), dir: path.join(dataDir, "s3") });
  const services = wrap(cluster, mail, s3, true);
  const stop = services.stop;
  services.stop = async () => {
    await stop();
    fs.rmSync(dataDir, { recursive: true, force: true });
  };
  return services;
}

/** Sender of Backplate's mail unless MAIL_FROM says otherwise. */
export const DEFAULT_MAIL_FROM = "Backplate <bench@backplate.example>";

function wrap(cluster: Cluster, mail: MailFake | null, s3: S3Fake | null, throwaway: boolean): Services {
  const mailEnv: Record<string, string> = mail
    ? { SMTP_URL: `smtp://127.0.0.1:${mail.port}`, BACKPLATE_MAIL_FAKE_DIR: mail.dir }
    : {};
  return {
    databaseUrl: cluster.url,
    pgDataDir: cluster.dataDir,
    pgPort: cluster.port,
    mailDir: mail?.dir ?? null,
    smtpPort: mail?.port ?? null,
    s3,
    env: { DATABASE_URL: cluster.url, ...mailEnv, ...(s3?.env ?? {}), MAIL_FROM: process.env.MAIL_FROM ?? DEFAULT_MAIL_FROM },
    async stop() {
      await mail?.stop();
      await s3?.stop();
      if (throwaway) destroyCluster(cluster.dataDir);
      else cluster.stop();
    },
  };
}
