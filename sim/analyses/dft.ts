/**
 * Harmonic analysis by a discrete Fourier transform over a whole number of periods (no window, no leakage: the
 * record holds exactly `periods` periods of the fundamental at uniform spacing, so every harmonic falls on a DFT
 * bin). Textbook DFT: for N samples x_n over P periods, the k-th harmonic is bin kP,
 *   X_k = (2/N)·Σ x_n·e^{−j2π·kP·n/N},  its peak amplitude |X_k|.
 * Also the resampling that makes such a record from a non-uniform one, and the distortion figures.
 */

/** dB floor of a harmonic level relative to the fundamental (contract: ≤ 0, floor −200 dB). */
export const HARMONIC_FLOOR_DB = -200;
/** Harmonics 2 … MAX_HARMONIC are reported. */
export const MAX_HARMONIC = 10;

/**
 * Peak amplitudes of harmonics 0 … maxHarmonic (index k; index 0 is the mean, not doubled) of `samples`, which
 * cover exactly `periods` whole periods at uniform spacing (the first sample at the start of a period, the
 * sample one period later excluded).
 */
export function harmonicAmplitudes(samples: ArrayLike<number>, periods: number, maxHarmonic: number): number[] {
  const n = samples.length;
  const out: number[] = [];
  for (let k = 0; k <= maxHarmonic; k++) {
    const bin = k * periods;
    if (2 * bin >= n && k > 0) {
      out.push(Number.NaN);
      continue;
    }
    let re = 0;
    let im = 0;
    const step = (2 * Math.PI * bin) / n;
    for (let i = 0; i < n; i++) {
      const a = step * i;
      re += samples[i] * Math.cos(a);
      im -= samples[i] * Math.sin(a);
    }
    const scale = k === 0 ? 1 / n : 2 / n;
    out.push(Math.hypot(re, im) * scale);
  }
  return out;
}

/**
 * Cubic (four-point Lagrange) interpolation of (times, values) at `count` uniform points t0 + i·span/count,
 * i = 0 … count (both ends, count + 1 points). Times ascending; a requested time equal to a sample time gives that
 * sample exactly.
 */
export function resampleUniform(
  times: ArrayLike<number>,
  values: ArrayLike<number>,
  t0: number,
  span: number,
  count: number,
): Float64Array {
  const out = new Float64Array(count + 1);
  const m = times.length;
  let j = 0;
  for (let i = 0; i <= count; i++) {
    const t = t0 + (span * i) / count;
    while (j < m - 2 && times[j + 1] <= t) j++;
    if (times[j] === t) {
      out[i] = values[j];
      continue;
    }
    if (j + 1 < m && times[j + 1] === t) {
      out[i] = values[j + 1];
      continue;
    }
    const s = Math.min(Math.max(j - 1, 0), Math.max(m - 4, 0));
    const e = Math.min(s + 4, m);
    let sum = 0;
    for (let a = s; a < e; a++) {
      let weight = 1;
      for (let b = s; b < e; b++) if (b !== a) weight *= (t - times[b]) / (times[a] - times[b]);
      sum += weight * values[a];
    }
    out[i] = sum;
  }
  return out;
}

export interface DistortionFigures {
  /** peak amplitude of the fundamental, in the samples' unit */
  fundamental: number;
  /** harmonics 2 … 10 relative to the fundamental, dB (≤ 0 when smaller, floored at HARMONIC_FLOOR_DB) */
  harmonics_db: number[];
  /** √(Σ H_k²)/H_1 over k = 2 … 10, % */
  thd_percent: number;
}

/**
 * Distortion of a record of `periods` whole periods given as count + 1 samples (both ends): the linear drift
 * between the two ends (a bias network still settling) is removed first, so it does not leak into the harmonics,
 * then the last sample is dropped and the DFT taken.
 */
export function distortionOf(record: ArrayLike<number>, periods: number): DistortionFigures {
  const count = record.length - 1;
  const drift = (record[count] - record[0]) / count;
  const samples = new Float64Array(count);
  for (let i = 0; i < count; i++) samples[i] = record[i] - drift * i;
  const h = harmonicAmplitudes(samples, periods, MAX_HARMONIC);
  const fundamental = h[1];
  let power = 0;
  const harmonics_db: number[] = [];
  for (let k = 2; k <= MAX_HARMONIC; k++) {
    const a = Number.isFinite(h[k]) ? h[k] : 0;
    power += a * a;
    const db = fundamental > 0 && a > 0 ? 20 * Math.log10(a / fundamental) : HARMONIC_FLOOR_DB;
    harmonics_db.push(Math.max(HARMONIC_FLOOR_DB, db));
  }
  const thd_percent = fundamental > 0 ? (100 * Math.sqrt(power)) / fundamental : 0;
  return { fundamental, harmonics_db, thd_percent };
}
