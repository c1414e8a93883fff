/**
 * AC analysis (contract): the small-signal response V(plus) − V(minus) at every requested frequency, linearised
 * at the operating point, as { frequency, re, im, magnitude_db, phase_deg }. Warnings: a capsule whose gap the
 * drive closes by more than CAPSULE_GAP_WARNING_FRACTION (the linear capsule model no longer holds).
 *
 * A sweep factors SWEEP_LANES frequencies at a time (sim/mna/sparse-lu-complex-lanes.ts) on the G and C the
 * model stamped, with the same drive, and solves only for the output unknowns; each lane's arithmetic is the
 * model's own, so every point equals `model.response` at that frequency. A frequency whose static pivots fail is handed to `model.response` itself
 * (dense fallback, singular-circuit errors named as usual).
 */
import type { AcDriveContext, Device } from "../devices/device";
import { numberValue } from "../devices/device";
import { type OutputPlan, SparseLuComplexLanes, SWEEP_LANES } from "../mna/sparse-lu-complex-lanes";
import type { AcResult, SimWarning } from "../results";
import type { CompiledCircuit } from "./compile";
import type { ComplexValue, SmallSignalModel } from "./small-signal";
import type { SpreadSweep } from "./spread-sweep";

/** Contract: warn when the drive closes a capsule gap by more than 10 %. */
export const CAPSULE_GAP_WARNING_FRACTION = 0.1;

const RADIANS_TO_DEGREES = 180 / Math.PI;

/**
 * Below this |V|² the squared magnitude has lost precision to underflow (|V| < 1e-154), and above it overflows:
 * outside that range the magnitude is taken with Math.hypot, which is exact there but slower than a square root.
 */
const SMALLEST_SAFE_MAGNITUDE2 = 1e-300;
const LARGEST_SAFE_MAGNITUDE2 = 1e300;

export function toDecibels(magnitude: number): number {
  return 20 * Math.log10(magnitude);
}

/** 20·log10|re + j·im| from |V|² where that is exact enough (10·log10 of the square), else via Math.hypot. */
function decibelsOf(re: number, im: number): number {
  const magnitude2 = re * re + im * im;
  if (magnitude2 > SMALLEST_SAFE_MAGNITUDE2 && magnitude2 < LARGEST_SAFE_MAGNITUDE2) return 10 * Math.log10(magnitude2);
  return toDecibels(Math.hypot(re, im));
}

/**
 * The response at `frequencies`. A Monte Carlo run passes the spread's reduced sweep (spread-sweep.ts), which
 * answers when the run changed only what it expects and otherwise leaves the run to the ordinary sweep.
 */
export function runAc(
  model: SmallSignalModel,
  frequencies: ArrayLike<number>,
  pressure: number,
  spreadSweep?: SpreadSweep,
): AcResult {
  const count = frequencies.length;
  const re = new Array<number>(count).fill(0);
  const im = new Array<number>(count).fill(0);
  if (!spreadSweep?.sweep(model, frequencies, pressure, re, im)) sweepFor(model).run(frequencies, pressure, re, im);
  // Magnitude and phase only once the solves are done: the hot loop above stays free of transcendental calls.
  const magnitude_db = new Array<number>(count).fill(0);
  const phase_deg = new Array<number>(count).fill(0);
  for (let i = 0; i < count; i++) {
    magnitude_db[i] = decibelsOf(re[i], im[i]);
    phase_deg[i] = Math.atan2(im[i], re[i]) * RADIANS_TO_DEGREES;
  }
  const result: AcResult = { frequency: Array.from(frequencies), re, im, magnitude_db, phase_deg };
  const warnings = capsuleWarnings(model, pressure);
  if (warnings.length > 0) result.warnings = warnings;
  return result;
}

export function capsuleWarnings(model: SmallSignalModel, pressure: number): SimWarning[] {
  const out: SimWarning[] = [];
  for (const d of model.compiled.devices) {
    if (d.part.kind !== "capsule") continue;
    const closure = Math.abs(numberValue(d.part, "strain_per_pa") * pressure);
    if (closure > CAPSULE_GAP_WARNING_FRACTION) {
      out.push({
        part: d.part.id,
        message: `${d.part.id}: a drive of ${pressure} Pa closes the gap by ${(closure * 100).toFixed(0)} % (more than ${CAPSULE_GAP_WARNING_FRACTION * 100} %); the linear capsule model no longer holds — lower the pressure`,
      });
    }
  }
  return out;
}

/**
 * One sweep engine per model: a model's G and C are stamped once when it is built (small-signal.ts) and never
 * changed, so the engine reads them in place for the model's lifetime.
 */
const sweeps = new WeakMap<SmallSignalModel, AcSweep>();

function sweepFor(model: SmallSignalModel): AcSweep {
  let sweep = sweeps.get(model);
  if (!sweep) {
    sweep = new AcSweep(model, laneWorkspaceFor(model.compiled));
    sweeps.set(model, sweep);
  }
  return sweep;
}

