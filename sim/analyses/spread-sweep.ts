/**
 * AC sweeps for the runs of a Monte Carlo spread, by a Schur complement over what the tolerances cannot touch.
 *
 * Why: a spread repeats the same sweep a thousand times on one compiled circuit, and in a microphone front end
 * most of the matrix never changes between runs — a ten-section cable, the load, the untoleranced resistors and
 * capacitors. Only the entries stamped by toleranced parts and by devices linearised at the (moving) operating
 * point differ. Split the unknowns into those no varying entry touches (block 1, n₁ of them) and the rest (block 2,
 * k of them, both the row and the column of every varying entry):
 *
 *     [A11 A12] [x1]   [b1]        S = A22 − A21·A11⁻¹·A12   (k × k)
 *     [A21 A22] [x2] = [b2]        S·x2 = b2 − A21·A11⁻¹·b1,  x1 = A11⁻¹·(b1 − A12·x2)
 *
 * A11, A12 and A21 are the nominal ones in every run, so per frequency A11 is factored once (dense LU with partial
 * pivoting) and S₀ = A22,nom − A21·A11⁻¹·A12, T = A21·A11⁻¹ and the output's weights are kept. A run then adds its
 * ΔA22 = ΔG + jω·ΔC to S₀, factors the k × k system and solves it: for the demo microphone k = 5 of 29 unknowns.
 * This is the textbook block elimination (Schur complement, e.g. Golub & Van Loan, "Matrix Computations", §3.2),
 * the same numbers as a full solve up to rounding.
 *
 * Which entries vary is learnt, not guessed: the first run's G and C are compared with the nominal ones, and every
 * later run is checked against the same split (entries outside block 2 must equal the nominal ones exactly). A run
 * that moves another entry widens block 2 and the per-frequency terms are rebuilt; after MAX_REBUILDS, or when
 * block 2 grows past MAX_REDUCED_FRACTION of the unknowns, or when A11 is singular at a frequency, the spread uses
 * the ordinary sweep (ac.ts) for its remaining runs — always correct, only slower.
 */
import type { Device } from "../devices/device";
import { DenseLuComplex } from "../mna/dense-lu";
import { type OrderedLuPlan, planOrderedLu } from "../mna/ordered-lu";
import { OrderedLuLanes } from "../mna/ordered-lu-lanes";
import { SingularMatrixError } from "../mna/singular";
import { SWEEP_LANES } from "../mna/sparse-lu-complex-lanes";
import type { SparseStructure } from "../mna/sparse-structure";
import { type ComplexValue, DriveContext, type SmallSignalModel } from "./small-signal";

/** Rebuilding the per-frequency terms costs about one ordinary sweep; a few rebuilds are worth it. */
export const MAX_REBUILDS = 3;
/** Beyond this share of the unknowns in block 2 the reduced system is no cheaper than the full one. */
export const MAX_REDUCED_FRACTION = 0.5;

/** The per-frequency terms of one frequency, complex as split re/im arrays. */
interface FrequencyTerms {
  omega: number;
  /** S₀, k × k row-major */
  s0Re: Float64Array;
  s0Im: Float64Array;
  /** T = A21·A11⁻¹, k × n₁ row-major */
  tRe: Float64Array;
  tIm: Float64Array;
  /** output = y·b1 + u·x2: y (n₁) and u (k) */
  yRe: Float64Array;
  yIm: Float64Array;
  uRe: Float64Array;
  uIm: Float64Array;
  /** the nominal S₀'s partial-pivoting row order, which the runs repeat (OrderedLu) */
  order: Int32Array;
  plan: OrderedLuPlan | null;
}

