/**
 * Starting a solver worker and talking to it through comlink. `terminate()` is how a long job is cancelled: the
 * worker is thrown away mid-computation and the next job starts a fresh one.
 */
import * as Comlink from "comlink";
import type { SolverApi } from "./solver.worker";

export interface SolverHandle {
  api: Comlink.Remote<SolverApi>;
  terminate(): void;
}

export function startSolver(): SolverHandle {
  const worker = new Worker(new URL("./solver.worker.ts", import.meta.url), { type: "module", name: "bench-solver" });
  const api = Comlink.wrap<SolverApi>(worker);
  return {
    api,
    terminate() {
      api[Comlink.releaseProxy]();
      worker.terminate();
    },
  };
}

export { proxy } from "comlink";
