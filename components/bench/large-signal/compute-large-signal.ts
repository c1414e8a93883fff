/**
 * The bench's large-signal jobs, as plain functions of plain data (solver.worker.ts only wraps them): the distortion
 * panel's level sweep (THD against SPL, the harmonics at each level, max_spl_db and what limits it) with the time
 * waveform at one level, and the power-on run (all sources from zero). Both go through the engine's own
 * `simulate` so the bench shows what the headless command prints for the same analyses.
 */
import { elaborate } from "@/sim/circuit/elaborate";
import { checkTopology } from "@/sim/circuit/topology";
import { simulate } from "@/sim/analyses/simulate";
import type { DistortionPoint, Figures, TransientResult } from "@/sim/results";
import { withFiniteNumbers } from "@/sim/runner";
import { toSolveError } from "../solver/compute";
import type { Outcome, ProgressCallback } from "../solver/protocol";

/** Progress units the engine's 0…1 fraction is reported in. */
export const PROGRESS_STEPS = 1000;
/** Periods of the drive shown in the waveform view (from the operating point, so the first shows the start). */
export const WAVEFORM_PERIODS = 5;
/** Samples per period the waveform view asks for at most (the engine's largest step). */
export const WAVEFORM_SAMPLES_PER_PERIOD = 100;

export interface DistortionJobRequest {
  circuit: unknown;
  variant?: string;
  /** Hz */
  frequency: number;
  /** the sweep's levels, dB SPL */
  splDb: number[];
  /** dB SPL of the waveform view */
  waveformSplDb: number;
  /** nets shown beside the output in the waveform view */
  probe: string[];
}

export interface DistortionJobResult {
  points: DistortionPoint[];
  figures: Figures;
  waveform: TransientResult;
  waveformSplDb: number;
}

export interface PowerOnJobRequest {
  circuit: unknown;
  variant?: string;
  /** s */
  stop: number;
  probe: string[];
}

export interface PowerOnJobResult {
  transient: TransientResult;
  /** s; null when a capsule has not settled by the end of the run */
  settleTimeS: number | null;
  stop: number;
}

type FileShape = { analyses?: Record<string, unknown> };

function run(
  file: unknown,
  analyses: Record<string, unknown>,
  variant: string | undefined,
  onProgress?: ProgressCallback,
) {
  const circuit = elaborate({ ...(file as FileShape), analyses }, { variant });
  checkTopology(circuit);
  const result = simulate(circuit, {
    onProgress: onProgress && ((f) => onProgress(Math.round(f * PROGRESS_STEPS), PROGRESS_STEPS)),
  });
  return withFiniteNumbers(result);
}

function attempt<T>(work: () => T): Outcome<T> {
  try {
    return { ok: true, value: work() };
  } catch (e) {
    return { ok: false, error: toSolveError(e) };
  }
}

export function solveDistortionJob(
  request: DistortionJobRequest,
  onProgress?: ProgressCallback,
): Outcome<DistortionJobResult> {
  return attempt(() => {
    const period = 1 / request.frequency;
    const result = run(
      request.circuit,
      {
        op: {},
        distortion: { frequency: request.frequency, spl_db: request.splDb },
        transient: {
          stop: WAVEFORM_PERIODS * period,
          step: period / WAVEFORM_SAMPLES_PER_PERIOD,
          drive: { shape: "sine", frequency: request.frequency, spl_db: request.waveformSplDb },
          probe: request.probe,
        },
      },
      request.variant,
      onProgress,
    );
    return {
      points: result.distortion ?? [],
      figures: result.figures,
      waveform: result.transient ?? { time: [], output: [], nets: {} },
      waveformSplDb: request.waveformSplDb,
    };
  });
}

export function solvePowerOnJob(request: PowerOnJobRequest, onProgress?: ProgressCallback): Outcome<PowerOnJobResult> {
  return attempt(() => {
    const result = run(
      request.circuit,
      { op: {}, transient: { from: "power-on", stop: request.stop, step: request.stop / 600, probe: request.probe } },
      request.variant,
      onProgress,
    );
    return {
      transient: result.transient ?? { time: [], output: [], nets: {} },
      settleTimeS: (result.figures.settle_time_s as number | null | undefined) ?? null,
      stop: request.stop,
    };
  });
}
