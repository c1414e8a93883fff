/**
 * The adjoint (transposed) small-signal system the noise analysis solves: one solve of Aᵀ(ω)·y = e_out per
 * frequency gives the transfer from EVERY noise generator to the output at once. For a unit source b (a current
 * +1 into row n+ and out of row n−, or a unit voltage on a branch row), V_out = e_outᵀ·A⁻¹·b = yᵀ·b, so the
 * transfer is y[n+] − y[n−] (Tellegen's theorem / the adjoint network; Director and Rohrer, 1969).
 *
 * sim/mna/ offers no transposed solve on an existing factorisation, so the transposed system is a system of its
 * own: the circuit's pattern with every (row, col) swapped, compiled with the public compileSparseStructure, and
 * the devices' small-signal stamps redirected to the swapped positions. The structure is built once per compiled
 * circuit (cached) and reused by every operating point (sweeps, Monte Carlo runs).
 */
import type { AcStampContext, NoiseGenerator } from "../devices/device";
import { ComplexSystem } from "../mna/complex-system";
import { DISCARDED_HANDLE, PatternBuilder } from "../mna/pattern";
import { SingularMatrixError } from "../mna/singular";
import { type OutputPlan, SparseLuComplexLanes, SWEEP_LANES } from "../mna/sparse-lu-complex-lanes";
import { compileSparseStructure, type SparseStructure } from "../mna/sparse-structure";
import { type CompiledCircuit, singularCircuitError } from "./compile";
import type { OperatingPoint } from "./op";

export interface TransposedStructure {
  structure: SparseStructure;
  /** handle of the circuit's own pattern → storage position of the swapped entry in `structure` */
  positionOfHandle: Int32Array;
  /**
   * The four-frequency factorisation of the transposed structure with its constant right-hand side e_out already
   * lane-interleaved, shared by every adjoint system of the circuit. Sharing is safe for the same reason as the AC
   * sweep's lane workspace: a noise spectrum factors, solves and reads its lanes within one synchronous call.
   */
  lanes: SparseLuComplexLanes;
  laneRhsRe: Float64Array;
  laneRhsIm: Float64Array;
  /** the solve plan for the unknowns noise generators attach to, by the generator set that asked for it */
  plans: Map<string, OutputPlan>;
}

const transposedCache = new WeakMap<CompiledCircuit, TransposedStructure>();

/** The transposed AC structure of a compiled circuit (built on first use, then cached). */
export function transposedStructure(compiled: CompiledCircuit): TransposedStructure {
  const cached = transposedCache.get(compiled);
  if (cached) return cached;
  const original = compiled.pattern;
  const swapped = new PatternBuilder(original.size);
  const swappedHandle = new Int32Array(original.entries.length);
  swappedHandle[DISCARDED_HANDLE] = DISCARDED_HANDLE;
  for (let h = 1; h < original.entries.length; h++) {
    const { row, col, acOnly, weak } = original.entries[h];
    swappedHandle[h] = swapped.entry(col, row, { acOnly, weak });
  }
  let structure: SparseStructure;
  try {
    structure = compileSparseStructure(swapped, "ac");
  } catch (e) {
    if (e instanceof SingularMatrixError) throw singularCircuitError(compiled.unknowns, e.unknown, "ac");
    throw e;
  }
  const positionOfHandle = new Int32Array(original.entries.length);
  for (let h = 0; h < original.entries.length; h++) positionOfHandle[h] = structure.positionOfHandle[swappedHandle[h]];
  const n = original.size;
  const laneRhsRe = new Float64Array((n + 1) * SWEEP_LANES);
  const laneRhsIm = new Float64Array((n + 1) * SWEEP_LANES);
  const single = outputSelector(compiled);
  for (let row = 0; row < n; row++)
    for (let b = 0; b < SWEEP_LANES; b++) laneRhsRe[row * SWEEP_LANES + b] = single[row];
  const lanes = new SparseLuComplexLanes(structure);
  const built = { structure, positionOfHandle, lanes, laneRhsRe, laneRhsIm, plans: new Map() };
  transposedCache.set(compiled, built);
  return built;
}

/**
 * Aᵀ(ω) of a circuit at one operating point, with its noise generators. `solveAt(f)` leaves the adjoint solution
 * y (by unknown) in `yRe`/`yIm`; `transfer(g)` reads one generator's complex transfer to the output from it.
 */
export class AdjointNoiseSystem {
  readonly compiled: CompiledCircuit;
  readonly op: OperatingPoint;
  readonly generators: NoiseGenerator[];
  readonly yRe: Float64Array;
  readonly yIm: Float64Array;
  private readonly system: ComplexSystem;
  private readonly rhsRe: Float64Array;
  private readonly rhsIm: Float64Array;
  private readonly lanes: SparseLuComplexLanes;
  private readonly laneRhsRe: Float64Array;
  private readonly laneRhsIm: Float64Array;
  private readonly plan: OutputPlan;
  private readonly omegas = new Float64Array(SWEEP_LANES);

