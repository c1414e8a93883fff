import { complex, lusolve, matrix } from "mathjs";
import { describe, expect, it } from "vitest";
import { DenseLuComplex } from "./dense-lu";
import { planOrderedLu } from "./ordered-lu";
import { OrderedLuLanes } from "./ordered-lu-lanes";
import { SWEEP_LANES } from "./sparse-lu-complex-lanes";

/** A seeded sparse complex matrix, about a third full, with a zero diagonal in row 0 (as a voltage-source row). */
function sparseMatrix(n: number, seed: number) {
  let state = seed;
  const next = () => {
    state = (state * 1103515245 + 12345) % 2147483648;
    return state / 2147483648 - 0.5;
  };
  const re = new Float64Array(n * n);
  const im = new Float64Array(n * n);
  for (let i = 0; i < n; i++) {
    for (let j = 0; j < n; j++) {
      if (i === j ? i === 0 : next() < 0.2) continue;
      re[i * n + j] = next() + (i === j ? 3 : 0);
      im[i * n + j] = next();
    }
  }
  re[1] = 1;
  re[n] = 1;
  return { re, im };
}

describe("ordered LU in lanes (static row order on a fixed pattern, four systems at once)", () => {
  const n = 7;
  const base = sparseMatrix(n, 7);
  const pattern = new Uint8Array(n * n).map((_, i) => (base.re[i] !== 0 || base.im[i] !== 0 ? 1 : 0));
  const pivoting = new DenseLuComplex(n);
  pivoting.re.set(base.re);
  pivoting.im.set(base.im);
  pivoting.factor();
  const order = pivoting.rowOrder();
  // Lane b: the base matrix with its stored entries scaled by 1 + b/10, as Monte Carlo runs move values.
  const lanesOf = () => {
    const lu = new OrderedLuLanes(n);
    for (let b = 0; b < SWEEP_LANES; b++) {
      for (let at = 0; at < n * n; at++) {
        lu.re[at * SWEEP_LANES + b] = base.re[at] * (1 + b / 10);
        lu.im[at * SWEEP_LANES + b] = base.im[at] * (1 - b / 20);
      }
    }
    return lu;
  };
  const rhsRe = new Float64Array(n * SWEEP_LANES).map((_, i) => Math.sin(i + 1));
  const rhsIm = new Float64Array(n * SWEEP_LANES).map((_, i) => Math.cos(2 * i));

  it("solves every lane as mathjs's lusolve does (an independent complex LU), in the order partial pivoting chose", () => {
    const lu = lanesOf();
    expect(lu.factor(planOrderedLu(n, pattern, order))).toBe(0);
    const xRe = new Float64Array(n * SWEEP_LANES);
    const xIm = new Float64Array(n * SWEEP_LANES);
    lu.solve(rhsRe, rhsIm, xRe, xIm);
    for (let b = 0; b < SWEEP_LANES; b++) {
      const a = matrix(
        Array.from({ length: n }, (_, i) =>
          Array.from({ length: n }, (_, j) =>
            complex(base.re[i * n + j] * (1 + b / 10), base.im[i * n + j] * (1 - b / 20)),
          ),
        ),
      );
      const rhs = matrix(
        Array.from({ length: n }, (_, i) => [complex(rhsRe[i * SWEEP_LANES + b], rhsIm[i * SWEEP_LANES + b])]),
      );
      const reference = lusolve(a, rhs).toArray() as unknown as { re: number; im: number }[][];
      for (let i = 0; i < n; i++) {
        expect(xRe[i * SWEEP_LANES + b]).toBeCloseTo(reference[i][0].re, 12);
        expect(xIm[i * SWEEP_LANES + b]).toBeCloseTo(reference[i][0].im, 12);
      }
    }
  });

  it("reports every lane whose first pivot would be the zero diagonal instead of dividing by it", () => {
    const lu = lanesOf();
    const identity = Int32Array.from({ length: n }, (_, i) => i);
    expect(lu.factor(planOrderedLu(n, pattern, identity))).toBe((1 << SWEEP_LANES) - 1);
  });
});
