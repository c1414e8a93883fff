/**
 * The sparse solver against an independent one: mathjs `lusolve` (general-purpose library from npm) on the same
 * complex matrix, for random well-conditioned R/C/L/source networks (property-based with fast-check): the
 * single-frequency solve, the transposed solve (Aᵀ·y = b, mathjs on the transposed matrix) and the lane-parallel
 * sweep solver (four frequencies at once).
 */
import fc from "fast-check";
import { complex, lusolve, matrix } from "mathjs";
import { describe, expect, it } from "vitest";
import { circuit, part } from "../analyses/test-circuits";
import { compileCircuit } from "../analyses/compile";
import { OperatingPointSolver } from "../analyses/op";
import type { ElaboratedPart } from "../circuit/types";
import { ComplexSystem } from "./complex-system";
import { DenseLuComplex } from "./dense-lu";
import { PatternBuilder } from "./pattern";
import { SparseLuComplexLanes, SWEEP_LANES } from "./sparse-lu-complex-lanes";
import { compileSparseStructure } from "./sparse-structure";

/** Agreement required by the brief: 1e-9 relative (to the largest solution component). */
const AGREEMENT = 1e-9;

const element = fc.record({
  kind: fc.constantFrom("resistor", "capacitor", "inductor", "isource", "vsource"),
  a: fc.nat(),
  b: fc.nat(),
  decade: fc.double({ min: 0, max: 1, noNaN: true }),
});

const network = fc.record({
  nets: fc.integer({ min: 2, max: 14 }),
  extra: fc.array(element, { maxLength: 25 }),
  frequency: fc.double({ min: 0, max: 5, noNaN: true }),
});

type NetworkSpec = {
  nets: number;
  extra: Array<{ kind: string; a: number; b: number; decade: number }>;
  /** voltage-controlled current sources: they make A unsymmetric, so A and Aᵀ differ */
  gains?: Array<{ p: number; n: number; cp: number; cn: number; decade: number }>;
};

const gain = fc.record({
  p: fc.nat(),
  n: fc.nat(),
  cp: fc.nat(),
  cn: fc.nat(),
  decade: fc.double({ min: 0, max: 1, noNaN: true }),
});

/** The random networks plus up to three VCCS of 0.1 … 1 µS: below the 10 µS … 10 mS chain, so A stays well-conditioned. */
const unsymmetricNetwork = fc.record({
  nets: fc.integer({ min: 2, max: 14 }),
  extra: fc.array(element, { maxLength: 25 }),
  gains: fc.array(gain, { minLength: 1, maxLength: 3 }),
  frequency: fc.double({ min: 0, max: 5, noNaN: true }),
});

function build(spec: NetworkSpec) {
  const name = (i: number) => (i % (spec.nets + 1) === 0 ? "0" : `n${i % (spec.nets + 1)}`);
  const parts: ElaboratedPart[] = [];
  // A resistor chain from ground through every net keeps each net tied to ground (well-conditioned).
  for (let i = 1; i <= spec.nets; i++) {
    parts.push(part(`RT${i}`, "resistor", { a: name(i - 1), b: name(i) }, { resistance: 100 * 10 ** (i % 4) }));
  }
  parts.push(part("VIN", "vsource", { p: name(1), n: "0" }, { dc: 1, ac: 1, ac_phase: 30 }));
  let vsources = 0;
  spec.extra.forEach((e, k) => {
    const a = name(e.a);
    const b = name(e.b);
    if (a === b) return;
    const id = `X${k}`;
    if (e.kind === "resistor") parts.push(part(id, "resistor", { a, b }, { resistance: 10 ** (1 + 5 * e.decade) }));
    if (e.kind === "capacitor")
      parts.push(part(id, "capacitor", { a, b }, { capacitance: 10 ** (-12 + 6 * e.decade) }));
    if (e.kind === "inductor") {
      parts.push(part(id, "inductor", { a, b }, { inductance: 10 ** (-6 + 6 * e.decade), series_resistance: 10 }));
    }
    if (e.kind === "isource") parts.push(part(id, "isource", { p: a, n: b }, { dc: 1e-3, ac: 1e-3 * e.decade }));
    // At most one extra voltage source, in series with a resistor so that no source loop can form.
    if (e.kind === "vsource" && vsources === 0) {
      vsources++;
      parts.push(part(id, "vsource", { p: a, n: `${id}m` }, { ac: e.decade }));
      parts.push(part(`${id}R`, "resistor", { a: `${id}m`, b }, { resistance: 1e3 }));
    }
  });
  (spec.gains ?? []).forEach((g, k) => {
    const pins = { p: name(g.p), n: name(g.n), cp: name(g.cp), cn: name(g.cn) };
    if (pins.p === pins.n || pins.cp === pins.cn) return;
    parts.push(part(`G${k}`, "vccs", pins, { transconductance: 10 ** (-7 + g.decade) }));
  });
  return circuit(parts, { plus: name(1) });
}

