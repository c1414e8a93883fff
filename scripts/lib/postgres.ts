/**
 * A private PostgreSQL cluster from Debian's binaries, for `npm start` and for the tests.
 *
 * Why this shape: `initdb` refuses to run as root, so as root the cluster is owned by the unprivileged `postgres`
 * system user (created by Debian's package) and every command runs through `runuser`. The socket lives in the data
 * folder and the server listens on 127.0.0.1 only, on a port that is not 5432, so an existing server never collides.
 */
import { execFileSync, spawnSync } from "node:child_process";
import { createHash } from "node:crypto";
import fs from "node:fs";
import net from "node:net";
import os from "node:os";
import path from "node:path";

export interface ClusterOptions {
  /** Where the cluster's files live. Created on first start. */
  dataDir: string;
  port: number;
  /** Database to create (idempotent). */
  database: string;
  /** Throwaway clusters trade durability for speed (fsync off). */
  throwaway?: boolean;
  /** Print progress lines. */
  log?: (line: string) => void;
}

export interface Cluster {
  url: string;
  dataDir: string;
  port: number;
  /** False when the cluster was already running: `stop()` then leaves it running. */
  startedHere: boolean;
  stop(): void;
}

/** The role initdb creates; auth is `trust` on 127.0.0.1 only. */
export const CLUSTER_USER = "app";
const SYSTEM_USER = "postgres";

export class ClusterError extends Error {}

const isRoot = () => typeof process.getuid === "function" && process.getuid() === 0;

/** Finds initdb/pg_ctl on PATH or under /usr/lib/postgresql/<version>/bin (highest version). */
export function findPostgresBin(): string | null {
  const root = "/usr/lib/postgresql";
  if (fs.existsSync(root)) {
    const versions = fs
      .readdirSync(root)
      .filter((v) => fs.existsSync(path.join(root, v, "bin", "initdb")))
      .sort((a, b) => Number(b) - Number(a));
    if (versions.length > 0) return path.join(root, versions[0], "bin");
  }
  const which = spawnSync("sh", ["-c", "command -v initdb"], { encoding: "utf8" });
  const found = which.stdout.trim();
  if (which.status === 0 && found) return path.dirname(fs.realpathSync(found));
  return null;
}

/** Finds the binaries, installing Debian's `postgresql` package when missing and running as root. */
export function ensurePostgresBin(log: (line: string) => void = () => {}): string {
  const found = findPostgresBin();
  if (found) return found;
  if (!isRoot()) {
    throw new ClusterError(
      "PostgreSQL's server binaries (initdb, pg_ctl) are not installed. Install them with:\n" +
        "  sudo apt-get update && sudo apt-get install -y postgresql\nthen run the command again.",
    );
  }
  log("PostgreSQL is not installed: installing Debian's postgresql package (apt-get)…");
  execFileSync("apt-get", ["update"], { stdio: "inherit" });
  execFileSync("apt-get", ["install", "-y", "postgresql"], { stdio: "inherit", env: { ...process.env, DEBIAN_FRONTEND: "noninteractive" } });
  const installed = findPostgresBin();
  if (!installed) throw new ClusterError("apt-get installed postgresql but initdb was not found under /usr/lib/postgresql.");
  return installed;
}

/** True when every folder from / down to `dir` lets others in (the x bit), so the postgres user can reach it. */
function reachableByOthers(dir: string): boolean {
  let current = path.resolve(dir);
  for (;;) {
    if (fs.existsSync(current) && (fs.statSync(current).mode & 0o001) === 0) return false;
    const parent = path.dirname(current);
    if (parent === current) return true;
    current = parent;
  }
}

/**
 * The data folder to use. As root, a folder the postgres user cannot reach (a clone inside root's home, mode 700)
 * falls back to one under the system temp folder, keyed by the wanted path so each clone keeps its own cluster.
 */
export function resolveDataDir(wanted: string): string {
  const parent = path.dirname(path.resolve(wanted));
  if (!isRoot() || reachableByOthers(parent)) return path.resolve(wanted);
  const key = createHash("sha256").update(path.resolve(wanted)).digest("hex").slice(0, 12);
  return path.join(os.tmpdir(), `backplate-${key}`, path.basename(wanted));
}

function runAsOwner(bin: string, args: string[], options: { quiet?: boolean } = {}) {
  const command = isRoot() ? "runuser" : bin;
  const fullArgs = isRoot() ? ["-u", SYSTEM_USER, "--", bin, ...args] : args;
  return spawnSync(command, fullArgs, { encoding: "utf8", stdio: options.quiet ? "pipe" : ["ignore", "pipe", "pipe"] });
}

/** Resolves when something accepts TCP connections on 127.0.0.1:port. */
export function portInUse(port: number): Promise<boolean> {
  return new Promise((resolve) => {
    const socket = net.connect({ host: "127.0.0.1", port });
    socket.once("connect", () => {
      socket.destroy();
      resolve(true);
    });
    socket.once("error", () => resolve(false));
  });
}

/** An unused TCP port on 127.0.0.1, chosen by the kernel. */
export function freePort(): Promise<number> {
  return new Promise((resolve, reject) => {
    const server = net.createServer();
    server.once("error", reject);
    server.listen(0, "127.0.0.1", () => {
      const address = server.address();
      const port = typeof address === "object" && address ? address.port : 0;
      server.close(() => resolve(port));
    });
  });
}

