/**
 * The transient engine: implicit integration of the circuit from a starting state, with local truncation error
 * (LTE) control and step rejection, breakpoints, and a switch from the trapezoidal rule to second-order Gear
 * where the trapezoidal rule rings (integration.ts has the formulas).
 *
 * - Start: from the DC operating point (every stored quantity at its DC value), from the operating point plus
 *   the small-signal periodic solution Im(X) at t = 0 (a distortion run: the waveform starts on its periodic
 *   orbit for a linear circuit), or from power-on (every unknown and stored quantity 0 at t = 0, the sources at
 *   their DC values from 0⁺).
 * - Each step: backward Euler right after a start or an edge (no derivative history), else the trapezoidal rule,
 *   or BDF2 for TRANSIENT_GEAR_STEPS steps once the stored quantities' derivatives have alternated in sign on
 *   consecutive steps (the trapezoidal rule's undamped ringing on modes much faster than the step). Newton at the
 *   new point from a linear predictor (transient-newton.ts); a step whose Newton fails is cut by
 *   TRANSIENT_STEP_CUT.
 * - LTE: for every voltage unknown, errorConstant·h^(p+1)·|x^(p+1)|, the derivative from divided differences of
 *   the last p+2 points (textbook estimate, e.g. Hairer, Nørsett & Wanner vol. I), against
 *   TRANSIENT_RELATIVE_TOLERANCE·|x| + TRANSIENT_VOLTAGE_TOLERANCE_V. Rejected when larger; the next step is
 *   h·clamp(0.9·r^(−1/(p+1)), TRANSIENT_STEP_SHRINK_LIMIT, TRANSIENT_STEP_GROWTH) either way.
 * - Breakpoints: source edges (the end of a burst) restart the integration; landing times (a uniform sample
 *   grid, `landing`) are hit exactly without a restart, so samples need no interpolation. The step never exceeds
 *   `maxStep`, so the stiff mix of a 50 ms bias network and audio-rate signals costs steps of the signal's scale,
 *   not of the smallest time constant (every formula is A-stable).
 * Long runs report `onProgress(fraction)` and poll `shouldStop()` (a Web Worker's cancellation).
 */
import { SimError } from "../errors";
import { RealSystem } from "../mna/real-system";
import type { CompiledCircuit } from "./compile";
import type { Drive, Phasor } from "./drive";
import { createWorkspaceFlags } from "./newton";
import type { OperatingPoint } from "./op";
import { type IntegrationMethod, integrationCoefficients } from "./integration";
import { TransientContext } from "./transient-context";
import { solveTimePoint, stampTransientSystem, type TransientWorkspace } from "./transient-newton";

export const TRANSIENT_RELATIVE_TOLERANCE = 1e-3;
export const TRANSIENT_VOLTAGE_TOLERANCE_V = 1e-6;
/** first step after a start or an edge, as a fraction of the largest step */
export const TRANSIENT_FIRST_STEP_FRACTION = 1e-2;
export const TRANSIENT_STEP_GROWTH = 2;
export const TRANSIENT_STEP_SHRINK_LIMIT = 0.2;
export const TRANSIENT_STEP_CUT = 1 / 8;
/** smallest step, as a fraction of the largest step */
export const TRANSIENT_SMALLEST_STEP_FRACTION = 1e-12;
/** consecutive alternating steps that count as ringing, and how many BDF2 steps follow */
export const TRANSIENT_RINGING_STEPS = 2;
export const TRANSIENT_GEAR_STEPS = 20;
/** an alternating derivative counts when its change over a step exceeds this fraction of the stored quantity */
export const TRANSIENT_RINGING_FLOOR = 1e-6;
/** a step that would leave less than this fraction of itself before a breakpoint is halved instead */
const BREAKPOINT_SNAP = 0.25;

export type ProgressCallback = (fraction: number) => void;

export interface RunControl {
  onProgress?: ProgressCallback;
  /** polled every step; true stops the run with AnalysisCancelled */
  shouldStop?: () => boolean;
}

export class AnalysisCancelled extends Error {
  constructor() {
    super("the analysis was cancelled");
    this.name = "AnalysisCancelled";
  }
}

export interface TransientOptions {
  start: "op" | "power-on" | "periodic";
  /** s */
  maxStep: number;
  drive: Drive | null;
  /** the small-signal solution for a periodic start */
  phasor?: Phasor;
  /** land exactly on every multiple of this interval (s) */
  landing?: number;
}

/** A point callback: time (s), solution (do not keep: copy), and whether t is a landing time. */
export type PointCallback = (time: number, x: Float64Array, landing: boolean) => void;