export class SpreadSweep {
  private readonly structure: SparseStructure;
  private readonly size: number;
  private readonly nominalG: Float64Array;
  private readonly nominalC: Float64Array;
  private readonly plus: number;
  private readonly minus: number;
  private readonly drivers: Device[];
  /** per storage position: the original row and column unknowns */
  private readonly rowOfPosition: Int32Array;
  private readonly columnOfPosition: Int32Array;
  /** positions that hold an original entry (fill positions are always zero) */
  private readonly stored: Int32Array;
  private varying: Uint8Array | null = null;
  private disabled = false;
  private rebuilds = 0;
  private block1: Int32Array = new Int32Array(0);
  private block2: Int32Array = new Int32Array(0);
  /** unknown → index within its block */
  private indexInBlock: Int32Array;
  private inBlock2: Uint8Array;
  /** unknowns moved to block 2 because A11 was singular without them */
  private readonly forced: Uint8Array;
  /** the varying storage positions and where each lands in the k × k block */
  private varyingPositions: Int32Array = new Int32Array(0);
  private varyingAt: Int32Array = new Int32Array(0);
  /** this run's G − G_nom and C − C_nom at the varying positions */
  private deltaG: Float64Array = new Float64Array(0);
  private deltaC: Float64Array = new Float64Array(0);
  /** the rows the drivers write (structural: found once by a recording stamp), and those of block 1 by index */
  private readonly drivenRows: Int32Array;
  private drivenBlock1: Int32Array = new Int32Array(0);
  private terms: FrequencyTerms[] = [];
  /**
   * S₀ of each group of SWEEP_LANES neighbouring frequencies (starting at 0, 4, 8 …), already lane-interleaved as
   * OrderedLuLanes holds it (entry at of lane b at at·SWEEP_LANES + b; a short last group repeats its last
   * frequency), so a run loads a group's reduced matrices with one copy before adding its own deltas.
   */
  private groupS0Re: Float64Array[] = [];
  private groupS0Im: Float64Array[] = [];
  private termsFor: ArrayLike<number> | null = null;
  private lanes: OrderedLuLanes = new OrderedLuLanes(0);
  private laneB2Re: Float64Array = new Float64Array(0);
  private laneB2Im: Float64Array = new Float64Array(0);
  private laneX2Re: Float64Array = new Float64Array(0);
  private laneX2Im: Float64Array = new Float64Array(0);
  private readonly laneOutRe = new Float64Array(SWEEP_LANES);
  private readonly laneOutIm = new Float64Array(SWEEP_LANES);
  /** y·b1 of the last reducedRightHandSide */
  private outputRe = 0;
  private outputIm = 0;
  private pivoting: DenseLuComplex = new DenseLuComplex(0);
  private readonly rhsRe: Float64Array;
  private readonly rhsIm: Float64Array;
  private b2Re: Float64Array = new Float64Array(0);
  private b2Im: Float64Array = new Float64Array(0);
  private x2Re: Float64Array = new Float64Array(0);
  private x2Im: Float64Array = new Float64Array(0);
  private readonly fallback: ComplexValue = { re: 0, im: 0 };
  /** runs the reduced sweep answered, for tests and the benchmark's note */
  reducedRuns = 0;

  constructor(nominal: SmallSignalModel) {
    const compiled = nominal.compiled;
    this.structure = compiled.ac;
    this.size = compiled.unknowns.length;
    this.nominalG = Float64Array.from(nominal.conductance);
    this.nominalC = Float64Array.from(nominal.reactance);
    this.plus = compiled.netIndex.get(compiled.circuit.output.plus) ?? -1;
    this.minus = compiled.netIndex.get(compiled.circuit.output.minus) ?? -1;
    this.drivers = compiled.devices.filter((d) => d.stampAcDrive !== undefined);
    const s = this.structure;
    this.rowOfPosition = new Int32Array(s.nnz + 1).fill(-1);
    this.columnOfPosition = new Int32Array(s.nnz + 1).fill(-1);
    for (let p = 0; p < s.size; p++) {
      for (let k = s.rowStart[p]; k < s.rowStart[p + 1]; k++) {
        this.rowOfPosition[k] = s.originalRowOf[p];
        this.columnOfPosition[k] = s.originalColumnOf[s.columnOf[k]];
      }
    }
    const stored: number[] = [];
    for (let k = 0; k < s.nnz; k++) if (this.rowOfPosition[k] >= 0) stored.push(k);
    this.stored = Int32Array.from(stored);
    this.indexInBlock = new Int32Array(this.size);
    this.inBlock2 = new Uint8Array(this.size);
    this.forced = new Uint8Array(this.size);
    this.rhsRe = new Float64Array(this.size + 1);
    this.rhsIm = new Float64Array(this.size + 1);
    this.drivenRows = drivenRowsOf(this.drivers, nominal.op.x, this.size);
  }

