/**
 * The two baselines the sparse sweep is compared with, on exactly the same matrices: the dense typed-array LU
 * (sim/mna/dense-lu.ts) and mathjs `lusolve` on a matrix of mathjs complex numbers.
 */
import { complex, lusolve, matrix } from "mathjs";
import { DenseLuComplex } from "../mna/dense-lu";
import type { SmallSignalModel } from "../analyses/small-signal";

interface ModelInternals {
  system: { conductance: Float64Array; reactance: Float64Array };
  rhsRe: Float64Array;
  rhsIm: Float64Array;
}

/** The matrix A(ω) of a small-signal model and its drive right-hand side at one frequency, dense. */
export function denseSystemAt(model: SmallSignalModel, frequency: number, pressure: number) {
  model.response(frequency, pressure); // fills the model's right-hand side for this frequency
  const internals = model as unknown as ModelInternals;
  const structure = model.compiled.ac;
  const omega = 2 * Math.PI * frequency;
  const re = new Float64Array(structure.nnz + 1);
  const im = new Float64Array(structure.nnz + 1);
  for (let k = 0; k < re.length; k++) {
    re[k] = internals.system.conductance[k];
    im[k] = omega * internals.system.reactance[k];
  }
  return { structure, re, im, rhsRe: internals.rhsRe.slice(), rhsIm: internals.rhsIm.slice() };
}

/** Prepared dense solves (matrix assembly outside the timed part), for timing the dense LU alone. */
export function prepareDense(model: SmallSignalModel, frequencies: number[], pressure: number): () => void {
  const n = model.compiled.unknowns.length;
  const lu = new DenseLuComplex(n);
  const xr = new Float64Array(n);
  const xi = new Float64Array(n);
  const systems = frequencies.map((f) => denseSystemAt(model, f, pressure));
  return () => {
    for (const s of systems) {
      lu.loadFromSparse(s.structure, s.re, s.im);
      lu.factor();
      lu.solve(s.rhsRe, s.rhsIm, xr, xi);
    }
  };
}

/** Prepared mathjs solves of the same matrices (conversion to mathjs values inside the timed part, as a user would). */
export function prepareMathjs(model: SmallSignalModel, frequencies: number[], pressure: number): () => void {
  const n = model.compiled.unknowns.length;
  const dense = new DenseLuComplex(n);
  const systems = frequencies.map((f) => {
    const s = denseSystemAt(model, f, pressure);
    dense.loadFromSparse(s.structure, s.re, s.im);
    return { re: dense.re.slice(), im: dense.im.slice(), rhsRe: s.rhsRe, rhsIm: s.rhsIm };
  });
  return () => {
    for (const s of systems) {
      const rows = [];
      for (let i = 0; i < n; i++) {
        const row = [];
        for (let j = 0; j < n; j++) row.push(complex(s.re[i * n + j], s.im[i * n + j]));
        rows.push(row);
      }
      const b = [];
      for (let i = 0; i < n; i++) b.push([complex(s.rhsRe[i], s.rhsIm[i])]);
      lusolve(matrix(rows), matrix(b));
    }
  };
}