function mathjsSolve(dense: DenseLuComplex, rhsRe: Float64Array, rhsIm: Float64Array): Array<[number, number]> {
  const n = dense.size;
  const rows = [];
  for (let i = 0; i < n; i++) {
    const row = [];
    for (let j = 0; j < n; j++) row.push(complex(dense.re[i * n + j], dense.im[i * n + j]));
    rows.push(row);
  }
  const b = [];
  for (let i = 0; i < n; i++) b.push([complex(rhsRe[i], rhsIm[i])]);
  const x = lusolve(matrix(rows), matrix(b)).toArray() as unknown as Array<[{ re: number; im: number } | number]>;
  return x.map(([v]) => (typeof v === "number" ? [v, 0] : [v.re, v.im]));
}

/** The random network's AC system stamped at its operating point, with the drive at `frequency` (Hz). */
function stampedSystem(spec: NetworkSpec, frequency: number) {
  const compiled = compileCircuit(build(spec));
  const op = new OperatingPointSolver(compiled).solve();
  const system = new ComplexSystem(compiled.ac);
  const positions = compiled.ac.positionOfHandle;
  for (const d of compiled.devices) {
    d.stampAc({
      x: op.x,
      thermalVoltage: op.thermalVoltage,
      addConductance: (h, v) => {
        system.conductance[positions[h]] += v;
      },
      addReactance: (h, v) => {
        system.reactance[positions[h]] += v;
      },
    });
  }
  const n = compiled.unknowns.length;
  const rhsRe = new Float64Array(n + 1);
  const rhsIm = new Float64Array(n + 1);
  for (const d of compiled.devices) {
    d.stampAcDrive?.({
      x: op.x,
      frequency,
      pressure: 1,
      addRhs: (row, re, im) => {
        if (row < 0) return;
        rhsRe[row] += re;
        rhsIm[row] += im;
      },
    });
  }
  return { compiled, system, n, rhsRe, rhsIm };
}

/** A(ω) of a stamped system as a dense matrix (row-major re/im), built independently of the factorisation. */
function denseMatrix(system: ComplexSystem, omega: number): DenseLuComplex {
  const structure = system.structure;
  const dense = new DenseLuComplex(structure.size);
  const valuesRe = new Float64Array(structure.nnz + 1);
  const valuesIm = new Float64Array(structure.nnz + 1);
  for (let k = 0; k < valuesRe.length; k++) {
    valuesRe[k] = system.conductance[k];
    valuesIm[k] = omega * system.reactance[k];
  }
  dense.loadFromSparse(structure, valuesRe, valuesIm);
  return dense;
}

/** The transpose of a dense matrix (not conjugated), as a new DenseLuComplex holding the values. */
function transposed(dense: DenseLuComplex): DenseLuComplex {
  const n = dense.size;
  const out = new DenseLuComplex(n);
  for (let i = 0; i < n; i++) {
    for (let j = 0; j < n; j++) {
      out.re[j * n + i] = dense.re[i * n + j];
      out.im[j * n + i] = dense.im[i * n + j];
    }
  }
  return out;
}

function expectAgreement(re: ArrayLike<number>, im: ArrayLike<number>, reference: Array<[number, number]>): void {
  const scale = Math.max(...reference.map(([a, b]) => Math.hypot(a, b)));
  for (let i = 0; i < reference.length; i++) {
    const error = Math.hypot(re[i] - reference[i][0], im[i] - reference[i][1]);
    expect(error).toBeLessThanOrEqual(AGREEMENT * scale);
  }
}