  /** block 2's size once learnt (0 before the first run) */
  get reducedSize(): number {
    return this.block2.length;
  }

  /**
   * The response at every frequency into outRe/outIm, or false when this run must take the ordinary sweep (the
   * split does not hold and cannot be widened). `model` is this run's small-signal model on the same compiled circuit.
   */
  sweep(
    model: SmallSignalModel,
    frequencies: ArrayLike<number>,
    pressure: number,
    outRe: number[],
    outIm: number[],
  ): boolean {
    if (this.disabled || !this.prepare(model, frequencies)) return false;
    const { conductance, reactance } = model;
    const { varyingPositions, deltaG, deltaC, nominalG, nominalC } = this;
    for (let e = 0; e < varyingPositions.length; e++) {
      const p = varyingPositions[e];
      deltaG[e] = conductance[p] - nominalG[p];
      deltaC[e] = reactance[p] - nominalC[p];
    }
    const drive = new DriveContext(model.op.x, this.rhsRe, this.rhsIm);
    drive.pressure = pressure;
    const count = frequencies.length;
    for (let start = 0; start < count; start += SWEEP_LANES) {
      const used = Math.min(SWEEP_LANES, count - start);
      const plan = this.terms[start].plan!;
      let shared = true;
      for (let b = 1; b < used; b++) shared &&= this.terms[start + b].plan === plan;
      if (!shared) {
        // Neighbours with different pivot orders (rare): one frequency at a time.
        for (let b = 0; b < used; b++) this.sweepOne(model, drive, start + b, frequencies, pressure, outRe, outIm);
        continue;
      }
      this.sweepGroup(model, drive, start, used, frequencies, pressure, outRe, outIm);
    }
    this.reducedRuns++;
    return true;
  }

  /** SWEEP_LANES neighbouring frequencies sharing one plan (a short last group repeats its last frequency). */
  private sweepGroup(
    model: SmallSignalModel,
    drive: DriveContext,
    start: number,
    used: number,
    frequencies: ArrayLike<number>,
    pressure: number,
    outRe: number[],
    outIm: number[],
  ): void {
    const k = this.block2.length;
    const { lanes, laneB2Re, laneB2Im, laneX2Re, laneX2Im, varyingAt, deltaG, deltaC } = this;
    const { re, im } = lanes;
    const plan = this.terms[start].plan!;
    const group = start / SWEEP_LANES;
    re.set(this.groupS0Re[group]);
    im.set(this.groupS0Im[group]);
    for (let b = 0; b < SWEEP_LANES; b++) {
      const f = start + Math.min(b, used - 1);
      const t = this.terms[f];
      const omega = t.omega;
      for (let e = 0; e < varyingAt.length; e++) {
        const at = (varyingAt[e] << 2) + b;
        re[at] += deltaG[e];
        im[at] += omega * deltaC[e];
      }
      this.reducedRightHandSide(drive, t, frequencies[f]);
      for (let i = 0; i < k; i++) {
        laneB2Re[(i << 2) + b] = this.b2Re[i];
        laneB2Im[(i << 2) + b] = this.b2Im[i];
      }
      this.laneOutRe[b] = this.outputRe;
      this.laneOutIm[b] = this.outputIm;
    }
    const failed = lanes.factor(plan);
    lanes.solve(laneB2Re, laneB2Im, laneX2Re, laneX2Im);
    for (let b = 0; b < used; b++) {
      const f = start + b;
      if (failed & (1 << b)) {
        this.sweepOne(model, drive, f, frequencies, pressure, outRe, outIm);
        continue;
      }
      const t = this.terms[f];
      let sr = this.laneOutRe[b];
      let si = this.laneOutIm[b];
      for (let i = 0; i < k; i++) {
        const xr = laneX2Re[(i << 2) + b];
        const xi = laneX2Im[(i << 2) + b];
        sr += t.uRe[i] * xr - t.uIm[i] * xi;
        si += t.uRe[i] * xi + t.uIm[i] * xr;
      }
      outRe[f] = sr;
      outIm[f] = si;
    }
  }