/**
 * What a sweep needs that depends only on the compiled circuit: the lane factorisation's buffers, the
 * lane-interleaved right-hand sides, the output unknowns and the solve plan for them. A Monte Carlo run builds a
 * new model per run on the same compiled circuit; sharing these saves re-allocating them every run. Sharing is
 * safe because a sweep factors, solves and reads its lanes within one synchronous `run` that nothing re-enters
 * (the dense fallback goes through the model's own system).
 */
interface LaneWorkspace {
  lu: SparseLuComplexLanes;
  plan: OutputPlan;
  rhsRe: Float64Array;
  rhsIm: Float64Array;
  drivers: Device[];
  plus: number;
  minus: number;
}

const laneWorkspaces = new WeakMap<CompiledCircuit, LaneWorkspace>();

function laneWorkspaceFor(compiled: CompiledCircuit): LaneWorkspace {
  let workspace = laneWorkspaces.get(compiled);
  if (!workspace) {
    const n = compiled.unknowns.length;
    const lu = new SparseLuComplexLanes(compiled.ac);
    const plus = compiled.netIndex.get(compiled.circuit.output.plus) ?? -1;
    const minus = compiled.netIndex.get(compiled.circuit.output.minus) ?? -1;
    workspace = {
      lu,
      plan: lu.outputPlan([plus, minus].filter((u) => u >= 0)),
      // Row n of each lane is the ground scratch row the devices never write (they skip row < 0); kept for
      // symmetry with the model's right-hand side.
      rhsRe: new Float64Array((n + 1) * SWEEP_LANES),
      rhsIm: new Float64Array((n + 1) * SWEEP_LANES),
      drivers: compiled.devices.filter((d) => d.stampAcDrive !== undefined),
      plus,
      minus,
    };
    laneWorkspaces.set(compiled, workspace);
  }
  return workspace;
}

/** Sweeping one small-signal model on the compiled circuit's lane workspace; nothing allocated per point. */
class AcSweep {
  private readonly model: SmallSignalModel;
  private readonly workspace: LaneWorkspace;
  private readonly drive: LaneDriveContext;
  private readonly omegas = new Float64Array(SWEEP_LANES);
  private readonly fallback: ComplexValue = { re: 0, im: 0 };

  constructor(model: SmallSignalModel, workspace: LaneWorkspace) {
    this.model = model;
    this.workspace = workspace;
    this.drive = new LaneDriveContext(model.op.x, workspace.rhsRe, workspace.rhsIm);
  }

  /** Response at every frequency into outRe/outIm (same length as `frequencies`). */
  run(frequencies: ArrayLike<number>, pressure: number, outRe: number[], outIm: number[]): void {
    const count = frequencies.length;
    const { omegas, drive } = this;
    const { drivers, lu, plan, plus, minus, rhsRe, rhsIm } = this.workspace;
    const { conductance, reactance } = this.model;
    drive.pressure = pressure;
    for (let start = 0; start < count; start += SWEEP_LANES) {
      const used = Math.min(SWEEP_LANES, count - start);
      rhsRe.fill(0);
      rhsIm.fill(0);
      for (let b = 0; b < SWEEP_LANES; b++) {
        // A short last group repeats its last frequency in the unused lanes (their results are not read).
        const frequency = frequencies[start + Math.min(b, used - 1)];
        omegas[b] = 2 * Math.PI * frequency;
        drive.lane = b;
        drive.frequency = frequency;
        for (const d of drivers) d.stampAcDrive!(drive);
      }
      const failed = lu.factorAt(conductance, reactance, omegas);
      // Only the output unknowns are read: the plan skips the steps they do not depend on.
      lu.solvePlanned(rhsRe, rhsIm, plan);
      for (let b = 0; b < used; b++) {
        const i = start + b;
        if (failed & (1 << b)) {
          this.model.response(frequencies[i], pressure, this.fallback);
          outRe[i] = this.fallback.re;
          outIm[i] = this.fallback.im;
          continue;
        }
        outRe[i] = (plus < 0 ? 0 : lu.solutionRe(plus, b)) - (minus < 0 ? 0 : lu.solutionRe(minus, b));
        outIm[i] = (plus < 0 ? 0 : lu.solutionIm(plus, b)) - (minus < 0 ? 0 : lu.solutionIm(minus, b));
      }
    }
  }
}

/** The drive context of one lane at a time, writing into the lane-interleaved right-hand side. */
class LaneDriveContext implements AcDriveContext {
  readonly x: Float64Array;
  frequency = 0;
  pressure = 0;
  lane = 0;
  private readonly rhsRe: Float64Array;
  private readonly rhsIm: Float64Array;

  constructor(x: Float64Array, rhsRe: Float64Array, rhsIm: Float64Array) {
    this.x = x;
    this.rhsRe = rhsRe;
    this.rhsIm = rhsIm;
  }

  addRhs(row: number, re: number, im: number): void {
    if (row < 0) return;
    this.rhsRe[row * SWEEP_LANES + this.lane] += re;
    this.rhsIm[row * SWEEP_LANES + this.lane] += im;
  }
}
