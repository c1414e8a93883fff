/**
 * The sparse solver against an independent one: mathjs `lusolve` (general-purpose library from npm) on the same
 * complex matrix, for random well-conditioned R/C/L/source networks (property-based with fast-check).
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

type NetworkSpec = { nets: number; extra: Array<{ kind: string; a: number; b: number; decade: number }> };

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
    if (e.kind === "capacitor") parts.push(part(id, "capacitor", { a, b }, { capacitance: 10 ** (-12 + 6 * e.decade) }));
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
});