  /** One frequency with partial pivoting (a lane whose nominal order was not safe, or a group without one plan). */
  private sweepOne(
    model: SmallSignalModel,
    drive: DriveContext,
    f: number,
    frequencies: ArrayLike<number>,
    pressure: number,
    outRe: number[],
    outIm: number[],
  ): void {
    const t = this.terms[f];
    this.reducedRightHandSide(drive, t, frequencies[f]);
    if (!this.solvePivoting(t)) {
      // This run's reduced system is singular at this frequency: the model's own solve names the cause.
      model.response(frequencies[f], pressure, this.fallback);
      outRe[f] = this.fallback.re;
      outIm[f] = this.fallback.im;
      return;
    }
    let sr = this.outputRe;
    let si = this.outputIm;
    for (let i = 0; i < this.block2.length; i++) {
      sr += t.uRe[i] * this.x2Re[i] - t.uIm[i] * this.x2Im[i];
      si += t.uRe[i] * this.x2Im[i] + t.uIm[i] * this.x2Re[i];
    }
    outRe[f] = sr;
    outIm[f] = si;
  }

  /**
   * Stamp the drives at `frequency` and form b2 − T·b1 into b2Re/b2Im, and y·b1 (the output's block-1 part)
   * into outputRe/outputIm.
   */
  private reducedRightHandSide(drive: DriveContext, t: FrequencyTerms, frequency: number): void {
    const k = this.block2.length;
    const n1 = this.block1.length;
    const { rhsRe, rhsIm, b2Re, b2Im, block1, block2, drivenRows, drivenBlock1 } = this;
    // The drivers write only the rows recorded in the constructor: clear just those.
    for (let q = 0; q < drivenRows.length; q++) {
      rhsRe[drivenRows[q]] = 0;
      rhsIm[drivenRows[q]] = 0;
    }
    drive.frequency = frequency;
    for (const d of this.drivers) d.stampAcDrive!(drive);
    let outputRe = 0;
    let outputIm = 0;
    for (let i = 0; i < k; i++) {
      b2Re[i] = rhsRe[block2[i]];
      b2Im[i] = rhsIm[block2[i]];
    }
    for (let q = 0; q < drivenBlock1.length; q++) {
      const r = drivenBlock1[q];
      const br = rhsRe[block1[r]];
      const bi = rhsIm[block1[r]];
      if (br === 0 && bi === 0) continue;
      outputRe += t.yRe[r] * br - t.yIm[r] * bi;
      outputIm += t.yRe[r] * bi + t.yIm[r] * br;
      for (let i = 0; i < k; i++) {
        const at = i * n1 + r;
        b2Re[i] -= t.tRe[at] * br - t.tIm[at] * bi;
        b2Im[i] -= t.tRe[at] * bi + t.tIm[at] * br;
      }
    }
    this.outputRe = outputRe;
    this.outputIm = outputIm;
  }

  /** S = S₀ + ΔG + jω·ΔC for this run (deltaG/deltaC), into re/im (k × k row-major). */
  private loadReduced(re: Float64Array, im: Float64Array, t: FrequencyTerms): void {
    re.set(t.s0Re);
    im.set(t.s0Im);
    const { varyingAt, deltaG, deltaC } = this;
    const omega = t.omega;
    for (let e = 0; e < varyingAt.length; e++) {
      re[varyingAt[e]] += deltaG[e];
      im[varyingAt[e]] += omega * deltaC[e];
    }
  }