  constructor(compiled: CompiledCircuit, op: OperatingPoint) {
    this.compiled = compiled;
    this.op = op;
    const n = compiled.unknowns.length;
    const transposed = transposedStructure(compiled);
    this.system = new ComplexSystem(transposed.structure);
    const positions = transposed.positionOfHandle;
    const { conductance, reactance } = this.system;
    const ctx: AcStampContext = {
      x: op.x,
      thermalVoltage: op.thermalVoltage,
      addConductance: (h, v) => {
        conductance[positions[h]] += v;
      },
      addReactance: (h, v) => {
        reactance[positions[h]] += v;
      },
    };
    for (const d of compiled.devices) d.stampAc(ctx);
    const view = { x: op.x, thermalVoltage: op.thermalVoltage, temperature: op.temperature };
    this.generators = compiled.devices.flatMap((d) => d.noiseSources(view));
    this.rhsRe = outputSelector(compiled);
    this.rhsIm = new Float64Array(n + 1);
    this.yRe = new Float64Array(n);
    this.yIm = new Float64Array(n);
    this.lanes = transposed.lanes;
    this.laneRhsRe = transposed.laneRhsRe;
    this.laneRhsIm = transposed.laneRhsIm;
    this.plan = generatorPlan(transposed, this.generators);
  }

  /** how many frequencies needed the dense fallback */
  get denseFallbacks(): number {
    return this.system.denseFallbacks;
  }

  /** Factor Aᵀ at `frequency` (Hz) and solve Aᵀ·y = e_out. */
  solveAt(frequency: number): void {
    try {
      this.system.factorAt(2 * Math.PI * frequency);
      this.system.solve(this.rhsRe, this.rhsIm, this.yRe, this.yIm);
    } catch (e) {
      if (e instanceof SingularMatrixError) throw singularCircuitError(this.compiled.unknowns, e.unknown, "ac-solve");
      throw e;
    }
  }

  /**
   * Factor Aᵀ at SWEEP_LANES frequencies at once (`frequencies[start …]`; a short group repeats its last
   * frequency in the unused lanes) and solve each for e_out, only as far as the generators' unknowns need. Returns
   * the bit mask of the lanes whose static pivots failed: re-solve those frequencies with `solveAt`.
   */
  solveLanes(frequencies: ArrayLike<number>, start: number): number {
    const used = Math.min(SWEEP_LANES, frequencies.length - start);
    for (let b = 0; b < SWEEP_LANES; b++) this.omegas[b] = 2 * Math.PI * frequencies[start + Math.min(b, used - 1)];
    const failed = this.lanes.factorAt(this.system.conductance, this.system.reactance, this.omegas);
    this.lanes.solvePlanned(this.laneRhsRe, this.laneRhsIm, this.plan);
    return failed;
  }

  /** |transfer|² from generator `g` to the output in lane `lane` of the last `solveLanes`. */
  laneTransferSquared(g: NoiseGenerator, lane: number): number {
    const lu = this.lanes;
    const re = (g.plus < 0 ? 0 : lu.solutionRe(g.plus, lane)) - (g.minus < 0 ? 0 : lu.solutionRe(g.minus, lane));
    const im = (g.plus < 0 ? 0 : lu.solutionIm(g.plus, lane)) - (g.minus < 0 ? 0 : lu.solutionIm(g.minus, lane));
    return re * re + im * im;
  }

  /** |transfer|² from generator `g` to the output at the last solved frequency (V²/A² or V²/V²). */
  transferSquared(g: NoiseGenerator): number {
    const re = (g.plus < 0 ? 0 : this.yRe[g.plus]) - (g.minus < 0 ? 0 : this.yRe[g.minus]);
    const im = (g.plus < 0 ? 0 : this.yIm[g.plus]) - (g.minus < 0 ? 0 : this.yIm[g.minus]);
    return re * re + im * im;
  }
}

/** The restricted solve plan for the unknowns `generators` attach to (cached per set of unknowns). */
function generatorPlan(transposed: TransposedStructure, generators: readonly NoiseGenerator[]): OutputPlan {
  const unknowns = new Set<number>();
  for (const g of generators) {
    if (g.plus >= 0) unknowns.add(g.plus);
    if (g.minus >= 0) unknowns.add(g.minus);
  }
  const sorted = [...unknowns].sort((a, b) => a - b);
  const key = sorted.join(",");
  let plan = transposed.plans.get(key);
  if (!plan) {
    plan = transposed.lanes.outputPlan(sorted);
    transposed.plans.set(key, plan);
  }
  return plan;
}

/**
 * e_out: +1 at the output's plus net, −1 at its minus net (ground rows dropped), by unknown; slot n is the ground
 * scratch row.
 */
function outputSelector(compiled: CompiledCircuit): Float64Array {
  const e = new Float64Array(compiled.unknowns.length + 1);
  const plus = compiled.netIndex.get(compiled.circuit.output.plus) ?? -1;
  const minus = compiled.netIndex.get(compiled.circuit.output.minus) ?? -1;
  if (plus >= 0) e[plus] += 1;
  if (minus >= 0) e[minus] -= 1;
  return e;
}
