"use client";
/**
 * `useLiveSolve(document, { variant, destinations, cableLengthM, overlays })`: every change of the circuit is
 * solved on the live worker within a frame; a solve that a newer change overtook is dropped (generation counter)
 * and only the newest pending change is sent next, so a burst of typing costs at most one solve behind. While a
 * solve runs, the previous result stays on screen marked `stale`. The overlay family (destinations, variants, a
 * sweep, other revisions, the spread) runs as a long job on a second worker, with progress and cancel.
 */
import { useEffect, useMemo, useRef, useState } from "react";
import type { BenchDocument } from "../document";
import type { Destination } from "../destinations/presets";
import { type SolverHandle, startSolver } from "./client";
import type {
  BenchSolveError,
  FamilyRequest,
  FamilyResult,
  ImpedanceResult,
  LiveResult,
  RevisionOverlay,
} from "./protocol";
import { noteChange, noteSolved } from "./update-timing";
import { type LongJobState, useLongJob } from "./use-long-job";

export interface OverlayChoice {
  variants: string[];
  sweep?: { parameter: string; values: (number | string)[] };
  revisions: RevisionOverlay[];
  spread?: { runs: number; seed: number };
}

export interface LiveSolveOptions {
  variant?: string;
  destinations?: Destination[];
  cableLengthM?: number;
  overlays?: OverlayChoice;
}

export type LiveSolveStatus = "idle" | "solving" | "ready" | "error";

export interface LiveSolveState {
  status: LiveSolveStatus;
  /** the newest result that solved (kept while a newer change is solving, and beside an error) */
  result: LiveResult | null;
  /** the generation `result` belongs to (the plots report it back for the update timing) */
  resultGeneration: number;
  error: BenchSolveError | null;
  /** |Zout(f)| for `result` (arrives just after it) */
  impedance: ImpedanceResult | null;
  /** a solve is running: what is shown is from an earlier state of the circuit */
  stale: boolean;
  family: LongJobState<FamilyResult>;
}

const runFamily = (api: SolverHandle["api"], request: FamilyRequest, onProgress: (d: number, t: number) => void) =>
  api.family(request, onProgress);

export function useLiveSolve(document: BenchDocument | null, options: LiveSolveOptions = {}): LiveSolveState {
  const { variant, destinations = [], cableLengthM = 0, overlays } = options;
  const circuit = document?.circuit ?? null;
  const solver = useRef<SolverHandle | null>(null);
  const generation = useRef(0);
  const inFlight = useRef(false);
  const pending = useRef<{ generation: number; circuit: unknown; variant?: string } | null>(null);
  const [state, setState] = useState<Omit<LiveSolveState, "family">>({
    status: "idle",
    result: null,
    resultGeneration: 0,
    error: null,
    impedance: null,
    stale: false,
  });

  useEffect(() => {
    solver.current = startSolver();
    return () => {
      solver.current?.terminate();
      solver.current = null;
    };
  }, []);

  useEffect(() => {
    if (circuit === null) return;
    const mine = ++generation.current;
    noteChange(mine);
    pending.current = { generation: mine, circuit, variant };
    setState((s) => ({ ...s, status: "solving", stale: s.result !== null }));
    const send = () => {
      const next = pending.current;
      const handle = solver.current;
      if (!next || !handle || inFlight.current) return;
      pending.current = null;
      inFlight.current = true;
      handle.api.live({ circuit: next.circuit, variant: next.variant }).then((outcome) => {
        inFlight.current = false;
        noteSolved(next.generation);
        const newest = next.generation === generation.current;
        if (outcome.ok) {
          setState((s) => ({
            status: newest ? "ready" : "solving",
            result: outcome.value,
            resultGeneration: next.generation,
            error: null,
            impedance: s.impedance,
            stale: !newest,
          }));
          const frequencies = outcome.value.document.ac?.frequency ?? [];
          if (newest) {
            // |Zout(f)| after the live result, so the figures and the Bode plot never wait for it
            handle.api.impedance({ circuit: next.circuit, variant: next.variant }, frequencies).then((z) => {
              if (z.ok && next.generation === generation.current) setState((s) => ({ ...s, impedance: z.value }));
            });
          }
        } else if (newest) {
          setState((s) => ({ ...s, status: "error", error: outcome.error, stale: s.result !== null }));
        }
        send();
      });
    };
    // sent at once when the worker is free (changes within one task collapse into one solve); a change made while a
    // solve runs waits for it, and only the newest such change is sent
    queueMicrotask(send);
  }, [circuit, variant]);

  const familyRequest = useMemo((): FamilyRequest | null => {
    if (circuit === null) return null;
    const o = overlays ?? { variants: [], revisions: [] };
    const wanted = destinations.length + o.variants.length + (o.sweep?.values.length ?? 0) + o.revisions.length;
    if (wanted === 0 && !o.spread) return null;
    return { circuit, variant, destinations, cableLengthM, ...o };
  }, [circuit, variant, destinations, cableLengthM, overlays]);
  const familyKey = useMemo(() => (familyRequest ? JSON.stringify(familyRequest) : ""), [familyRequest]);
  const family = useLongJob(runFamily, familyRequest, familyKey);

  return { ...state, family };
}