describe("sparse complex solve vs mathjs lusolve", () => {
  it("agrees to 1e-9 relative on random R/C/L/source networks", () => {
    fc.assert(
      fc.property(network, (spec) => {
        const c = build(spec);
        const compiled = compileCircuit(c);
        const op = new OperatingPointSolver(compiled).solve();
        const system = new ComplexSystem(compiled.ac);
        const positions = compiled.ac.positionOfHandle;
        for (const d of compiled.devices) {
          d.stampAc({
            x: op.x,
            thermalVoltage: op.thermalVoltage,
            addConductance: (h, v) => {
              system.conductance[positions[h]] += v;
            },
            addReactance: (h, v) => {
              system.reactance[positions[h]] += v;
            },
          });
        }
        const n = compiled.unknowns.length;
        const rhsRe = new Float64Array(n + 1);
        const rhsIm = new Float64Array(n + 1);
        for (const d of compiled.devices) {
          d.stampAcDrive?.({
            x: op.x,
            frequency: 10 ** spec.frequency,
            pressure: 1,
            addRhs: (row, re, im) => {
              if (row < 0) return;
              rhsRe[row] += re;
              rhsIm[row] += im;
            },
          });
        }
        const omega = 2 * Math.PI * 10 ** spec.frequency;
        // The same matrix, densely, for mathjs.
        const dense = new DenseLuComplex(n);
        const valuesRe = new Float64Array(compiled.ac.nnz + 1);
        const valuesIm = new Float64Array(compiled.ac.nnz + 1);
        for (let k = 0; k < valuesRe.length; k++) {
          valuesRe[k] = system.conductance[k];
          valuesIm[k] = omega * system.reactance[k];
        }
        dense.loadFromSparse(compiled.ac, valuesRe, valuesIm);
        const reference = mathjsSolve(dense, rhsRe, rhsIm);

        system.factorAt(omega);
        const re = new Float64Array(n);
        const im = new Float64Array(n);
        system.solve(rhsRe, rhsIm, re, im);
        // Static pivoting holds for these networks: the sparse path itself was checked, not the dense fallback.
        expect(system.denseFallbacks).toBe(0);
        const scale = Math.max(...reference.map(([a, b]) => Math.hypot(a, b)));
        for (let i = 0; i < n; i++) {
          const error = Math.hypot(re[i] - reference[i][0], im[i] - reference[i][1]);
          expect(error).toBeLessThanOrEqual(AGREEMENT * scale);
        }
        // The dense LU baseline agrees too.
        dense.factor();
        const dre = new Float64Array(n);
        const dim = new Float64Array(n);
        dense.solve(rhsRe, rhsIm, dre, dim);
        for (let i = 0; i < n; i++) {
          expect(Math.hypot(dre[i] - reference[i][0], dim[i] - reference[i][1])).toBeLessThanOrEqual(AGREEMENT * scale);
        }
      }),
      { numRuns: 150, seed: 20240611 },
    );
  });

  it("DC operating point of the same random networks agrees with mathjs on the DC matrix", () => {
    fc.assert(
      fc.property(network, (spec) => {
        const compiled = compileCircuit(build(spec));
        const op = new OperatingPointSolver(compiled).solve();
        // Re-stamp the (linear) DC system at the solution and solve it with mathjs.
        const n = compiled.unknowns.length;
        const values = new Float64Array(compiled.dc.nnz + 1);
        const rhs = new Float64Array(n + 1);
        const positions = compiled.dc.positionOfHandle;
        for (const d of compiled.devices) {
          d.stampDc({
            x: op.x,
            thermalVoltage: op.thermalVoltage,
            sourceScale: 1,
            add: (h, v) => {
              values[positions[h]] += v;
            },
            addRhs: (row, v) => {
              if (row >= 0) rhs[row] += v;
            },
            markLimited: () => {},
          });
        }
        const dense = new DenseLuComplex(n);
        dense.loadFromSparse(compiled.dc, values);
        const reference = mathjsSolve(dense, rhs, new Float64Array(n + 1));
        const scale = Math.max(...reference.map(([a]) => Math.abs(a)));
        for (let i = 0; i < n; i++) expect(Math.abs(op.x[i] - reference[i][0])).toBeLessThanOrEqual(AGREEMENT * scale);
      }),
      { numRuns: 100, seed: 7 },
    );
  });

  it("transposed solve (Aᵀ·y = b) agrees with mathjs lusolve on the transposed matrix, sparse and dense", () => {
    let unsymmetric = 0;
    fc.assert(
      fc.property(unsymmetricNetwork, (spec) => {
        const frequency = 10 ** spec.frequency;
        const omega = 2 * Math.PI * frequency;
        const { system, n, rhsRe, rhsIm } = stampedSystem(spec, frequency);
        // A right-hand side with every row non-zero, so every column of the factors takes part.
        for (let i = 0; i < n; i++) {
          rhsRe[i] += 1 + i;
          rhsIm[i] -= 0.5 * i;
        }
        const dense = denseMatrix(system, omega);
        const transpose = transposed(dense);
        if (transpose.re.some((v, k) => v !== dense.re[k])) unsymmetric++;
        const reference = mathjsSolve(transpose, rhsRe, rhsIm);
        system.factorAt(omega);
        expect(system.denseFallbacks).toBe(0);
        const re = new Float64Array(n);
        const im = new Float64Array(n);
        system.solveTransposed(rhsRe, rhsIm, re, im);
        expectAgreement(re, im, reference);
        // The dense LU's transposed solve (the fallback path) agrees too.
        dense.factor();
        const dre = new Float64Array(n);
        const dim = new Float64Array(n);
        dense.solveTransposed(rhsRe, rhsIm, dre, dim);
        expectAgreement(dre, dim, reference);
      }),
      { numRuns: 100, seed: 31 },
    );
    // Most runs must really have had A ≠ Aᵀ, or a plain solve would have passed as well.
    expect(unsymmetric).toBeGreaterThan(50);
  });

  it("lane-parallel sweep solver agrees with mathjs at four frequencies at once and equals the one-frequency solver", () => {
    const frequencies = fc.array(fc.double({ min: 0, max: 5, noNaN: true }), {
      minLength: SWEEP_LANES,
      maxLength: SWEEP_LANES,
    });
    fc.assert(
      fc.property(network, frequencies, (spec, decades) => {
        const hz = decades.map((d) => 10 ** d);
        const lanes = hz.map((f) => stampedSystem(spec, f));
        const { compiled, system, n } = lanes[0];
        const lu = new SparseLuComplexLanes(compiled.ac);
        const rhsRe = new Float64Array((n + 1) * SWEEP_LANES);
        const rhsIm = new Float64Array((n + 1) * SWEEP_LANES);
        lanes.forEach((lane, b) => {
          for (let r = 0; r <= n; r++) {
            rhsRe[r * SWEEP_LANES + b] = lane.rhsRe[r];
            rhsIm[r * SWEEP_LANES + b] = lane.rhsIm[r];
          }
        });
        const omegas = hz.map((f) => 2 * Math.PI * f);
        expect(lu.factorAt(system.conductance, system.reactance, omegas)).toBe(0);
        lu.solve(rhsRe, rhsIm);
        const all = { re: new Float64Array(n * SWEEP_LANES), im: new Float64Array(n * SWEEP_LANES) };
        lu.copySolution(all.re, all.im);
        const single = { re: new Float64Array(n), im: new Float64Array(n) };
        lanes.forEach((lane, b) => {
          const re = Array.from({ length: n }, (_, u) => lu.solutionRe(u, b));
          const im = Array.from({ length: n }, (_, u) => lu.solutionIm(u, b));
          expectAgreement(re, im, mathjsSolve(denseMatrix(system, omegas[b]), lane.rhsRe, lane.rhsIm));
          // The same arithmetic as the one-frequency solver, so the same numbers (=== ignores the sign of zero).
          system.factorAt(omegas[b]);
          system.solve(lane.rhsRe, lane.rhsIm, single.re, single.im);
          for (let u = 0; u < n; u++) {
            expect(re[u] === single.re[u] && im[u] === single.im[u]).toBe(true);
            expect(all.re[u * SWEEP_LANES + b]).toBe(re[u]);
            expect(all.im[u * SWEEP_LANES + b]).toBe(im[u]);
          }
        });
      }),
      { numRuns: 60, seed: 97 },
    );
  });
});

