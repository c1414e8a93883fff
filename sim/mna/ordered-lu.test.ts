import { complex, lusolve, matrix } from "mathjs";
import { describe, expect, it } from "vitest";
import { DenseLuComplex } from "./dense-lu";
import { OrderedLu, planOrderedLu } from "./ordered-lu";

/** A seeded sparse complex matrix with a zero diagonal in row 0 (a voltage-source row needs a row exchange). */
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
      if (i === j ? i === 0 : next() < 0.2) continue; // about a third full
      re[i * n + j] = next() + (i === j ? 3 : 0);
      im[i * n + j] = next();
    }
  }
  re[0 * n + 1] = 1;
  re[1 * n + 0] = 1;
  return { re, im };
}

describe("ordered LU (static row order on a fixed pattern)", () => {
  const n = 7;
  const { re, im } = sparseMatrix(n, 7);
  const pattern = new Uint8Array(n * n).map((_, i) => (re[i] !== 0 || im[i] !== 0 ? 1 : 0));
  const pivoting = new DenseLuComplex(n);
  pivoting.re.set(re);
  pivoting.im.set(im);
  pivoting.factor();
  const order = pivoting.rowOrder();
  const bRe = Array.from({ length: n }, (_, i) => Math.sin(i + 1));
  const bIm = Array.from({ length: n }, (_, i) => Math.cos(2 * i));

  it("solves as mathjs's lusolve does (an independent complex LU), in the order partial pivoting chose", () => {
    const lu = new OrderedLu(n);
    lu.re.set(re);
    lu.im.set(im);
    expect(lu.factor(planOrderedLu(n, pattern, order))).toBe(true);
    const xRe = new Float64Array(n);
    const xIm = new Float64Array(n);
    lu.solve(bRe, bIm, xRe, xIm);
    const a = matrix(
      Array.from({ length: n }, (_, i) => Array.from({ length: n }, (_, j) => complex(re[i * n + j], im[i * n + j]))),
    );
    const b = matrix(bRe.map((r, i) => [complex(r, bIm[i])]));
    const reference = lusolve(a, b).toArray() as unknown as { re: number; im: number }[][];
    for (let i = 0; i < n; i++) {
      expect(xRe[i]).toBeCloseTo(reference[i][0].re, 12);
      expect(xIm[i]).toBeCloseTo(reference[i][0].im, 12);
    }
  });

  it("refuses an order whose first pivot is the zero diagonal instead of dividing by it", () => {
    const lu = new OrderedLu(n);
    lu.re.set(re);
    lu.im.set(im);
    const identity = Int32Array.from({ length: n }, (_, i) => i);
    expect(lu.factor(planOrderedLu(n, pattern, identity))).toBe(false);
  });
});
