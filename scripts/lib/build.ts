/**
 * Builds the Next.js app only when its inputs changed since the last build into the same folder: a fingerprint of
 * every source file's path, size and modification time is kept beside the build.
 */
import { spawnSync } from "node:child_process";
import { createHash } from "node:crypto";
import fs from "node:fs";
import path from "node:path";
import { PROJECT_ROOT } from "./config";

const SOURCE_FOLDERS = ["app", "components", "sim", "db", "public"];
const SOURCE_FILES = ["package-lock.json", "next.config.mjs", "postcss.config.mjs", "tsconfig.json"];
const STAMP_FILE = "backplate-build-stamp";

function walk(dir: string, out: string[]) {
  if (!fs.existsSync(dir)) return;
  for (const entry of fs.readdirSync(dir, { withFileTypes: true })) {
    const full = path.join(dir, entry.name);
    if (entry.isDirectory()) walk(full, out);
    else out.push(full);
  }
}

export function sourceFingerprint(): string {
  const files: string[] = [];
  for (const folder of SOURCE_FOLDERS) walk(path.join(PROJECT_ROOT, folder), files);
  for (const file of SOURCE_FILES) files.push(path.join(PROJECT_ROOT, file));
  const hash = createHash("sha256");
  for (const file of files.sort()) {
    if (!fs.existsSync(file)) continue;
    const stat = fs.statSync(file);
    hash.update(`${path.relative(PROJECT_ROOT, file)}:${stat.size}:${stat.mtimeMs}\n`);
  }
  return hash.digest("hex");
}

/** Runs `next build` into `distDir` (relative to the project) unless the build there is current. */
export function buildIfStale(distDir: string, log: (line: string) => void): void {
  const stampPath = path.join(PROJECT_ROOT, distDir, STAMP_FILE);
  const fingerprint = sourceFingerprint();
  const current = fs.existsSync(stampPath) && fs.readFileSync(stampPath, "utf8") === fingerprint;
  if (current && fs.existsSync(path.join(PROJECT_ROOT, distDir, "BUILD_ID"))) {
    log(`Build in ${distDir} is current`);
    return;
  }
  log(`Building the app into ${distDir} (next build)…`);
  const started = Date.now();
  const result = spawnSync(path.join(PROJECT_ROOT, "node_modules", ".bin", "next"), ["build"], {
    cwd: PROJECT_ROOT,
    stdio: ["ignore", "pipe", "pipe"],
    encoding: "utf8",
    env: { ...process.env, BACKPLATE_DIST_DIR: distDir, NEXT_TELEMETRY_DISABLED: "1" },
  });
  if (result.status !== 0) {
    throw new Error(`next build failed:\n${result.stdout}\n${result.stderr}`);
  }
  fs.writeFileSync(stampPath, fingerprint);
  log(`Built in ${((Date.now() - started) / 1000).toFixed(1)} s`);
}
