/**
 * Newton–Raphson at one time point of the transient analysis: every device stamps its transient companion
 * (`stampTransient`, or its DC stamp when it has no memory) at the present iterate, with the same junction
 * limiting as the DC solve, and the iteration stops on the DC solve's own tests (newton.ts): a small last step,
 * a small residual of the true equations, and no device limiting its step. No gmin: every capacitance is present.
 */
import type { Device } from "../devices/device";
import type { RealSystem } from "../mna/real-system";
import { SingularMatrixError } from "../mna/singular";
import {
  NEWTON_DAMPED_STEP_V,
  NEWTON_DAMPING_START_ITERATION,
  NEWTON_RELATIVE_TOLERANCE,
  NEWTON_VOLTAGE_TOLERANCE_V,
  RESIDUAL_VOLTAGE_TOLERANCE_V,
} from "./newton";

/**
 * Current tolerances of a time point, A. Looser than the DC solve's (1e-14 A): a step's companions carry
 * conductances a0·C of up to 10⁴–10⁵ S (22 µF over a microsecond), whose round-off in a branch current or a KCL
 * row is far above 1e-14 A while every voltage is still exact to NEWTON_VOLTAGE_TOLERANCE_V.
 */
export const TRANSIENT_CURRENT_TOLERANCE_A = 1e-12;
export const TRANSIENT_RESIDUAL_RELATIVE = 1e-9;
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
  residual: Float64Array;
  rowScale: Float64Array;
  isVoltage: Uint8Array;
}

/** |f(x)| within the tolerances on every row, for the system just stamped at x */
function residualSmall(w: TransientWorkspace, x: Float64Array): boolean {
  const { system, residual, rowScale, isVoltage } = w;
  system.residual(x, residual, rowScale);
  for (let i = 0; i < x.length; i++) {
    const absolute = isVoltage[i] ? TRANSIENT_CURRENT_TOLERANCE_A : RESIDUAL_VOLTAGE_TOLERANCE_V;
    if (Math.abs(residual[i]) > absolute + TRANSIENT_RESIDUAL_RELATIVE * rowScale[i]) return false;
  }
  return true;
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
export function solveTimePoint(w: TransientWorkspace, x: Float64Array, maxIterations = TRANSIENT_NEWTON_MAX_ITERATIONS): number {
  const { system, context: ctx, next, isVoltage } = w;
  const n = x.length;
  for (const d of w.devices) d.startNewton(x);
  let stepSmall = false;
  for (let iteration = 0; iteration < maxIterations; iteration++) {
    ctx.x = x;
    ctx.limited = false;
    stampTransientSystem(w);
    if (stepSmall && !ctx.limited && residualSmall(w, x)) return iteration;
    try {
      system.solve(next);
    } catch (e) {
      if (e instanceof SingularMatrixError) return -1;
      throw e;
    }
    let largest = 0;
    for (let i = 0; i < n; i++) if (isVoltage[i]) largest = Math.max(largest, Math.abs(next[i] - x[i]));
    const damping =
      iteration >= NEWTON_DAMPING_START_ITERATION && largest > NEWTON_DAMPED_STEP_V ? NEWTON_DAMPED_STEP_V / largest : 1;
    stepSmall = damping === 1;
    for (let i = 0; i < n; i++) {
      const proposed = x[i] + damping * (next[i] - x[i]);
      const absolute = isVoltage[i] ? NEWTON_VOLTAGE_TOLERANCE_V : TRANSIENT_CURRENT_TOLERANCE_A;
      const allowed = absolute + NEWTON_RELATIVE_TOLERANCE * Math.max(Math.abs(proposed), Math.abs(x[i]));
      if (Math.abs(proposed - x[i]) > allowed) stepSmall = false;
      x[i] = proposed;
    }
  }
  return -1;
}
