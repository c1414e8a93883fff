/**
 * Settings for the launchers, each from an environment variable with a default (the README lists them all).
 */
import path from "node:path";

export const PROJECT_ROOT = path.resolve(import.meta.dirname, "..", "..");

export const launcherConfig = {
  /** Port of the private PostgreSQL cluster that `npm start` runs. */
  pgPort: Number(process.env.BACKPLATE_PG_PORT ?? 54329),
  /** Where that cluster keeps its files. */
  pgDataDir: process.env.BACKPLATE_PG_DATA ?? path.join(PROJECT_ROOT, ".data", "postgres"),
  database: process.env.BACKPLATE_PG_DATABASE ?? "backplate",
  /** Port of the mail fake that `npm start` runs (the tests take a free port). */
  smtpPort: Number(process.env.BACKPLATE_SMTP_PORT ?? 2526),
  /** Port of the storage fake that `npm start` runs (the tests take a free port). */
  s3Port: Number(process.env.BACKPLATE_S3_PORT ?? 4569),
  /** Where the app listens. */
  host: process.env.HOST ?? "127.0.0.1",
  port: Number(process.env.PORT ?? 3000),
};