  /** The rare run whose nominal pivot order is not safe: factor with partial pivoting into x2; false if singular. */
  private solvePivoting(t: FrequencyTerms): boolean {
    const lu = this.pivoting;
    this.loadReduced(lu.re, lu.im, t);
    try {
      lu.factor();
    } catch (e) {
      if (e instanceof SingularMatrixError) return false;
      throw e;
    }
    lu.solve(this.b2Re, this.b2Im, this.x2Re, this.x2Im);
    return true;
  }

  /** Learn or check the split for this run's G and C and make sure the terms cover these frequencies. */
  private prepare(model: SmallSignalModel, frequencies: ArrayLike<number>): boolean {
    const { conductance, reactance } = model;
    let widened = this.varying === null;
    const varying = this.varying ?? new Uint8Array(this.structure.nnz + 1);
    for (const k of this.stored) {
      if (varying[k] || (conductance[k] === this.nominalG[k] && reactance[k] === this.nominalC[k])) continue;
      varying[k] = 1;
      widened = true;
    }
    this.varying = varying;
    if (widened) {
      if (this.termsFor !== null && ++this.rebuilds > MAX_REBUILDS) return this.disable();
      if (!this.split()) return this.disable();
      this.termsFor = null;
    }
    if (this.termsFor !== frequencies && !sameValues(this.termsFor, frequencies)) {
      // A11 can be singular where a varying part was the only tie of a block-1 unknown (a voltage source's branch
      // current whose net went to block 2): that unknown joins block 2 and the terms are built again.
      for (;;) {
        const singular = this.buildTerms(frequencies);
        if (singular === null) break;
        if (singular < 0) return this.disable();
        this.forced[singular] = 1;
        if (!this.split()) return this.disable();
      }
    }
    this.termsFor = frequencies;
    return true;
  }

  private disable(): false {
    this.disabled = true;
    return false;
  }

  /** Block 2 = the rows and columns of the varying entries; false when that leaves too little to gain. */
  private split(): boolean {
    const varying = this.varying!;
    const inBlock2 = this.inBlock2;
    inBlock2.set(this.forced);
    for (const k of this.stored) {
      if (!varying[k]) continue;
      inBlock2[this.rowOfPosition[k]] = 1;
      inBlock2[this.columnOfPosition[k]] = 1;
    }
    const one: number[] = [];
    const two: number[] = [];
    for (let u = 0; u < this.size; u++) {
      this.indexInBlock[u] = (inBlock2[u] ? two : one).length;
      (inBlock2[u] ? two : one).push(u);
    }
    if (two.length === 0 || two.length > MAX_REDUCED_FRACTION * this.size) return false;
    this.block1 = Int32Array.from(one);
    this.block2 = Int32Array.from(two);
    const k = two.length;
    const positions: number[] = [];
    const ats: number[] = [];
    for (const p of this.stored) {
      if (!varying[p]) continue;
      positions.push(p);
      ats.push(this.indexInBlock[this.rowOfPosition[p]] * k + this.indexInBlock[this.columnOfPosition[p]]);
    }
    this.varyingPositions = Int32Array.from(positions);
    this.varyingAt = Int32Array.from(ats);
    this.deltaG = new Float64Array(positions.length);
    this.deltaC = new Float64Array(positions.length);
    this.drivenBlock1 = Int32Array.from(this.drivenRows.filter((u) => !inBlock2[u]).map((u) => this.indexInBlock[u]));
    this.lanes = new OrderedLuLanes(k);
    this.laneB2Re = new Float64Array(k * SWEEP_LANES);
    this.laneB2Im = new Float64Array(k * SWEEP_LANES);
    this.laneX2Re = new Float64Array(k * SWEEP_LANES);
    this.laneX2Im = new Float64Array(k * SWEEP_LANES);
    this.pivoting = new DenseLuComplex(k);
    this.b2Re = new Float64Array(k);
    this.b2Im = new Float64Array(k);
    this.x2Re = new Float64Array(k);
    this.x2Im = new Float64Array(k);
    return true;
  }

