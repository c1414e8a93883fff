/**
 * Newton–Raphson at one time point of the transient analysis: every device stamps its transient companion
 * (`stampTransient`, or its DC stamp when it has no memory) at the present iterate, with the same junction
 * limiting as the DC solve. It stops when a full (undamped) Newton step from a linearisation no device limited is
 * within the DC solve's step tolerances (newton.ts; currents per TRANSIENT_CURRENT_TOLERANCE_A) — the usual
 * time-point test: the residual after such a step is of the order of its square, so the DC solve's extra
 * re-stamp for a residual check is skipped at every one of the thousands of time points. No gmin: every
 * capacitance is present.
 */
import type { Device } from "../devices/device";
import type { RealSystem } from "../mna/real-system";
import { SingularMatrixError } from "../mna/singular";
import {
  NEWTON_DAMPED_STEP_V,
  NEWTON_DAMPING_START_ITERATION,
  NEWTON_RELATIVE_TOLERANCE,
  NEWTON_VOLTAGE_TOLERANCE_V,
} from "./newton";

/**
 * Current tolerances of a time point, A. Looser than the DC solve's (1e-14 A): a step's companions carry
 * conductances a0·C of up to 10⁴–10⁵ S (22 µF over a microsecond), whose round-off in a branch current or a KCL
 * row is far above 1e-14 A while every voltage is still exact to NEWTON_VOLTAGE_TOLERANCE_V.
 */
export const TRANSIENT_CURRENT_TOLERANCE_A = 1e-12;
import type { TransientContext } from "./transient-context";

/** Newton iterations allowed at one time point before the step is cut. */
export const TRANSIENT_NEWTON_MAX_ITERATIONS = 40;

export interface TransientWorkspace {
  system: RealSystem;
  context: TransientContext;
  devices: readonly Device[];
  /** offset of each device's stored quantities */
  base: Int32Array;
  next: Float64Array;
  isVoltage: Uint8Array;
}

/** Stamp every device at ctx.x (ctx.time, ctx.coefficients set by the caller). */
export function stampTransientSystem(w: TransientWorkspace): void {
  const ctx = w.context;
  w.system.clear();
  const devices = w.devices;
  for (let d = 0; d < devices.length; d++) {
    const device = devices[d];
    ctx.base = w.base[d];
    if (device.stampTransient) device.stampTransient(ctx);
    else device.stampDc(ctx);
  }
}

/**
 * Iterate from x (updated in place) at the context's time and integration coefficients. Returns the number of
 * iterations, or −1 when it did not converge (or a Jacobian was singular): the caller cuts the step.
 */
export function solveTimePoint(
  w: TransientWorkspace,
  x: Float64Array,
  maxIterations = TRANSIENT_NEWTON_MAX_ITERATIONS,
): number {
  const { system, context: ctx, next, isVoltage } = w;
  const n = x.length;
  for (const d of w.devices) d.startNewton(x);
  for (let iteration = 0; iteration < maxIterations; iteration++) {
    ctx.x = x;
    ctx.limited = false;
    stampTransientSystem(w);
    try {
      system.solve(next);
    } catch (e) {
      if (e instanceof SingularMatrixError) return -1;
      throw e;
    }
    let largest = 0;
    for (let i = 0; i < n; i++) if (isVoltage[i]) largest = Math.max(largest, Math.abs(next[i] - x[i]));
    const damping =
      iteration >= NEWTON_DAMPING_START_ITERATION && largest > NEWTON_DAMPED_STEP_V
        ? NEWTON_DAMPED_STEP_V / largest
        : 1;
    let stepSmall = damping === 1 && !ctx.limited;
    for (let i = 0; i < n; i++) {
      const proposed = x[i] + damping * (next[i] - x[i]);
      const absolute = isVoltage[i] ? NEWTON_VOLTAGE_TOLERANCE_V : TRANSIENT_CURRENT_TOLERANCE_A;
      const allowed = absolute + NEWTON_RELATIVE_TOLERANCE * Math.max(Math.abs(proposed), Math.abs(x[i]));
      if (Math.abs(proposed - x[i]) > allowed) stepSmall = false;
      x[i] = proposed;
    }
    // a Newton step this small from an unlimited linearisation leaves a residual of the order of its square
    if (stepSmall) return iteration + 1;
  }
  return -1;
}
