/**
 * DC operating point.
 *
 * Strategy: plain Newton from the starting point (zeros, or a previous solution for a warm start); if that fails
 * (no convergence or a singular Jacobian), gmin stepping — a conductance from every node to ground, lowered decade
 * by decade, each stage starting from the last — and, if that fails too, source stepping (all independent DC
 * sources ramped from 0 to full scale with an adaptive step). Whatever got there, the reported solution comes
 * from a final Newton run with gmin = 0 at full source scale, so no artificial conductance is left in it.
 *
 * `OperatingPointSolver` keeps the compiled structure and work arrays, so repeated solves (sweeps, Monte Carlo)
 * allocate nothing but their result and may warm-start from an earlier solution.
 */
import { DEFAULT_TEMPERATURE_K } from "../circuit/types";
import { thermalVoltage } from "../devices/physics";
import { SimError } from "../errors";
import { RealSystem } from "../mna/real-system";
import { SingularMatrixError } from "../mna/singular";
import type { OpResult, SimWarning } from "../results";
import { type CompiledCircuit, singularCircuitError } from "./compile";
import { NewtonContext } from "./newton-context";
import { createWorkspaceFlags, type NewtonOutcome, type NewtonWorkspace, runNewton } from "./newton";

export const PLAIN_NEWTON_MAX_ITERATIONS = 100;
export const STEPPING_NEWTON_MAX_ITERATIONS = 60;
/** gmin stepping: first conductance, S, and the factor between stages (down to below GMIN_LAST_S, then 0). */
export const GMIN_FIRST_S = 1e-2;
export const GMIN_STAGE_FACTOR = 0.1;
export const GMIN_LAST_S = 1e-12;
/** source stepping: first step of the scale, its growth on success and shrink on failure, and the smallest step */
export const SOURCE_STEP_FIRST = 0.1;
export const SOURCE_STEP_GROWTH = 2;
export const SOURCE_STEP_SHRINK = 0.25;
export const SOURCE_STEP_SMALLEST = 1e-4;

export type OperatingPointStrategy = "newton" | "gmin-stepping" | "source-stepping";

export interface OperatingPoint {
  /** solution by unknown: V for nets and internal nodes, A for branch currents */
  x: Float64Array;
  temperature: number;
  thermalVoltage: number;
  strategy: OperatingPointStrategy;
  /** Newton iterations over all stages */
  iterations: number;
}

export class OperatingPointSolver {
  readonly compiled: CompiledCircuit;
  private readonly workspace: NewtonWorkspace;

  constructor(compiled: CompiledCircuit) {
    this.compiled = compiled;
    const n = compiled.unknowns.length;
    const system = new RealSystem(compiled.dc);
    const isVoltage = createWorkspaceFlags(compiled.unknowns.map((u) => u.kind));
    const gmin: number[] = [];
    isVoltage.forEach((v, i) => {
      if (v) gmin.push(compiled.dc.positionOfHandle[compiled.pattern.entry(i, i, { weak: true })]);
    });
    this.workspace = {
      system,
      context: new NewtonContext(system, new Float64Array(n), thermalVoltage(DEFAULT_TEMPERATURE_K)),
      next: new Float64Array(n),
      residual: new Float64Array(n),
      rowScale: new Float64Array(n),
      isVoltage,
      gminPositions: Int32Array.from(gmin),
    };
  }

  /**
   * Solve at `temperature` (K), starting from `initial` when given (warm start). `firstStrategy` skips the
   * earlier strategies (tests use it to exercise the fallbacks on circuits plain Newton would solve).
   */
  solve(
    options: { temperature?: number; initial?: Float64Array; firstStrategy?: OperatingPointStrategy } = {},
  ): OperatingPoint {
    const temperature = options.temperature ?? DEFAULT_TEMPERATURE_K;
    const vt = thermalVoltage(temperature);
    this.workspace.context.thermalVoltage = vt;
    const n = this.compiled.unknowns.length;
    const x = new Float64Array(n);
    if (options.initial) x.set(options.initial.subarray(0, n));
    let iterations = 0;
    const attempt = (scale: number, gmin: number, max: number): NewtonOutcome | "singular" => {
      try {
        const outcome = runNewton(this.compiled, this.workspace, x, { sourceScale: scale, gmin, maxIterations: max });
        iterations += outcome.iterations;
        return outcome;
      } catch (e) {
        if (e instanceof SingularMatrixError) return "singular";
        throw e;
      }
    };
    const done = (strategy: OperatingPointStrategy): OperatingPoint => ({
      x,
      temperature,
      thermalVoltage: vt,
      strategy,
      iterations,
    });
    const first = options.firstStrategy ?? "newton";
    const start = Float64Array.from(x);
    const plain: NewtonOutcome | "singular" =
      first === "newton" ? attempt(1, 0, PLAIN_NEWTON_MAX_ITERATIONS) : { converged: false, iterations: 0, worst: 0 };
    if (plain !== "singular" && plain.converged) return done("newton");

    x.set(start);
    if (first !== "source-stepping" && this.gminStepping(attempt)) {
      const final = attempt(1, 0, PLAIN_NEWTON_MAX_ITERATIONS);
      if (final === "singular") throw this.singular();
      if (final.converged) return done("gmin-stepping");
    }

    x.fill(0);
    if (this.sourceStepping(x, attempt)) return done("source-stepping");
    if (plain === "singular") throw this.singular();
    throw this.noConvergence(plain.converged ? 0 : plain.worst);
  }

