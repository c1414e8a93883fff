/**
 * Band corners (contract): where |H(f)| = |H(1 kHz)|/√2, the first crossing going outward from 1 kHz, found to
 * 0.1 % by root-finding on the response itself. No crossing inside CORNER_LOWEST_HZ … CORNER_HIGHEST_HZ gives null.
 *
 * Two ways to the same crossing:
 * - the search (`findCorner`): outward from 1 kHz the response is sampled on a log grid of
 *   CORNER_SEARCH_POINTS_PER_DECADE points per decade until it first falls below the target; the bracket is then
 *   bisected in log-frequency, re-solving the circuit at each trial, until its ends differ by less than
 *   CORNER_RELATIVE_TOLERANCE;
 * - from a sweep the caller already has (`findCornerFromSweep`): the sweep's own points, walked outward from
 *   1 kHz, give the first crossing interval when they are at least as close together as the search grid; Brent's
 *   method on ln(|H|/target) then finds the root inside it to the same tolerance in a handful of solves instead
 *   of a grid walk and a dozen bisections. Where the sweep stops short or leaves a wider gap, the search takes
 *   over from the last sweep point still above the target.
 */
export const REFERENCE_FREQUENCY_HZ = 1000;
export const CORNER_LOWEST_HZ = 0.1;
export const CORNER_HIGHEST_HZ = 1e6;
export const CORNER_SEARCH_POINTS_PER_DECADE = 20;
/** bracket width at which the bisection stops: 0.01 %, ten times tighter than the 0.1 % the contract asks */
export const CORNER_RELATIVE_TOLERANCE = 1e-4;

/** One search-grid step as a frequency ratio. */
const SEARCH_STEP_RATIO = 10 ** (1 / CORNER_SEARCH_POINTS_PER_DECADE);
/**
 * Slack on that ratio when judging a sweep's spacing: a 20-per-decade sweep's points, computed as powers of ten,
 * differ from exact ratios by rounding and must still count as fine enough.
 */
const SWEEP_SPACING_SLACK = 1e-9;
/** Brent's stopping half-width in ln f: the root is then within CORNER_RELATIVE_TOLERANCE/2, as the bisection's. */
const BRENT_TOLERANCE = CORNER_RELATIVE_TOLERANCE / 2;
/** Iteration cap for Brent's method: it needs ~10 on the worst smooth bracket, bisection alone ~12. */
const BRENT_MAX_ITERATIONS = 100;
/** |H|² outside this range has lost precision to under- or overflow; Math.hypot judges those samples instead. */
const SMALLEST_SAFE_MAGNITUDE2 = 1e-300;
const LARGEST_SAFE_MAGNITUDE2 = 1e300;
/** Floor under |H| before the logarithm: a response of exactly 0 (a perfect null) stays finite for the interpolation. */
const SMALLEST_MAGNITUDE = Number.MIN_VALUE;

/**
 * First frequency going from `from` (1 kHz by default, or a point already known to be above the target) towards
 * `limit` where magnitude(f) crosses `target` (from above), or null. `magnitude` re-solves the circuit at its
 * argument.
 */
export function findCorner(
  magnitude: (f: number) => number,
  target: number,
  limit: number,
  from = REFERENCE_FREQUENCY_HZ,
): number | null {
  if (!(target > 0) || !Number.isFinite(target)) return null;
  const direction = limit < REFERENCE_FREQUENCY_HZ ? -1 : 1;
  const ratio = SEARCH_STEP_RATIO ** direction;
  let inside = from;
  if (inside === limit) return null;
  while (true) {
    let outside = inside * ratio;
    const beyond = direction < 0 ? outside <= limit : outside >= limit;
    if (beyond) outside = limit;
    const m = magnitude(outside);
    if (m < target) return bisect(magnitude, target, inside, outside);
    if (beyond) return null;
    inside = outside;
  }
}

function bisect(magnitude: (f: number) => number, target: number, inside: number, outside: number): number {
  let a = inside; // |H| ≥ target
  let b = outside; // |H| < target
  while (Math.abs(b / a - 1) > CORNER_RELATIVE_TOLERANCE) {
    const mid = Math.sqrt(a * b);
    if (magnitude(mid) >= target) a = mid;
    else b = mid;
  }
  return Math.sqrt(a * b);
}

/** A response already solved at some frequencies (an AC sweep of the same model, drive and pressure). */
export interface ResponseSamples {
  frequency: ArrayLike<number>;
  re: ArrayLike<number>;
  im: ArrayLike<number>;
}

/**
 * The corner `findCorner` looks for, bracketed from `sweep` where the sweep can (see the file comment) and
 * refined by Brent's method on the real response; `magnitude` re-solves the circuit for the refinement.
 */
