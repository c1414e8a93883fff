"use client";
/**
 * `useLiveSolve(document, { variant, destinations, cableLengthM, overlays })`: every change of the circuit is
 * solved on the live worker within a frame; a solve that a newer change overtook is dropped (generation counter)
 * and only the newest pending change is sent next, so a burst of typing costs at most one solve behind. While a
 * solve runs, the previous result stays on screen marked `stale`. With `changes` (a store subscription) a change is
 * posted the moment the store takes it, so the worker solves while the page renders the edit. The overlay family
 * (destinations, variants, a sweep, other revisions, the spread) runs as a long job on a second worker, with
 * progress and cancel.
 */
import { useEffect, useLayoutEffect, useMemo, useRef, useState } from "react";
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
import { noteChange, noteSolved, noteStage } from "./update-timing";
import { type LongJobState, useLongJob } from "./use-long-job";

export interface OverlayChoice {
  variants: string[];
  sweep?: { parameter: string; values: (number | string)[] };
  revisions: RevisionOverlay[];
  spread?: { runs: number; seed: number };
}

/** Subscribes to changes of the circuit (and variant) as the store takes them, before React renders them. */
export type CircuitChanges = (listener: (circuit: unknown, variant: string | undefined) => void) => () => void;

export interface LiveSolveOptions {
  variant?: string;
  /** when given, a change is posted to the worker from here at once instead of after React has rendered it */
  changes?: CircuitChanges;
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
  const { variant, destinations = [], cableLengthM = 0, overlays, changes } = options;
  const circuit = document?.circuit ?? null;
  const solver = useRef<SolverHandle | null>(null);
  const generation = useRef(0);
  const inFlight = useRef(false);
  const pending = useRef<{ generation: number; circuit: unknown; variant?: string } | null>(null);
  const submitted = useRef<{ circuit: unknown; variant?: string } | null>(null);
  const [state, setState] = useState<Omit<LiveSolveState, "family">>({
    status: "idle",
    result: null,
    resultGeneration: 0,
    error: null,
    impedance: null,
    stale: false,
  });

  // a layout effect, so the worker exists when the first circuit is submitted (in the layout effect below)
  useLayoutEffect(() => {
    solver.current = startSolver();
    return () => {
      solver.current?.terminate();
      solver.current = null;
    };
  }, []);

  // Takes one state of the circuit to the solver (once: the store's subscription and the layout effect below may
  // both offer the same circuit). Uses only refs and setState, so it is the same function for the hook's life.
  const submit = useRef((next: unknown, nextVariant: string | undefined) => {
    if (submitted.current && submitted.current.circuit === next && submitted.current.variant === nextVariant) return;
    submitted.current = { circuit: next, variant: nextVariant };
    const mine = ++generation.current;
    noteChange(mine);
    pending.current = { generation: mine, circuit: next, variant: nextVariant };
    setState((s) => ({ ...s, status: "solving", stale: s.result !== null }));
    const send = () => {
      const job = pending.current;
      const handle = solver.current;
      if (!job || !handle || inFlight.current) return;
      pending.current = null;
      inFlight.current = true;
      noteStage(job.generation, "sent");
      handle.api.live({ circuit: job.circuit, variant: job.variant }).then((outcome) => {
        inFlight.current = false;
        noteSolved(job.generation, outcome.ok ? outcome.value.solveMs : undefined);
        const newest = job.generation === generation.current;
        if (outcome.ok) {
          setState((s) => ({
            status: newest ? "ready" : "solving",
            result: outcome.value,
            resultGeneration: job.generation,
            error: null,
            impedance: s.impedance,
            stale: !newest,
          }));
          const frequencies = outcome.value.document.ac?.frequency ?? [];
          if (newest) {
            // |Zout(f)| after the live result, so the figures and the Bode plot never wait for it
            handle.api.impedance({ circuit: job.circuit, variant: job.variant }, frequencies).then((z) => {
              if (z.ok && job.generation === generation.current) setState((s) => ({ ...s, impedance: z.value }));
            });
          }
        } else if (newest) {
          setState((s) => ({ ...s, status: "error", error: outcome.error, stale: s.result !== null }));
        }
        send();
      });
    };
    // posted at once when the worker is free, from inside the store's update, so the worker solves while React renders
    // the edit (a microtask ran only after React's own render of it); a change made while a solve runs waits for it,
    // and only the newest such change is sent
    send();
  }).current;

  // the store's changes go to the worker as they happen, so the solve runs while React renders the edit
  useEffect(() => changes?.((next, nextVariant) => submit(next, nextVariant)), [changes, submit]);
  // and whatever reaches the hook by its props (the first document, a bench without a store subscription)
  useLayoutEffect(() => {
    if (circuit !== null) submit(circuit, variant);
  }, [circuit, variant, submit]);

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