  private gminStepping(attempt: (s: number, g: number, m: number) => NewtonOutcome | "singular"): boolean {
    for (let gmin = GMIN_FIRST_S; gmin >= GMIN_LAST_S * (1 - 1e-9); gmin *= GMIN_STAGE_FACTOR) {
      const outcome = attempt(1, gmin, STEPPING_NEWTON_MAX_ITERATIONS);
      if (outcome === "singular" || !outcome.converged) return false;
    }
    return true;
  }

  private sourceStepping(
    x: Float64Array,
    attempt: (s: number, g: number, m: number) => NewtonOutcome | "singular",
  ): boolean {
    let scale = 0;
    let step = SOURCE_STEP_FIRST;
    const saved = new Float64Array(this.compiled.unknowns.length);
    const first = attempt(0, 0, STEPPING_NEWTON_MAX_ITERATIONS);
    if (first === "singular" || !first.converged) return false;
    while (scale < 1) {
      const target = Math.min(1, scale + step);
      saved.set(x);
      const outcome = attempt(target, 0, STEPPING_NEWTON_MAX_ITERATIONS);
      if (outcome !== "singular" && outcome.converged) {
        scale = target;
        step *= SOURCE_STEP_GROWTH;
      } else {
        x.set(saved);
        step *= SOURCE_STEP_SHRINK;
        if (step < SOURCE_STEP_SMALLEST) return false;
      }
    }
    return true;
  }

  /** The gmin-free Jacobian is singular: find the undetermined unknown with a dense solve and name it. */
  private singular(): SimError {
    const { system } = this.workspace;
    const probe = new Float64Array(this.compiled.unknowns.length);
    try {
      system.solve(probe);
    } catch (e) {
      if (e instanceof SingularMatrixError) return singularCircuitError(this.compiled.unknowns, e.unknown, "dc");
    }
    return singularCircuitError(this.compiled.unknowns, -1, "dc");
  }

  private noConvergence(worst: number): SimError {
    const u = this.compiled.unknowns[worst];
    const where = u?.net !== undefined ? `net "${u.net}"` : (u?.label ?? "the circuit");
    return new SimError(
      "no_convergence",
      `the DC operating point did not converge (plain Newton, gmin stepping and source stepping all failed); it kept moving most at ${where} — check the bias network and device values around it`,
      u?.net !== undefined ? { net: u.net } : u?.part !== undefined ? { part: u.part } : {},
    );
  }
}

/** The contract's `op` document: net voltages, each part's report, warnings. */
export function reportOperatingPoint(compiled: CompiledCircuit, op: OperatingPoint): OpResult {
  const nets: Record<string, number> = {};
  for (const net of compiled.circuit.nets) {
    const i = compiled.netIndex.get(net) ?? -1;
    nets[net] = i < 0 ? 0 : op.x[i];
  }
  const parts: OpResult["parts"] = {};
  const warnings: SimWarning[] = [];
  const view = { x: op.x, thermalVoltage: op.thermalVoltage, temperature: op.temperature };
  for (const d of compiled.devices) {
    const r = d.report(view);
    if (!r) continue;
    const values: Record<string, number | string | null> = {};
    for (const [k, v] of Object.entries(r.values)) values[k] = typeof v === "number" && !Number.isFinite(v) ? null : v;
    parts[d.part.id] = values;
    warnings.push(...r.warnings);
  }
  return { nets, parts, warnings };
}