  /**
   * S₀, T, y and u at every frequency from the nominal G and C. Returns null when built, else the unknown whose
   * column A11 could not pivot (−1 when the terms are not finite).
   */
  private buildTerms(frequencies: ArrayLike<number>): number | null {
    const n = this.size;
    const { block1, block2 } = this;
    const n1 = block1.length;
    const k = block2.length;
    const full = new DenseLuComplex(n);
    const a11 = new DenseLuComplex(n1);
    const colRe = new Float64Array(n1);
    const colIm = new Float64Array(n1);
    const solRe = new Float64Array(n1);
    const solIm = new Float64Array(n1);
    const output = new Float64Array(n);
    if (this.plus >= 0) output[this.plus] += 1;
    if (this.minus >= 0) output[this.minus] -= 1;
    const terms: FrequencyTerms[] = [];
    for (let f = 0; f < frequencies.length; f++) {
      const omega = 2 * Math.PI * frequencies[f];
      // The nominal A(ω) as a dense n × n matrix in original unknown order.
      full.clear();
      for (const p of this.stored) {
        const at = this.rowOfPosition[p] * n + this.columnOfPosition[p];
        full.re[at] += this.nominalG[p];
        full.im[at] += omega * this.nominalC[p];
      }
      const aRe = (r: number, c: number) => full.re[r * n + c];
      const aIm = (r: number, c: number) => full.im[r * n + c];
      a11.clear();
      for (let r = 0; r < n1; r++) {
        for (let c = 0; c < n1; c++) {
          a11.re[r * n1 + c] = aRe(block1[r], block1[c]);
          a11.im[r * n1 + c] = aIm(block1[r], block1[c]);
        }
      }
      try {
        a11.factor();
      } catch (e) {
        // Partial pivoting swaps rows only, so the failing step is the block-1 column of that index.
        if (e instanceof SingularMatrixError) return block1[e.unknown];
        throw e;
      }
      const t: FrequencyTerms = {
        omega,
        s0Re: new Float64Array(k * k),
        s0Im: new Float64Array(k * k),
        tRe: new Float64Array(k * n1),
        tIm: new Float64Array(k * n1),
        yRe: new Float64Array(n1),
        yIm: new Float64Array(n1),
        uRe: new Float64Array(k),
        uIm: new Float64Array(k),
        order: new Int32Array(k),
        plan: null,
      };
      for (let i = 0; i < k; i++)
        for (let j = 0; j < k; j++) {
          t.s0Re[i * k + j] = aRe(block2[i], block2[j]);
          t.s0Im[i * k + j] = aIm(block2[i], block2[j]);
        }
      // X = A11⁻¹·A12 column by column; S₀ −= A21·X.
      for (let j = 0; j < k; j++) {
        for (let r = 0; r < n1; r++) {
          colRe[r] = aRe(block1[r], block2[j]);
          colIm[r] = aIm(block1[r], block2[j]);
        }
        a11.solve(colRe, colIm, solRe, solIm);
        for (let i = 0; i < k; i++) {
          let sr = 0;
          let si = 0;
          for (let r = 0; r < n1; r++) {
            const ar = aRe(block2[i], block1[r]);
            const ai = aIm(block2[i], block1[r]);
            sr += ar * solRe[r] - ai * solIm[r];
            si += ar * solIm[r] + ai * solRe[r];
          }
          t.s0Re[i * k + j] -= sr;
          t.s0Im[i * k + j] -= si;
        }
      }
      // Rows of T = A21·A11⁻¹: A11ᵀ·tᵢ = (row i of A21)ᵀ.
      for (let i = 0; i < k; i++) {
        for (let r = 0; r < n1; r++) {
          colRe[r] = aRe(block2[i], block1[r]);
          colIm[r] = aIm(block2[i], block1[r]);
        }
        a11.solveTransposed(colRe, colIm, solRe, solIm);
        t.tRe.set(solRe, i * n1);
        t.tIm.set(solIm, i * n1);
      }
      // y = A11⁻ᵀ·c1 and u = c2 − yᵀ·A12, so that the output cᵀx = y·b1 + u·x2.
      for (let r = 0; r < n1; r++) {
        colRe[r] = output[block1[r]];
        colIm[r] = 0;
      }
      a11.solveTransposed(colRe, colIm, t.yRe, t.yIm);
      for (let j = 0; j < k; j++) {
        let sr = output[block2[j]];
        let si = 0;
        for (let r = 0; r < n1; r++) {
          const ar = aRe(block1[r], block2[j]);
          const ai = aIm(block1[r], block2[j]);
          sr -= t.yRe[r] * ar - t.yIm[r] * ai;
          si -= t.yRe[r] * ai + t.yIm[r] * ar;
        }
        t.uRe[j] = sr;
        t.uIm[j] = si;
      }
      if (!allFinite(t)) return -1;
      // The nominal S₀'s own pivot order; a singular S₀ leaves every run to the pivoting fallback's verdict.
      const s0 = new DenseLuComplex(k);
      s0.re.set(t.s0Re);
      s0.im.set(t.s0Im);
      try {
        s0.factor();
        t.order = s0.rowOrder();
      } catch (e) {
        if (!(e instanceof SingularMatrixError)) throw e;
        for (let i = 0; i < k; i++) t.order[i] = i;
      }
      terms.push(t);
    }
    // One plan per distinct pivot order, on the pattern every run can fill: S₀'s entries and the varying ones.
    const pattern = new Uint8Array(k * k);
    for (const t of terms) for (let i = 0; i < k * k; i++) if (t.s0Re[i] !== 0 || t.s0Im[i] !== 0) pattern[i] = 1;
    for (const at of this.varyingAt) pattern[at] = 1;
    const plans = new Map<string, OrderedLuPlan>();
    for (const t of terms) {
      const key = t.order.join(",");
      let plan = plans.get(key);
      if (!plan) {
        plan = planOrderedLu(k, pattern, t.order);
        plans.set(key, plan);
      }
      t.plan = plan;
    }
    this.terms = terms;
    this.groupS0Re = [];
    this.groupS0Im = [];
    for (let start = 0; start < terms.length; start += SWEEP_LANES) {
      const used = Math.min(SWEEP_LANES, terms.length - start);
      const groupRe = new Float64Array(k * k * SWEEP_LANES);
      const groupIm = new Float64Array(k * k * SWEEP_LANES);
      for (let b = 0; b < SWEEP_LANES; b++) {
        const t = terms[start + Math.min(b, used - 1)];
        for (let at = 0; at < k * k; at++) {
          groupRe[at * SWEEP_LANES + b] = t.s0Re[at];
          groupIm[at * SWEEP_LANES + b] = t.s0Im[at];
        }
      }
      this.groupS0Re.push(groupRe);
      this.groupS0Im.push(groupIm);
    }
    return null;
  }
}

