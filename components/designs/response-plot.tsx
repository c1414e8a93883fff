import { niceAxis } from "@/components/report/plot-geometry";
import type { AcResult } from "@/sim";

/** Drawing box of the plot in SVG units; the SVG scales to its container's width. */
// 520 wide keeps the 13-unit labels readable both at a phone's ~340 px and a desktop column's ~700 px; the figure is
// kept to 720 px, so in a wider column (a bench link's page) the labels do not grow past about 18 px
const W = 520;
const H = 250;
// right leaves half a "100k" label beside the last decade line; top keeps the unit clear of the highest tick label
const PAD = { left: 44, right: 22, top: 26, bottom: 34 };
const DECADES = [1, 10, 100, 1e3, 1e4, 1e5, 1e6];

/** Phase ticks in the steps a phase plot is read in (degrees). */
const PHASE_STEPS = [15, 30, 45, 90, 180];

const hz = (f: number) => (f >= 1000 ? `${f / 1000}k` : String(f));

/**
 * The small-signal response as a line on log-frequency axes: magnitude in dB or phase in degrees, over the whole run
 * or the frequency range a bench link's view asks for. A server-rendered SVG, so the read-only pages work without
 * scripts.
 */
export function ResponsePlot({
  ac,
  quantity = "magnitude",
  fromHz,
  toHz,
  label,
}: {
  ac: AcResult;
  quantity?: "magnitude" | "phase";
  fromHz?: number;
  toHz?: number;
  label: string;
}) {
  const values = quantity === "magnitude" ? ac.magnitude_db : ac.phase_deg;
  const points = ac.frequency
    .map((f, i) => ({ f, v: values[i] }))
    .filter(
      (p) => Number.isFinite(p.v) && (fromHz === undefined || p.f >= fromHz) && (toHz === undefined || p.f <= toHz),
    );
  if (points.length < 2) return <p className="text-sm text-ink-soft">No response points in this frequency range.</p>;
  const f0 = Math.log10(points[0].f);
  const f1 = Math.log10(points[points.length - 1].f);
  let lo = Math.min(...points.map((p) => p.v));
  let hi = Math.max(...points.map((p) => p.v));
  if (hi - lo < 6) [lo, hi] = [lo - 3, hi + 3];
  // round ticks, as in the sign-off report's plots
  const axis = niceAxis(lo, hi, quantity === "phase" ? PHASE_STEPS : undefined);
  [lo, hi] = [axis.lo, axis.hi];
  const x = (f: number) => PAD.left + ((Math.log10(f) - f0) / (f1 - f0 || 1)) * (W - PAD.left - PAD.right);
  const y = (v: number) => PAD.top + ((hi - v) / (hi - lo)) * (H - PAD.top - PAD.bottom);
  const path = points.map((p, i) => `${i ? "L" : "M"}${x(p.f).toFixed(1)},${y(p.v).toFixed(1)}`).join("");
  const unit = quantity === "magnitude" ? "dB" : "°";
  const ticks = axis.ticks;
  return (
    <figure className="max-w-[720px] rounded-md border border-rule bg-paper p-2">
      <svg viewBox={`0 0 ${W} ${H}`} className="h-auto w-full" role="img" aria-label={label}>
        <rect
          x={PAD.left}
          y={PAD.top}
          width={W - PAD.left - PAD.right}
          height={H - PAD.top - PAD.bottom}
          className="fill-paper-deep/40"
        />
        {DECADES.filter((d) => Math.log10(d) >= f0 - 1e-9 && Math.log10(d) <= f1 + 1e-9).map((d) => (
          <g key={d}>
            <line x1={x(d)} x2={x(d)} y1={PAD.top} y2={H - PAD.bottom} className="stroke-rule" strokeWidth={1} />
            <text x={x(d)} y={H - PAD.bottom + 16} textAnchor="middle" className="fill-ink-soft font-mono text-[13px]">
              {hz(d)}
            </text>
          </g>
        ))}
        {ticks.map((t) => (
          <g key={t}>
            <line
              x1={PAD.left}
              x2={W - PAD.right}
              y1={y(t)}
              y2={y(t)}
              className="stroke-rule"
              strokeWidth={1}
              strokeDasharray="2 3"
            />
            <text x={PAD.left - 6} y={y(t) + 4} textAnchor="end" className="fill-ink-soft font-mono text-[13px]">
              {String(t).replace("-", "−")}
            </text>
          </g>
        ))}
        <path d={path} fill="none" className="stroke-trace" strokeWidth={2} />
        <text x={W - PAD.right} y={H - 2} textAnchor="end" className="fill-ink-soft text-[12px]">
          Hz
        </text>
        <text x={2} y={PAD.top - 12} className="fill-ink-soft text-[12px]">
          {unit}
        </text>
      </svg>
      <figcaption className="px-1 pt-1 text-xs text-ink-soft">{label}</figcaption>
    </figure>
  );
}
