/**
 * Global setup of the integration project: a throwaway PostgreSQL cluster (migrated), started once for the run
 * and removed afterwards. Test files read its URL from process.env.DATABASE_URL (inherited by the workers) or
 * through `inject("databaseUrl")`.
 */
import type { TestProject } from "vitest/node";
import { startTestServices } from "../../scripts/lib/services";

declare module "vitest" {
  export interface ProvidedContext {
    databaseUrl: string;
  }
}

export default async function setup(project: TestProject) {
  const services = await startTestServices();
  Object.assign(process.env, services.env);
  project.provide("databaseUrl", services.databaseUrl);
  return async () => {
    await services.stop();
  };
}
