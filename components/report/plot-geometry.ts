/**
 * Plots for the sign-off report as vector paths (pure): series on a log-frequency axis with a linear or log y axis,
 * fitted into a box, with decade ticks. The PDF (react-pdf's Svg) and the report page (plain svg) draw the same
 * geometry, so the two never disagree.
 */

export interface PlotSeries {
  label: string;
  colour: string;
  frequency: readonly number[];
  values: readonly number[];
  dashed?: boolean;
}

export interface PlotBox {
  width: number;
  height: number;
  yLog?: boolean;
  /** y axis unit for the tick labels */
  yUnit: string;
}

export interface PlotGeometry {
  width: number;
  height: number;
  frame: { x: number; y: number; width: number; height: number };
  paths: { d: string; colour: string; dashed: boolean; label: string }[];
  xTicks: { x: number; label: string }[];
  yTicks: { y: number; label: string }[];
  yUnit: string;
}

export const PLOT_MARGIN = { left: 46, right: 10, top: 8, bottom: 24 };

function niceStep(span: number): number {
  const raw = span / 5;
  const p = 10 ** Math.floor(Math.log10(raw));
  for (const m of [1, 2, 5, 10]) if (m * p >= raw) return m * p;
  return 10 * p;
}

/**
 * A linear axis from `lo` to `hi` widened to whole steps of 1, 2 or 5 × a power of ten (about five of them), so
 * the ticks read as round numbers (common practice for chart axes): −76…−38 dB becomes −80…−30 in steps of 10.
 */
export function niceAxis(
  lo: number,
  hi: number,
  /** steps to choose from instead of the 1-2-5 sequence (phase reads in 45° and 90°): the smallest giving ≤ 5 intervals */
  steps?: readonly number[],
): { lo: number; hi: number; step: number; ticks: number[] } {
  const span = hi - lo || 1;
  const step = steps?.find((s) => span / s <= 5) ?? niceStep(span);
  const from = Math.floor(lo / step) * step;
  const to = Math.ceil(hi / step) * step;
  const ticks: number[] = [];
  for (let v = from; v <= to + step / 1000; v += step) ticks.push(Number(v.toFixed(6)));
  return { lo: from, hi: to, step, ticks };
}

const hzLabel = (hz: number) => (hz >= 1000 ? `${hz / 1000}k` : String(hz));
const siLabel = (v: number) => {
  const e = Math.floor(Math.log10(v));
  const prefixes: Record<number, string> = { [-9]: "n", [-6]: "µ", [-3]: "m", 0: "", 3: "k", 6: "M" };
  const base = Math.floor(e / 3) * 3;
  const prefix = prefixes[base];
  return prefix === undefined ? v.toExponential(0) : `${Number((v / 10 ** base).toPrecision(2))}${prefix}`;
};

/** A log axis (values are decades) widened to whole decades, one tick each. */
function niceLogAxis(lo: number, hi: number) {
  const from = Math.floor(lo);
  const to = Math.ceil(hi);
  return { lo: from, hi: to, step: 1, ticks: Array.from({ length: to - from + 1 }, (_, i) => from + i) };
}

export function plotGeometry(series: PlotSeries[], box: PlotBox): PlotGeometry | null {
  const frame = {
    x: PLOT_MARGIN.left,
    y: PLOT_MARGIN.top,
    width: box.width - PLOT_MARGIN.left - PLOT_MARGIN.right,
    height: box.height - PLOT_MARGIN.top - PLOT_MARGIN.bottom,
  };
  const fs: number[] = [];
  const ys: number[] = [];
  for (const s of series)
    s.frequency.forEach((f, i) => {
      const v = box.yLog ? Math.log10(s.values[i]) : s.values[i];
      if (f > 0 && Number.isFinite(v)) {
        fs.push(f);
        ys.push(v);
      }
    });
  if (fs.length < 2) return null;
  const lx0 = Math.log10(Math.min(...fs));
  const lx1 = Math.log10(Math.max(...fs));
  let y0 = Math.min(...ys);
  let y1 = Math.max(...ys);
  if (y1 - y0 < (box.yLog ? 1 : 6)) {
    const mid = (y0 + y1) / 2;
    const half = box.yLog ? 0.5 : 3;
    y0 = mid - half;
    y1 = mid + half;
  }
  const axis = box.yLog ? niceLogAxis(y0, y1) : niceAxis(y0, y1);
  y0 = axis.lo;
  y1 = axis.hi;
  const x = (f: number) => frame.x + ((Math.log10(f) - lx0) / (lx1 - lx0 || 1)) * frame.width;
  const y = (v: number) => frame.y + ((y1 - v) / (y1 - y0 || 1)) * frame.height;
  const paths = series.map((s) => {
    let d = "";
    let pen = false;
    s.frequency.forEach((f, i) => {
      const v = box.yLog ? Math.log10(s.values[i]) : s.values[i];
      if (!(f > 0) || !Number.isFinite(v)) {
        pen = false;
        return;
      }
      d += `${pen ? "L" : "M"}${x(f).toFixed(2)} ${y(v).toFixed(2)} `;
      pen = true;
    });
    return { d: d.trim(), colour: s.colour, dashed: Boolean(s.dashed), label: s.label };
  });
  const xTicks = [];
  for (let p = Math.ceil(lx0 - 1e-9); p <= Math.floor(lx1 + 1e-9); p++)
    xTicks.push({ x: x(10 ** p), label: hzLabel(10 ** p) });
  const yTicks = axis.ticks.map((v) => ({ y: y(v), label: box.yLog ? siLabel(10 ** v) : String(v) }));
  return { width: box.width, height: box.height, frame, paths, xTicks, yTicks, yUnit: box.yUnit };
}
