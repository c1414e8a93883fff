/**
 * `npm run db:start | db:stop | db:migrate`: the private PostgreSQL cluster of `npm start`, by hand.
 */
import { applyMigrations } from "../db/migrate";
import { launcherConfig } from "./lib/config";
import { resolveDataDir, startCluster, stopCluster } from "./lib/postgres";

const command = process.argv[2];
const log = (line: string) => console.log(`[backplate] ${line}`);
const options = { dataDir: launcherConfig.pgDataDir, port: launcherConfig.pgPort, database: launcherConfig.database, log };

async function main() {
  if (command === "start" || command === "migrate") {
    const cluster = await startCluster(options);
    if (command === "migrate") {
      await applyMigrations(process.env.DATABASE_URL || cluster.url);
      log("Migrations applied");
    }
    log(`DATABASE_URL=${cluster.url}`);
  } else if (command === "stop") {
    stopCluster(resolveDataDir(options.dataDir));
    log("PostgreSQL stopped");
  } else {
    console.error("Usage: npm run db:start | npm run db:stop | npm run db:migrate");
    process.exit(2);
  }
}

main().catch((error) => {
  console.error(`[backplate] ${error instanceof Error ? error.message : String(error)}`);
  process.exit(1);
});
