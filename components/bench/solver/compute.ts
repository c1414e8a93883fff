/**
 * The solver's work, as plain functions of plain data (the workers only wrap these): the live solve of the design,
 * the family of overlaid curves, and "what moves this figure". Any engine error becomes an `Outcome` with the
 * engine's JSON, so nothing throws across the worker boundary.
 */
import { figureSensitivities } from "@/sim/analyses/figure-sensitivity";
import { outputImpedanceSweep } from "@/sim/analyses/output-impedance-sweep";
import { isSimError } from "@/sim/errors";
import type { OutputDocument } from "@/sim/results";
import { runCircuit } from "@/sim/run";
import { withDestination } from "../destinations/with-destination";
import type {
  BenchSolveError,
  Curve,
  ExplainRequest,
  ExplainResult,
  FamilyRequest,
  FamilyResult,
  ImpedanceResult,
  LiveRequest,
  LiveResult,
  Outcome,
  ProgressCallback,
} from "./protocol";

/** The bench always plots: when the file asks for no AC, it uses the contract's default grid (1 Hz–100 kHz, 20/decade). */
export const DEFAULT_AC = { from: 1, to: 100000, points_per_decade: 20 };

export function toSolveError(e: unknown): BenchSolveError {
  if (isSimError(e)) return e.toJSON();
  if (e instanceof RangeError) return { code: "invalid_value", message: e.message };
  return { code: "invalid_file", message: `The engine stopped: ${e instanceof Error ? e.message : String(e)}` };
}

function attempt<T>(work: () => T): Outcome<T> {
  try {
    return { ok: true, value: work() };
  } catch (e) {
    return { ok: false, error: toSolveError(e) };
  }
}

type FileShape = { analyses?: Record<string, unknown>; parameters?: Record<string, unknown> };

/** The file with op and AC always requested (the bench shows both), other requested analyses kept. */
function forBench(circuit: unknown): unknown {
  const file = circuit as FileShape;
  const analyses = { ...(file.analyses ?? {}) };
  analyses.op ??= {};
  analyses.ac ??= DEFAULT_AC;
  // the sweep is an overlay here, run by the family job
  delete analyses.sweep;
  delete analyses.spread;
  // the large-signal runs take seconds: the bench runs them as long jobs when asked (large-signal/)
  delete analyses.transient;
  delete analyses.distortion;
  return { ...file, analyses };
}

export function solveLive(request: LiveRequest): Outcome<LiveResult> {
  const started = performance.now();
  return attempt(() => {
    const document = runCircuit(forBench(request.circuit), { variant: request.variant });
    return { document, solveMs: performance.now() - started };
  });
}

export function solveImpedance(request: LiveRequest, frequencies: number[]): Outcome<ImpedanceResult> {
  return attempt(() => outputImpedanceSweep(forBench(request.circuit), frequencies, { variant: request.variant }));
}

function curveOf(id: string, label: string, group: Curve["group"], run: () => OutputDocument): Curve {
  const outcome = attempt(run);
  if (!outcome.ok) {
    return { id, label, group, frequency: [], magnitude_db: [], phase_deg: [], figures: null, error: outcome.error };
  }
  const { ac, figures } = outcome.value;
  return {
    id,
    label,
    group,
    frequency: ac?.frequency ?? [],
    magnitude_db: ac?.magnitude_db ?? [],
    phase_deg: ac?.phase_deg ?? [],
    figures,
  };
}

function withParameter(file: unknown, name: string, value: number | string): unknown {
  const f = file as FileShape;
  return { ...f, parameters: { ...(f.parameters ?? {}), [name]: value } };
}

export function solveFamily(request: FamilyRequest, onProgress?: ProgressCallback): FamilyResult {
  const base = forBench(request.circuit);
  const variant = request.variant;
  const jobs: (() => Curve)[] = [];
  for (const d of request.destinations) {
    jobs.push(() =>
      curveOf(`destination:${d.id}`, d.name, "destination", () =>
        runCircuit(withDestination(base as Parameters<typeof withDestination>[0], d, request.cableLengthM), {
          variant,
        }),
      ),
    );
  }
  for (const name of request.variants) {
    jobs.push(() =>
      curveOf(`variant:${name}`, `Variant: ${name}`, "variant", () => runCircuit(base, { variant: name })),
    );
  }
  if (request.sweep) {
    const { parameter, values } = request.sweep;
    for (const value of values) {
      jobs.push(() =>
        curveOf(`sweep:${parameter}=${value}`, `${parameter} = ${value}`, "sweep", () =>
          runCircuit(withParameter(base, parameter, value), { variant }),
        ),
      );
    }
  }
  for (const r of request.revisions) {
    jobs.push(() => curveOf(`revision:${r.id}`, r.label, "revision", () => runCircuit(forBench(r.circuit))));
  }
  const total = jobs.length + (request.spread ? 1 : 0);
  const curves: Curve[] = [];
  jobs.forEach((job, i) => {
    curves.push(job());
    onProgress?.(i + 1, total);
  });
  let spread: FamilyResult["spread"] = null;
  if (request.spread) {
    const file = base as FileShape;
    const outcome = attempt(() =>
      runCircuit({ ...file, analyses: { ...file.analyses, spread: request.spread } }, { variant }),
    );
    spread = outcome.ok ? (outcome.value.spread ?? null) : null;
    onProgress?.(total, total);
  }
  return { curves, spread };
}

export function explainFigures(request: ExplainRequest, onProgress?: ProgressCallback): Outcome<ExplainResult> {
  return attempt(() =>
    figureSensitivities(request.circuit, {
      variant: request.variant,
      relativeStep: request.relativeStep,
      onProgress,
    }),
  );
}
