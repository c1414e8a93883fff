/**
 * Global setup of the browser project: throwaway services, the demo seed, a production build (into .next-test,
 * only when the sources changed) and `next start` on a free port (scripts/lib/built-app.ts). Tests read the address
 * with `inject("baseUrl")` and drive Debian's Chromium through playwright-core (tests/app/chromium.ts).
 */
import type { TestProject } from "vitest/node";
import { startBuiltApp, TEST_SECRET } from "../../scripts/lib/built-app";

export { TEST_SECRET };

declare module "vitest" {
  export interface ProvidedContext {
    baseUrl: string;
    databaseUrl: string;
    /** The throwaway cluster, so a test can stop and restart PostgreSQL under the running app. */
    pgDataDir: string;
    pgPort: number;
    /** How the app reaches the storage fake (S3_ENDPOINT, S3_BUCKET, keys), so a test can look into the bucket. */
    s3Env: Record<string, string>;
  }
}

/** Build folder of the app tests; several checkouts or runs at once can each set their own. */
export const TEST_DIST_DIR = process.env.BACKPLATE_TEST_DIST_DIR || ".next-test";

export default async function setup(project: TestProject) {
  const app = await startBuiltApp(TEST_DIST_DIR, (line) => console.log(`[browser setup] ${line}`));
  const { services } = app;
  project.provide("baseUrl", app.baseUrl);
  project.provide("databaseUrl", services.databaseUrl);
  project.provide("pgDataDir", services.pgDataDir);
  project.provide("pgPort", services.pgPort);
  project.provide("s3Env", services.s3?.env ?? {});
  return () => app.stop();
}
