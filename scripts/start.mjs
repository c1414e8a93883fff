#!/usr/bin/env node
/**
 * `npm start` / `npm run dev`: installs dependencies when they are missing or stale, then hands over to
 * scripts/launch.ts (services, migrations, demo seed, build, serve). Plain Node so it runs before any install.
 */
import { spawn, spawnSync } from "node:child_process";
import fs from "node:fs";
import path from "node:path";

const root = path.resolve(import.meta.dirname, "..");
const installedLock = path.join(root, "node_modules", ".package-lock.json");
const lock = path.join(root, "package-lock.json");

export function ensureInstalled() {
  const stale =
    !fs.existsSync(installedLock) || fs.statSync(lock).mtimeMs > fs.statSync(installedLock).mtimeMs + 1000;
  if (!stale) return;
  console.log("Installing dependencies (npm ci)…");
  const result = spawnSync("npm", ["ci", "--no-audit", "--no-fund"], { cwd: root, stdio: "inherit" });
  if (result.status !== 0) {
    console.error("npm ci failed: see the messages above. Check that the npm registry is reachable.");
    process.exit(result.status ?? 1);
  }
}

if (import.meta.url === `file://${process.argv[1]}`) {
  ensureInstalled();
  const tsx = path.join(root, "node_modules", ".bin", "tsx");
  // react-server makes the `server-only` marker in db/ resolve to its empty module outside Next.
  const child = spawn(tsx, ["--conditions=react-server", path.join(root, "scripts", "launch.ts"), ...process.argv.slice(2)], {
    cwd: root,
    stdio: "inherit",
  });
  for (const signal of ["SIGINT", "SIGTERM"]) process.on(signal, () => child.kill(signal));
  child.on("exit", (code) => process.exit(code ?? 0));
}
