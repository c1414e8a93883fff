/**
 * The production build served by `next start` on a free port (app-server.ts), beside throwaway services
 * (PostgreSQL, mail and storage fakes) with the demo seed: what the app tests and `npm run bench:ui` run against.
 * Builds into `distDir` only when the sources changed (build.ts).
 */
import { seedDemo } from "../../db/seed";
import { startAppServer } from "./app-server";
import { buildIfStale } from "./build";
import { type Services, startTestServices } from "./services";

/** Session-cookie key of the test servers (throwaway, like their data). */
export const TEST_SECRET = "browser-test-secret-not-for-production";

export interface BuiltApp {
  baseUrl: string;
  services: Services;
  stop(): Promise<void>;
}

export async function startBuiltApp(distDir: string, log: (line: string) => void): Promise<BuiltApp> {
  const services = await startTestServices();
  try {
    await seedDemo(services.databaseUrl);
    buildIfStale(distDir, log);
    const server = await startAppServer({ distDir, env: services.env, secret: TEST_SECRET });
    return {
      baseUrl: server.baseUrl,
      services,
      async stop() {
        await server.stop();
        await services.stop();
      },
    };
  } catch (error) {
    await services.stop();
    throw error;
  }
}