export class TransientRun {
  readonly compiled: CompiledCircuit;
  /** s, of the last accepted point */
  time = 0;
  /** the solution at `time` */
  readonly x: Float64Array;
  /** accepted and rejected steps, Newton iterations */
  readonly stats = { accepted: 0, rejected: 0, newtonFailures: 0, iterations: 0, gearSteps: 0 };
  private readonly w: TransientWorkspace;
  private readonly ctx: TransientContext;
  private readonly options: TransientOptions;
  private readonly edges: number[];
  private readonly trial: Float64Array;
  /** LTE history since the last restart: times and solutions, oldest first */
  private readonly historyTime = new Float64Array(3);
  private readonly historyX: Float64Array[];
  private historyCount = 0;
  private hPrevious = 0;
  private hNext: number;
  private restart = true;
  private landingIndex = 0;
  private ringingCount = 0;
  private gearRemaining = 0;
  private readonly dqNew: Float64Array;
  private readonly tt = new Float64Array(4);
  private readonly xx = new Float64Array(4);

  constructor(compiled: CompiledCircuit, op: OperatingPoint, options: TransientOptions) {
    this.compiled = compiled;
    this.options = options;
    const n = compiled.unknowns.length;
    const devices = compiled.devices;
    const base = new Int32Array(devices.length);
    let states = 0;
    devices.forEach((d, i) => {
      base[i] = states;
      states += d.transientStateCount?.() ?? 0;
    });
    const system = new RealSystem(compiled.ac);
    this.x = new Float64Array(n);
    this.ctx = new TransientContext(system, this.x, op.thermalVoltage, op.x, states, options.drive);
    this.w = {
      system,
      context: this.ctx,
      devices,
      base,
      next: new Float64Array(n),
      isVoltage: createWorkspaceFlags(compiled.unknowns.map((u) => u.kind)),
    };
    this.trial = new Float64Array(n);
    this.dqNew = new Float64Array(states);
    this.historyX = [new Float64Array(n), new Float64Array(n), new Float64Array(n)];
    this.edges = (options.drive?.edges() ?? []).filter((t) => t > 0).sort((a, b) => a - b);
    this.hNext = options.maxStep * TRANSIENT_FIRST_STEP_FRACTION;

    // Starting state: x(0) and the stored quantities it implies.
    if (options.start !== "power-on") this.x.set(op.x);
    if (options.start === "periodic" && options.phasor) {
      const im = options.phasor.im;
      for (let i = 0; i < n; i++) this.x[i] += im[i];
    }
    const ctx = this.ctx;
    ctx.time = 0;
    ctx.initialising = true;
    ctx.periodicStart = options.start === "periodic";
    ctx.x = this.x;
    stampTransientSystem(this.w);
    ctx.initialising = false;
    ctx.q1.set(ctx.q);
    ctx.q2.set(ctx.q);
    // power-on: the t = 0 state is not on the solution for t > 0 (the sources step), so it starts no history.
    if (options.start !== "power-on") this.pushHistory(0, this.x);
  }

  private pushHistory(t: number, x: Float64Array): void {
    if (this.historyCount === 3) {
      const oldest = this.historyX[0];
      this.historyX[0] = this.historyX[1];
      this.historyX[1] = this.historyX[2];
      this.historyX[2] = oldest;
      this.historyTime[0] = this.historyTime[1];
      this.historyTime[1] = this.historyTime[2];
      this.historyCount = 2;
    }
    this.historyTime[this.historyCount] = t;
    this.historyX[this.historyCount].set(x);
    this.historyCount++;
  }

  private nextLanding(): number {
    const interval = this.options.landing;
    if (!interval) return Number.POSITIVE_INFINITY;
    while ((this.landingIndex + 1) * interval <= this.time * (1 + 1e-15)) this.landingIndex++;
    return (this.landingIndex + 1) * interval;
  }

  private nextEdge(): number {
    for (const e of this.edges) if (e > this.time * (1 + 1e-15) + 1e-300) return e;
    return Number.POSITIVE_INFINITY;
  }