export function findCornerFromSweep(
  magnitude: (f: number) => number,
  target: number,
  limit: number,
  sweep: ResponseSamples,
): number | null {
  if (!(target > 0) || !Number.isFinite(target)) return null;
  const direction = limit < REFERENCE_FREQUENCY_HZ ? -1 : 1;
  const frequency = sweep.frequency;
  const widest = SEARCH_STEP_RATIO * (1 + SWEEP_SPACING_SLACK);
  const target2 = target * target;
  let inside = REFERENCE_FREQUENCY_HZ;
  // |H(1 kHz)|² is 2·target² by the definition of the target; only Brent's interpolation reads it.
  let insideMagnitude2 = 2 * target2;
  const order = isAscending(frequency) ? null : sortedOrder(frequency, direction);
  let i = order ? 0 : firstBeyondReference(frequency, direction);
  const step = order ? 1 : direction;
  for (; i >= 0 && i < frequency.length; i += step) {
    const at = order ? order[i] : i;
    const f = frequency[at];
    if (f === REFERENCE_FREQUENCY_HZ) continue;
    if (direction > 0 ? f > limit : f < limit) break;
    if ((direction > 0 ? f / inside : inside / f) > widest) break;
    // The same judgement as the search's `m < target`; |H|² where it is exact, Math.hypot where it would
    // under- or overflow. Only the bracket's ends are read from the sweep, never the result.
    const re = sweep.re[at];
    const im = sweep.im[at];
    const m2 = re * re + im * im;
    const below =
      m2 > SMALLEST_SAFE_MAGNITUDE2 && m2 < LARGEST_SAFE_MAGNITUDE2 && target2 > SMALLEST_SAFE_MAGNITUDE2
        ? m2 < target2
        : Math.hypot(re, im) < target;
    if (below) return brent(magnitude, target, inside, Math.sqrt(insideMagnitude2), f, Math.hypot(re, im));
    inside = f;
    insideMagnitude2 = m2;
  }
  return findCorner(magnitude, target, limit, inside);
}

function isAscending(frequency: ArrayLike<number>): boolean {
  for (let i = 1; i < frequency.length; i++) if (!(frequency[i] > frequency[i - 1])) return false;
  return true;
}

/** In an ascending sweep, where the outward walk starts in `direction` (an index that may be out of range). */
function firstBeyondReference(frequency: ArrayLike<number>, direction: number): number {
  let i = 0;
  while (i < frequency.length && frequency[i] <= REFERENCE_FREQUENCY_HZ) i++;
  // Going down, start at the last point at or below 1 kHz (the walk skips 1 kHz itself).
  return direction > 0 ? i : i - 1;
}

/** Indices of an unsorted sweep's frequencies beyond 1 kHz in `direction`, nearest first. */
function sortedOrder(frequency: ArrayLike<number>, direction: number): number[] {
  const order: number[] = [];
  for (let i = 0; i < frequency.length; i++) {
    if (direction > 0 ? frequency[i] > REFERENCE_FREQUENCY_HZ : frequency[i] < REFERENCE_FREQUENCY_HZ) order.push(i);
  }
  return order.sort((a, b) => direction * (frequency[a] - frequency[b]));
}

/**
 * Brent's method (inverse quadratic interpolation, secant and bisection, Brent 1973) for the root of
 * g(u) = ln(|H(e^u)|/target) between u = ln inside (g ≥ 0) and u = ln outside (g < 0). In ln f a corner's
 * response is close to straight, so the interpolation converges in a few solves. It stops when the bracket's
 * half-width is within BRENT_TOLERANCE, so the returned frequency is within that ratio of a crossing.
 */
function brent(
  magnitude: (f: number) => number,
  target: number,
  inside: number,
  insideMagnitude: number,
  outside: number,
  outsideMagnitude: number,
): number {
  const level = (m: number) => {
    // NaN counts as above the target, as `m < target` judges it in the search.
    if (!(m < target)) return Number.isFinite(m) ? Math.log(m / target) : Math.log(Number.MAX_VALUE / target);
    return Math.log(Math.max(m, SMALLEST_MAGNITUDE) / target);
  };
  const g = (u: number) => level(magnitude(Math.exp(u)));
  // The ends' magnitudes are the samples that bracketed the crossing: no re-solve for them.
  let a = Math.log(inside);
  let b = Math.log(outside);
  let fa = level(insideMagnitude);
  let fb = level(outsideMagnitude);
  let c = a;
  let fc = fa;
  let d = b - a;
  let e = d;
  for (let iteration = 0; iteration < BRENT_MAX_ITERATIONS; iteration++) {
    if (Math.abs(fc) < Math.abs(fb)) {
      a = b;
      b = c;
      c = a;
      fa = fb;
      fb = fc;
      fc = fa;
    }
    const tol1 = 2 * Number.EPSILON * Math.abs(b) + BRENT_TOLERANCE / 2;
    const xm = (c - b) / 2;
    if (Math.abs(xm) <= tol1 || fb === 0) return Math.exp(b);
    if (Math.abs(e) >= tol1 && Math.abs(fa) > Math.abs(fb)) {
      const s = fb / fa;
      let p: number;
      let q: number;
      if (a === c) {
        p = 2 * xm * s;
        q = 1 - s;
      } else {
        const qa = fa / fc;
        const r = fb / fc;
        p = s * (2 * xm * qa * (qa - r) - (b - a) * (r - 1));
        q = (qa - 1) * (r - 1) * (s - 1);
      }
      if (p > 0) q = -q;
      else p = -p;
      if (2 * p < Math.min(3 * xm * q - Math.abs(tol1 * q), Math.abs(e * q))) {
        e = d;
        d = p / q;
      } else {
        d = xm;
        e = d;
      }
    } else {
      d = xm;
      e = d;
    }
    a = b;
    fa = fb;
    b += Math.abs(d) > tol1 ? d : xm > 0 ? tol1 : -tol1;
    fb = g(b);
    if (fb > 0 === fc > 0) {
      c = a;
      fc = fa;
      d = b - a;
      e = d;
    }
  }
  return Math.exp((b + c) / 2);
}
