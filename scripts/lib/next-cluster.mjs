/**
 * `next start` in several processes sharing one port (Node's cluster module: the primary accepts connections and
 * hands them to the workers in turn), so one machine's cores all serve requests. The app servers keep no state of
 * their own (README, "Scaling past one machine"), so any worker can answer any request.
 * Usage: node next-cluster.mjs WORKERS <next start arguments…>
 * The primary restarts a worker that dies, and stops them all on SIGTERM or SIGINT.
 */
import cluster from "node:cluster";
import { createRequire } from "node:module";

const require = createRequire(import.meta.url);
const [count, ...nextArgs] = process.argv.slice(2);
const workers = Number(count);

if (cluster.isPrimary) {
  if (!Number.isInteger(workers) || workers < 1) {
    console.error(`next-cluster: the first argument is the number of workers (1 or more), not "${count}".`);
    process.exit(2);
  }
  let stopping = false;
  for (let i = 0; i < workers; i++) cluster.fork();
  cluster.on("exit", (worker, code) => {
    if (stopping) {
      if (Object.keys(cluster.workers ?? {}).length === 0) process.exit(0);
      return;
    }
    console.error(`next-cluster: worker ${worker.process.pid} exited with ${code}; starting another`);
    cluster.fork();
  });
  const stop = () => {
    stopping = true;
    for (const worker of Object.values(cluster.workers ?? {})) worker?.kill("SIGTERM");
    setTimeout(() => process.exit(0), 2000).unref();
  };
  process.on("SIGTERM", stop);
  process.on("SIGINT", stop);
} else {
  const nextBin = require.resolve("next/dist/bin/next");
  process.argv = [process.argv[0], nextBin, ...nextArgs];
  require(nextBin);
}