/**
 * Every row a driver can write, found by stamping each at a few frequencies and pressures into a context that
 * records rows, not values (a device's rows are fixed by its wiring; the values may vanish at one frequency).
 */
function drivenRowsOf(drivers: Device[], x: Float64Array, size: number): Int32Array {
  const rows = new Set<number>();
  const recorder = {
    x,
    frequency: 0,
    pressure: 0,
    addRhs(row: number) {
      if (row >= 0 && row < size) rows.add(row);
    },
  };
  for (const frequency of [1, 1e3, 1e5]) {
    for (const pressure of [1, 0]) {
      recorder.frequency = frequency;
      recorder.pressure = pressure;
      for (const d of drivers) d.stampAcDrive!(recorder);
    }
  }
  return Int32Array.from([...rows].sort((a, b) => a - b));
}

function sameValues(a: ArrayLike<number> | null, b: ArrayLike<number>): boolean {
  if (a === null || a.length !== b.length) return false;
  for (let i = 0; i < a.length; i++) if (a[i] !== b[i]) return false;
  return true;
}

function allFinite(t: FrequencyTerms): boolean {
  for (const a of [t.s0Re, t.s0Im, t.tRe, t.tIm, t.yRe, t.yIm, t.uRe, t.uIm]) {
    for (let i = 0; i < a.length; i++) if (!Number.isFinite(a[i])) return false;
  }
  return true;
}
