import path from "node:path";
import { defineConfig } from "vitest/config";

const alias = {
  "@": path.resolve(import.meta.dirname),
  // db/ marks itself server-only for Next; under vitest it runs in Node directly.
  "server-only": path.resolve(import.meta.dirname, "tests/setup/empty-module.ts"),
};

/**
 * Three projects, run by `npm test` (scripts/test.mjs):
 * - unit: pure code (sim/, components' logic), no services;
 * - integration: against a throwaway PostgreSQL cluster and the mail/storage fakes (tests/setup/services.ts);
 * - app: the built app served by `next start`, tried over HTTP and in Debian's Chromium through playwright-core
 *   (tests/setup/app.ts).
 */
export default defineConfig({
  resolve: { alias },
  test: {
    projects: [
      {
        resolve: { alias },
        test: {
          name: "unit",
          include: ["sim/**/*.test.ts", "components/**/*.test.{ts,tsx}", "tests/unit/**/*.test.{ts,tsx}"],
          environment: "node",
          // Property tests solve hundreds of circuits; on a loaded 2-core machine that can pass 5 s.
          testTimeout: 60_000,
        },
      },
      {
        resolve: { alias },
        test: {
          name: "integration",
          include: ["tests/integration/**/*.test.ts", "db/**/*.test.ts"],
          environment: "node",
          globalSetup: ["tests/setup/services.ts"],
          fileParallelism: false,
          testTimeout: 30_000,
          hookTimeout: 120_000,
        },
      },
      {
        resolve: { alias },
        test: {
          name: "app",
          include: ["tests/app/**/*.test.ts"],
          environment: "node",
          globalSetup: ["tests/setup/app.ts"],
          fileParallelism: false,
          testTimeout: 60_000,
          hookTimeout: 300_000,
        },
      },
    ],
  },
});
