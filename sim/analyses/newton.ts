/**
 * One damped Newton–Raphson run on the DC system at a fixed source scale and gmin.
 *
 * Each iteration stamps every device's companion at the present iterate x_k (devices limit their junction
 * voltages, see sim/devices/limiting.ts), then
 *   - tests convergence: the last step must be small (|Δx| ≤ NEWTON_RELATIVE_TOLERANCE·|x| + absolute tolerance
 *     by unit) AND the residual of the true equations at x_k must be small (|f(x_k)|_i ≤ RESIDUAL_… tolerances,
 *     relative to the largest term of that row) AND no device limited its step;
 *   - otherwise solves J·x_{k+1} = b. After NEWTON_DAMPING_START_ITERATION undamped iterations the step is
 *     scaled so that no voltage moves by more than NEWTON_DAMPED_STEP_V (breaks slow oscillations).
 */
import type { UnknownKind } from "../devices/device";
import type { RealSystem } from "../mna/real-system";
import type { CompiledCircuit } from "./compile";
import type { NewtonContext } from "./newton-context";

/** Relative tolerance on the Newton step and on each residual row. */
export const NEWTON_RELATIVE_TOLERANCE = 1e-9;
/** Absolute step tolerance for voltage unknowns, V. */
export const NEWTON_VOLTAGE_TOLERANCE_V = 1e-9;
/** Absolute step tolerance for current unknowns, A. */
export const NEWTON_CURRENT_TOLERANCE_A = 1e-14;
/** Absolute residual tolerance of a KCL row, A. */
export const RESIDUAL_CURRENT_TOLERANCE_A = 1e-14;
/** Absolute residual tolerance of a branch (voltage) row, V. */
export const RESIDUAL_VOLTAGE_TOLERANCE_V = 1e-9;
export const NEWTON_DAMPING_START_ITERATION = 20;
export const NEWTON_DAMPED_STEP_V = 1;

export interface NewtonWorkspace {
  system: RealSystem;
  context: NewtonContext;
  next: Float64Array;
  residual: Float64Array;
  rowScale: Float64Array;
  /** 1 for voltage unknowns, 0 for currents */
  isVoltage: Uint8Array;
  /** storage positions of the node diagonals that gmin stepping loads */
  gminPositions: Int32Array;
}

export function createWorkspaceFlags(kinds: UnknownKind[]): Uint8Array {
  return Uint8Array.from(kinds.map((k) => (k === "voltage" ? 1 : 0)));
}

export type NewtonOutcome =
  | { converged: true; iterations: number }
  | { converged: false; iterations: number; worst: number };

/**
 * Iterate from `x` (updated in place). gmin (S) is added from every node to ground. Throws SingularMatrixError
 * when a Jacobian cannot be solved.
 */
export function runNewton(
  compiled: CompiledCircuit,
  w: NewtonWorkspace,
  x: Float64Array,
  options: { sourceScale: number; gmin: number; maxIterations: number },
): NewtonOutcome {
  const { system, context: ctx, next, residual, rowScale, isVoltage, gminPositions } = w;
  const n = x.length;
  const devices = compiled.devices;
  ctx.sourceScale = options.sourceScale;
  for (const d of devices) d.startNewton(x);
  let stepSmall = false;
  let worst = 0;
  for (let iteration = 0; iteration < options.maxIterations; iteration++) {
    system.clear();
    ctx.x = x;
    ctx.limited = false;
    for (const d of devices) d.stampDc(ctx);
    if (options.gmin > 0) {
      for (let k = 0; k < gminPositions.length; k++) system.values[gminPositions[k]] += options.gmin;
    }
    if (stepSmall && !ctx.limited) {
      system.residual(x, residual, rowScale);
      let ok = true;
      for (let i = 0; i < n && ok; i++) {
        const absolute = isVoltage[i] ? RESIDUAL_CURRENT_TOLERANCE_A : RESIDUAL_VOLTAGE_TOLERANCE_V;
        if (Math.abs(residual[i]) > absolute + NEWTON_RELATIVE_TOLERANCE * rowScale[i]) ok = false;
      }
      if (ok) return { converged: true, iterations: iteration };
    }
    system.solve(next);
    let largestVoltageStep = 0;
    for (let i = 0; i < n; i++) {
      if (isVoltage[i]) largestVoltageStep = Math.max(largestVoltageStep, Math.abs(next[i] - x[i]));
    }
    const damping =
      iteration >= NEWTON_DAMPING_START_ITERATION && largestVoltageStep > NEWTON_DAMPED_STEP_V
        ? NEWTON_DAMPED_STEP_V / largestVoltageStep
        : 1;
    stepSmall = true;
    let worstStep = 0;
    for (let i = 0; i < n; i++) {
      const proposed = x[i] + damping * (next[i] - x[i]);
      const step = Math.abs(proposed - x[i]);
      const absolute = isVoltage[i] ? NEWTON_VOLTAGE_TOLERANCE_V : NEWTON_CURRENT_TOLERANCE_A;
      const allowed = absolute + NEWTON_RELATIVE_TOLERANCE * Math.max(Math.abs(proposed), Math.abs(x[i]));
      if (step > allowed) {
        stepSmall = false;
        if (step / allowed > worstStep) {
          worstStep = step / allowed;
          worst = i;
        }
      }
      x[i] = proposed;
    }
    if (damping < 1) stepSmall = false;
  }
  return { converged: false, iterations: options.maxIterations, worst };
}
