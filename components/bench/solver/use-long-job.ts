"use client";
/**
 * A long job on its own solver worker (a family of curves, a sweep, a spread, the explanations): progress as it
 * runs, the previous result kept (marked stale) until the new one arrives, and cancel by terminating the worker.
 * A changed request supersedes the running job: a job that has already run for LONG_JOB_RESTART_MS is cancelled
 * and restarted at once; a shorter one finishes and its result is dropped (restarting a worker costs more).
 */
import { useCallback, useEffect, useRef, useState } from "react";
import { proxy, type SolverHandle, startSolver } from "./client";
import type { ProgressCallback } from "./protocol";

export const LONG_JOB_RESTART_MS = 250;

export type LongJobStatus = "idle" | "running" | "ready" | "cancelled" | "error";

export interface LongJobState<R> {
  status: LongJobStatus;
  progress: { done: number; total: number } | null;
  result: R | null;
  /** the result is from an earlier request */
  stale: boolean;
  error: string | null;
  cancel(): void;
}

export type LongJobRun<Q, R> = (api: SolverHandle["api"], request: Q, onProgress: ProgressCallback) => Promise<R>;

export function useLongJob<Q, R>(run: LongJobRun<Q, R>, request: Q | null, key: string): LongJobState<R> {
  const solver = useRef<SolverHandle | null>(null);
  const generation = useRef(0);
  const running = useRef<{ generation: number; started: number } | null>(null);
  const [state, setState] = useState<Omit<LongJobState<R>, "cancel">>({
    status: "idle",
    progress: null,
    result: null,
    stale: false,
    error: null,
  });
  const latest = useRef({ run, request });
  latest.current = { run, request };

  const restart = useCallback(() => {
    solver.current?.terminate();
    solver.current = null;
    running.current = null;
  }, []);

  const start = useCallback(() => {
    const { run: runNow, request: requestNow } = latest.current;
    if (requestNow === null) return;
    const mine = ++generation.current;
    solver.current ??= startSolver();
    running.current = { generation: mine, started: performance.now() };
    setState((s) => ({ ...s, status: "running", progress: null, stale: s.result !== null, error: null }));
    const onProgress = proxy((done: number, total: number) => {
      if (generation.current === mine) setState((s) => ({ ...s, progress: { done, total } }));
    });
    runNow(solver.current.api, requestNow, onProgress).then(
      (result) => {
        if (running.current?.generation === mine) running.current = null;
        if (generation.current === mine)
          setState({ status: "ready", progress: null, result, stale: false, error: null });
        else if (running.current === null) start();
      },
      (e: unknown) => {
        if (generation.current !== mine) return;
        running.current = null;
        setState((s) => ({ ...s, status: "error", progress: null, error: e instanceof Error ? e.message : String(e) }));
      },
    );
  }, []);

  // biome-ignore lint/correctness/useExhaustiveDependencies: the key stands for the request's content
  useEffect(() => {
    if (request === null) {
      generation.current++;
      setState({ status: "idle", progress: null, result: null, stale: false, error: null });
      return;
    }
    const busy = running.current;
    if (busy && performance.now() - busy.started >= LONG_JOB_RESTART_MS) restart();
    if (running.current) {
      // a short job is finishing: it will see it was superseded and start this request
      generation.current++;
      setState((s) => ({ ...s, status: "running", stale: s.result !== null }));
      return;
    }
    start();
  }, [key]);

  useEffect(() => restart, [restart]);

  const cancel = useCallback(() => {
    generation.current++;
    restart();
    setState((s) => ({ ...s, status: "cancelled", progress: null, stale: s.result !== null }));
  }, [restart]);

  return { ...state, cancel };
}
