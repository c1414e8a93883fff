/**
 * Measurement against simulation, as pure functions (also used by the sign-off report):
 * - the simulation is interpolated onto the measured frequencies, linearly in dB against log10(f) (the Bode plot's
 *   own axis, so a straight asymptote stays straight); measured points outside the simulated range are left out;
 * - the measurement is shifted by one level offset so both agree at the alignment frequency (1 kHz by default):
 *   a measurement's absolute level depends on the rig (drive level, preamp gain), its shape is what is compared;
 * - difference = aligned measurement − simulation, dB;
 * - the largest |difference| inside a chosen band [f1, f2] (inclusive), with the frequency where it occurs.
 */

export interface Curve {
  frequency: readonly number[];
  level_db: readonly number[];
}

/** Frequency the measurement is aligned at unless another is chosen, Hz. */
export const DEFAULT_ALIGN_HZ = 1000;

/** y(f) on a log-f axis, linear between neighbours; NaN outside [f0, fN] (never extrapolated). `x` ascending. */
export function interpolateLogF(x: readonly number[], y: readonly number[], f: number): number {
  const n = x.length;
  if (n === 0 || !(f > 0) || f < x[0] || f > x[n - 1]) return Number.NaN;
  let lo = 0;
  let hi = n - 1;
  while (hi - lo > 1) {
    const mid = (lo + hi) >> 1;
    if (x[mid] <= f) lo = mid;
    else hi = mid;
  }
  if (x[lo] === f || lo === hi) return y[lo];
  const t = (Math.log10(f) - Math.log10(x[lo])) / (Math.log10(x[hi]) - Math.log10(x[lo]));
  return y[lo] + t * (y[hi] - y[lo]);
}

/** dB to add to the measurement so it meets the simulation at `alignHz`; null when either curve misses it. */
export function levelOffset(simulated: Curve, measured: Curve, alignHz = DEFAULT_ALIGN_HZ): number | null {
  const s = interpolateLogF(simulated.frequency, simulated.level_db, alignHz);
  const m = interpolateLogF(measured.frequency, measured.level_db, alignHz);
  return Number.isFinite(s) && Number.isFinite(m) ? s - m : null;
}

export interface Deviation {
  frequency: number;
  /** signed aligned measurement − simulation at that frequency, dB */
  deviation_db: number;
}

/** The point of largest |difference| with f1 ≤ f ≤ f2; null when no compared point falls in the band. */
export function maxDeviation(frequency: readonly number[], difference: readonly number[], f1: number, f2: number): Deviation | null {
  const lo = Math.min(f1, f2);
  const hi = Math.max(f1, f2);
  let best: Deviation | null = null;
  frequency.forEach((f, i) => {
    const d = difference[i];
    if (f < lo || f > hi || !Number.isFinite(d)) return;
    if (!best || Math.abs(d) > Math.abs(best.deviation_db)) best = { frequency: f, deviation_db: d };
  });
  return best;
}

export interface Comparison {
  alignHz: number;
  offset_db: number;
  /** measured frequencies inside the simulated range, Hz */
  frequency: number[];
  measured_aligned_db: number[];
  simulated_db: number[];
  difference_db: number[];
  band: { fromHz: number; toHz: number };
  max: Deviation | null;
}

export type ComparisonResult = { ok: true; comparison: Comparison } | { ok: false; message: string };

export function compareMeasurement(
  simulated: Curve,
  measured: Curve,
  options: { alignHz?: number; fromHz: number; toHz: number },
): ComparisonResult {
  const alignHz = options.alignHz ?? DEFAULT_ALIGN_HZ;
  const offset = levelOffset(simulated, measured, alignHz);
  if (offset === null) {
    return {
      ok: false,
      message: `Both curves must cover ${alignHz} Hz to be aligned there. Choose an alignment frequency inside both.`,
    };
  }
  const frequency: number[] = [];
  const measuredAligned: number[] = [];
  const sim: number[] = [];
  const difference: number[] = [];
  measured.frequency.forEach((f, i) => {
    const s = interpolateLogF(simulated.frequency, simulated.level_db, f);
    if (!Number.isFinite(s)) return;
    const m = measured.level_db[i] + offset;
    frequency.push(f);
    measuredAligned.push(m);
    sim.push(s);
    difference.push(m - s);
  });
  return {
    ok: true,
    comparison: {
      alignHz,
      offset_db: offset,
      frequency,
      measured_aligned_db: measuredAligned,
      simulated_db: sim,
      difference_db: difference,
      band: { fromHz: Math.min(options.fromHz, options.toHz), toHz: Math.max(options.fromHz, options.toHz) },
      max: maxDeviation(frequency, difference, options.fromHz, options.toHz),
    },
  };
}