  /**
   * Integrate up to `until` (s), calling `onPoint` at every accepted point (and landing time). Throws SimError
   * when the step falls below the smallest allowed, AnalysisCancelled when `shouldStop` says so.
   */
  advance(until: number, onPoint?: PointCallback, control: RunControl = {}): void {
    const { maxStep } = this.options;
    const n = this.x.length;
    const ctx = this.ctx;
    const smallest = maxStep * TRANSIENT_SMALLEST_STEP_FRACTION;
    const startTime = this.time;
    let lastProgress = -1;
    while (this.time < until * (1 - 1e-15)) {
      if (control.shouldStop?.()) throw new AnalysisCancelled();
      if (control.onProgress) {
        const fraction = (this.time - startTime) / (until - startTime);
        if (fraction - lastProgress >= 0.01) {
          control.onProgress(fraction);
          lastProgress = fraction;
        }
      }
      const landing = this.nextLanding();
      const edge = this.nextEdge();
      const breakpoint = Math.min(landing, edge, until);
      let h = Math.min(this.hNext, maxStep);
      let target = this.time + h;
      if (target >= breakpoint) {
        target = breakpoint;
        h = breakpoint - this.time;
      } else if (breakpoint - target < BREAKPOINT_SNAP * h) {
        // no sliver before the breakpoint: two halves instead
        h = (breakpoint - this.time) / 2;
        target = this.time + h;
      }
      const method: IntegrationMethod = this.restart
        ? "backward-euler"
        : this.gearRemaining > 0 && this.historyCount >= 2
          ? "gear2"
          : "trapezoidal";
      const c = integrationCoefficients(method, h, this.hPrevious, ctx.coefficients);
      ctx.time = target;
      // linear predictor from the last two points
      const trial = this.trial;
      if (this.historyCount >= 2 && !this.restart) {
        const last = this.historyX[this.historyCount - 1];
        const before = this.historyX[this.historyCount - 2];
        const ratio = h / (this.historyTime[this.historyCount - 1] - this.historyTime[this.historyCount - 2]);
        for (let i = 0; i < n; i++) trial[i] = last[i] + ratio * (last[i] - before[i]);
      } else trial.set(this.x);
      const iterations = solveTimePoint(this.w, trial);
      if (iterations < 0) {
        this.stats.newtonFailures++;
        this.hNext = h * TRANSIENT_STEP_CUT;
        if (this.hNext < smallest) throw this.stepTooSmall(target);
        continue;
      }
      this.stats.iterations += iterations;
      // local truncation error over the voltage unknowns
      let ratio = 0;
      const needed = c.order + 1; // history points besides the new one
      if (this.historyCount >= needed) {
        let power = h;
        for (let k = 0; k < c.order; k++) power *= h;
        let factorial = 1;
        for (let k = 2; k <= c.order + 1; k++) factorial *= k;
        const isVoltage = this.w.isVoltage;
        const tt = this.tt;
        const first = this.historyCount - needed;
        for (let j = 0; j < needed; j++) tt[j] = this.historyTime[first + j];
        tt[needed] = target;
        for (let i = 0; i < n; i++) {
          if (!isVoltage[i]) continue;
          const xx = this.xx;
          for (let j = 0; j < needed; j++) xx[j] = this.historyX[first + j][i];
          xx[needed] = trial[i];
          for (let level = 1; level <= needed; level++) {
            for (let j = needed; j >= level; j--) xx[j] = (xx[j] - xx[j - 1]) / (tt[j] - tt[j - level]);
          }
          const lte = c.errorConstant * power * Math.abs(xx[needed] * factorial);
          const tolerance =
            TRANSIENT_RELATIVE_TOLERANCE * Math.max(Math.abs(trial[i]), Math.abs(this.x[i])) +
            TRANSIENT_VOLTAGE_TOLERANCE_V;
          const r = lte / tolerance;
          if (r > ratio) ratio = r;
        }
      }
      const exponent = 1 / (c.order + 1);
      const factor = ratio > 0 ? 0.9 * ratio ** -exponent : TRANSIENT_STEP_GROWTH;
      if (ratio > 1) {
        this.stats.rejected++;
        this.hNext = h * Math.max(TRANSIENT_STEP_SHRINK_LIMIT, Math.min(factor, 0.9));
        if (this.hNext < smallest) throw this.stepTooSmall(target);
        continue;
      }
      this.accept(target, h, trial, method);
      this.hNext = h * Math.min(TRANSIENT_STEP_GROWTH, Math.max(TRANSIENT_STEP_SHRINK_LIMIT, factor));
      const isLanding = target === landing;
      if (target === edge) {
        this.restart = true;
        this.historyCount = 0;
        this.pushHistory(target, this.x);
        this.hNext = maxStep * TRANSIENT_FIRST_STEP_FRACTION;
      }
      onPoint?.(target, this.x, isLanding);
    }
    control.onProgress?.(1);
  }

  private accept(target: number, h: number, trial: Float64Array, method: IntegrationMethod): void {
    const ctx = this.ctx;
    const { q, q1, q2, dq1, dq2 } = ctx;
    const dqNew = this.dqNew;
    const a0 = ctx.coefficients.a0;
    let alternating = false;
    for (let k = 0; k < q.length; k++) {
      const d = a0 * q[k] + ctx.history(k);
      dqNew[k] = d;
      if (
        method === "trapezoidal" &&
        d * dq1[k] < 0 &&
        dq1[k] * dq2[k] < 0 &&
        Math.abs(d) * h > TRANSIENT_RINGING_FLOOR * Math.abs(q[k]) + 1e-30
      ) {
        alternating = true;
      }
    }
    q2.set(q1);
    q1.set(q);
    dq2.set(dq1);
    dq1.set(dqNew);
    this.x.set(trial);
    this.time = target;
    this.hPrevious = h;
    this.restart = false;
    this.pushHistory(target, trial);
    this.stats.accepted++;
    if (method === "gear2") {
      this.gearRemaining--;
      this.stats.gearSteps++;
    }
    this.ringingCount = alternating ? this.ringingCount + 1 : 0;
    if (this.ringingCount >= TRANSIENT_RINGING_STEPS) {
      this.gearRemaining = TRANSIENT_GEAR_STEPS;
      this.ringingCount = 0;
    }
  }

  private stepTooSmall(time: number): SimError {
    return new SimError(
      "no_convergence",
      `the transient analysis could not make progress at t = ${time.toPrecision(6)} s (the time step fell below ${(this.options.maxStep * TRANSIENT_SMALLEST_STEP_FRACTION).toPrecision(3)} s) — check the devices around a sharp edge, or lower the drive`,
    );
  }
}