describe("lane-parallel sweep solver: per-lane static pivot test", () => {
  it("flags exactly the lanes whose pivot is too small for its row", () => {
    // 2×2: a00 = j·ω·1e-20 beside a01 = 1 fails the static test (|pivot| < 1e-10 · row max) unless ω ≥ 1e10.
    const pattern = new PatternBuilder(2);
    const a00 = pattern.entry(0, 0);
    const a01 = pattern.entry(0, 1);
    const a10 = pattern.entry(1, 0);
    const a11 = pattern.entry(1, 1);
    const structure = compileSparseStructure(pattern, "ac");
    const g = new Float64Array(structure.nnz + 1);
    const c = new Float64Array(structure.nnz + 1);
    const at = structure.positionOfHandle;
    c[at[a00]] = 1e-20;
    g[at[a01]] = 1;
    g[at[a10]] = 1;
    g[at[a11]] = 1;
    const lu = new SparseLuComplexLanes(structure);
    expect(lu.factorAt(g, c, [1, 1e12, 1e3, 1e11])).toBe(0b0101);
    expect(lu.factorAt(g, c, [1e12, 1e12, 1e12, 1e12])).toBe(0);
    // The single-frequency solver agrees on which frequencies it can factor statically.
    const system = new ComplexSystem(structure);
    system.conductance.set(g);
    system.reactance.set(c);
    system.factorAt(1);
    system.factorAt(1e12);
    expect(system.denseFallbacks).toBe(1);
  });
});
