/**
 * A small SVG of the difference curve (measurement − simulation: aligned for a response, as measured for a noise
 * spectrum) on a log-f axis, with the band shaded.
 */
import { niceAxis } from "@/components/report/plot-geometry";
import { PLOT_COLOURS } from "../plots/palette";
import type { Comparison } from "./compare";

const W = 420;
const H = 140;
const PAD = { l: 40, r: 8, t: 8, b: 22 };

export function DifferencePlot({ comparison }: { comparison: Pick<Comparison, "frequency" | "difference_db" | "band"> }) {
  const { frequency: f, difference_db: d, band } = comparison;
  if (f.length < 2) return null;
  const lx0 = Math.log10(f[0]);
  const lx1 = Math.log10(f[f.length - 1]);
  // symmetric about 0 dB, widened to round ticks (the report's axis rule)
  const axis = niceAxis(-Math.max(1, ...d.map(Math.abs)), Math.max(1, ...d.map(Math.abs)));
  const span = Math.max(-axis.lo, axis.hi);
  const x = (hz: number) => PAD.l + ((Math.log10(hz) - lx0) / (lx1 - lx0 || 1)) * (W - PAD.l - PAD.r);
  const y = (db: number) => PAD.t + ((span - db) / (2 * span)) * (H - PAD.t - PAD.b);
  const path = f.map((hz, i) => `${i ? "L" : "M"}${x(hz).toFixed(1)},${y(d[i]).toFixed(1)}`).join("");
  const bx0 = x(Math.max(band.fromHz, f[0]));
  const bx1 = x(Math.min(band.toHz, f[f.length - 1]));
  const decades = [];
  for (let p = Math.ceil(lx0); p <= Math.floor(lx1); p++) decades.push(10 ** p);
  return (
    <svg viewBox={`0 0 ${W} ${H}`} className="w-full max-w-md" role="img" aria-label="Difference, measurement minus simulation, dB">
      {bx1 > bx0 && <rect x={bx0} y={PAD.t} width={bx1 - bx0} height={H - PAD.t - PAD.b} fill={PLOT_COLOURS.traceLight} opacity={0.35} />}
      <line x1={PAD.l} x2={W - PAD.r} y1={y(0)} y2={y(0)} stroke={PLOT_COLOURS.rule} />
      {decades.map((hz) => (
        <g key={hz}>
          <line x1={x(hz)} x2={x(hz)} y1={PAD.t} y2={H - PAD.b} stroke={PLOT_COLOURS.rule} strokeDasharray="2 3" />
          <text x={x(hz)} y={H - 6} fontSize={10} textAnchor="middle" fill={PLOT_COLOURS.inkSoft}>
            {hz >= 1000 ? `${hz / 1000}k` : hz}
          </text>
        </g>
      ))}
      {axis.ticks.map((db) => (
        <g key={db}>
          {db !== 0 && (
            <line x1={PAD.l} x2={W - PAD.r} y1={y(db)} y2={y(db)} stroke={PLOT_COLOURS.rule} strokeDasharray="1 4" />
          )}
          <text x={PAD.l - 4} y={y(db) + 3.5} fontSize={10} textAnchor="end" fill={PLOT_COLOURS.inkSoft}>
            {db > 0 ? `+${db}` : db < 0 ? `−${-db}` : "0 dB"}
          </text>
        </g>
      ))}
      <path d={path} fill="none" stroke="#b27a24" strokeWidth={1.8} />
    </svg>
  );
}
