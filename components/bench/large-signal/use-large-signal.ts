"use client";
/**
 * The bench's two large-signal jobs on the long-job worker (useLongJob): the distortion sweep and the power-on run.
 * Each runs only when asked, on a snapshot of the design taken at that moment, so editing never starts a
 * seconds-long run; the result is marked stale once the design has changed since.
 */
import { useCallback, useMemo, useState } from "react";
import type { SolverHandle } from "../solver/client";
import type { Outcome, ProgressCallback } from "../solver/protocol";
import { type LongJobState, useLongJob } from "../solver/use-long-job";
import type {
  DistortionJobRequest,
  DistortionJobResult,
  PowerOnJobRequest,
  PowerOnJobResult,
} from "./compute-large-signal";

const runDistortion = (api: SolverHandle["api"], request: DistortionJobRequest, onProgress: ProgressCallback) =>
  api.distortion(request, onProgress) as Promise<Outcome<DistortionJobResult>>;
const runPowerOn = (api: SolverHandle["api"], request: PowerOnJobRequest, onProgress: ProgressCallback) =>
  api.powerOn(request, onProgress) as Promise<Outcome<PowerOnJobResult>>;

export interface LargeSignalJob<Q, R> {
  job: LongJobState<Outcome<R>>;
  /** the request of the run shown (or running) */
  request: Q | null;
  start(request: Q): void;
  /** true when the design has changed since the shown run was asked */
  outdated: boolean;
}

function useAskedJob<Q extends { circuit: unknown; variant?: string }, R>(
  run: (api: SolverHandle["api"], request: Q, onProgress: ProgressCallback) => Promise<Outcome<R>>,
  circuit: unknown,
  variant: string | undefined,
): LargeSignalJob<Q, R> {
  const [asked, setAsked] = useState<{ request: Q; serial: number } | null>(null);
  // a new serial runs again even when the request is the same (Run after Cancel)
  const key = useMemo(() => (asked ? `${asked.serial}` : ""), [asked]);
  const job = useLongJob(run, asked?.request ?? null, key);
  const start = useCallback((request: Q) => setAsked((a) => ({ request, serial: (a?.serial ?? 0) + 1 })), []);
  const outdated = asked !== null && (asked.request.circuit !== circuit || asked.request.variant !== variant);
  return { job, request: asked?.request ?? null, start, outdated };
}

export interface LargeSignalJobs {
  distortion: LargeSignalJob<DistortionJobRequest, DistortionJobResult>;
  powerOn: LargeSignalJob<PowerOnJobRequest, PowerOnJobResult>;
}

export function useLargeSignal(circuit: unknown, variant: string | undefined): LargeSignalJobs {
  return {
    distortion: useAskedJob(runDistortion, circuit, variant),
    powerOn: useAskedJob(runPowerOn, circuit, variant),
  };
}