function ensureOwnedFolder(dir: string) {
  fs.mkdirSync(dir, { recursive: true });
  if (isRoot()) {
    const ids = execFileSync("id", ["-u", SYSTEM_USER], { encoding: "utf8" }).trim();
    const gid = execFileSync("id", ["-g", SYSTEM_USER], { encoding: "utf8" }).trim();
    fs.chownSync(dir, Number(ids), Number(gid));
    // Parents we created (e.g. .data) must let the postgres user through.
    let parent = path.dirname(dir);
    while (!reachableByOthers(parent) && parent !== path.dirname(parent)) {
      fs.chmodSync(parent, fs.statSync(parent).mode | 0o001);
      parent = path.dirname(parent);
    }
  }
  fs.chmodSync(dir, 0o700);
}

function isRunning(bin: string, dataDir: string): boolean {
  if (!fs.existsSync(path.join(dataDir, "postmaster.pid"))) return false;
  return runAsOwner(path.join(bin, "pg_ctl"), ["-D", dataDir, "status"], { quiet: true }).status === 0;
}

function readConfiguredPort(dataDir: string): number | null {
  const conf = path.join(dataDir, "postgresql.auto.conf");
  if (!fs.existsSync(conf)) return null;
  const match = /^port\s*=\s*'?(\d+)/m.exec(fs.readFileSync(conf, "utf8"));
  return match ? Number(match[1]) : null;
}

/** Starts the cluster (creating it on first use) and the database. Idempotent: a running cluster is reused. */
export async function startCluster(options: ClusterOptions): Promise<Cluster> {
  const log = options.log ?? (() => {});
  const bin = ensurePostgresBin(log);
  const dataDir = resolveDataDir(options.dataDir);
  const { port } = options;
  const url = `postgres://${CLUSTER_USER}@127.0.0.1:${port}/${options.database}`;
  const cluster: Cluster = {
    url,
    dataDir,
    port,
    startedHere: false,
    stop: () => {
      if (cluster.startedHere) stopCluster(dataDir);
    },
  };

  if (!fs.existsSync(path.join(dataDir, "PG_VERSION"))) {
    if (fs.existsSync(dataDir) && fs.readdirSync(dataDir).length > 0) {
      throw new ClusterError(`${dataDir} exists but is not a PostgreSQL data folder. Move it away or set another folder.`);
    }
    log(`Creating a PostgreSQL cluster in ${dataDir}`);
    ensureOwnedFolder(dataDir);
    const init = runAsOwner(path.join(bin, "initdb"), [
      "-D", dataDir, "-U", CLUSTER_USER, "--auth=trust", "-E", "UTF8", "--locale=C.UTF-8",
    ]);
    if (init.status !== 0) throw new ClusterError(`initdb failed:\n${init.stderr || init.stdout}`);
  }

  // Settings go in postgresql.auto.conf so a changed port is picked up on the next start.
  const settings = [
    "listen_addresses = '127.0.0.1'",
    `port = ${port}`,
    `unix_socket_directories = '${dataDir}'`,
    "max_connections = 200",
    ...(options.throwaway ? ["fsync = off", "synchronous_commit = off", "full_page_writes = off"] : []),
  ];
  const running = isRunning(bin, dataDir);
  if (running && readConfiguredPort(dataDir) === port) {
    log(`PostgreSQL already running on 127.0.0.1:${port}`);
  } else {
    if (running) stopCluster(dataDir);
    if (await portInUse(port)) {
      throw new ClusterError(
        `Port ${port} on 127.0.0.1 is taken by another program. Stop it, or choose another port with BACKPLATE_PG_PORT=<port>.`,
      );
    }
    const autoConf = path.join(dataDir, "postgresql.auto.conf");
    fs.writeFileSync(autoConf, `${settings.join("\n")}\n`);
    if (isRoot()) execFileSync("chown", [`${SYSTEM_USER}:${SYSTEM_USER}`, autoConf]);
    const logFile = path.join(dataDir, "server.log");
    const started = runAsOwner(path.join(bin, "pg_ctl"), ["-D", dataDir, "-l", logFile, "-w", "-t", "60", "start"]);
    if (started.status !== 0) {
      const tail = fs.existsSync(logFile) ? fs.readFileSync(logFile, "utf8").split("\n").slice(-15).join("\n") : "";
      throw new ClusterError(`PostgreSQL did not start:\n${started.stderr || started.stdout}\n${tail}`);
    }
    cluster.startedHere = true;
    log(`PostgreSQL listening on 127.0.0.1:${port} (data in ${dataDir})`);
  }
  createDatabase(bin, port, options.database);
  return cluster;
}

function createDatabase(bin: string, port: number, database: string) {
  const psql = (sql: string) =>
    spawnSync(path.join(bin, "psql"), ["-h", "127.0.0.1", "-p", String(port), "-U", CLUSTER_USER, "-d", "postgres", "-tAc", sql], {
      encoding: "utf8",
    });
  const exists = psql(`SELECT 1 FROM pg_database WHERE datname = '${database.replace(/'/g, "''")}'`);
  if (exists.status !== 0) throw new ClusterError(`Could not query PostgreSQL: ${exists.stderr}`);
  if (exists.stdout.trim() !== "1") {
    const created = psql(`CREATE DATABASE "${database.replace(/"/g, '""')}"`);
    if (created.status !== 0) throw new ClusterError(`Could not create database ${database}: ${created.stderr}`);
  }
}

/** Stops the cluster in `dataDir` if it runs (fast shutdown: open sessions are ended, committed work is kept). */
export function stopCluster(dataDir: string): void {
  const bin = findPostgresBin();
  if (!bin || !fs.existsSync(path.join(dataDir, "postmaster.pid"))) return;
  runAsOwner(path.join(bin, "pg_ctl"), ["-D", dataDir, "-m", "fast", "-w", "stop"], { quiet: true });
}

/** Stops the cluster and deletes its files (test clusters). */
export function destroyCluster(dataDir: string): void {
  stopCluster(dataDir);
  fs.rmSync(dataDir, { recursive: true, force: true });
}
