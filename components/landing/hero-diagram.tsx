/**
 * The landing page's illustration: a capsule with its bias resistor feeding a JFET follower, and the response it
 * gives — drawn by hand for Backplate, not a screenshot of anything.
 */
export function HeroDiagram() {
  // A gentle response: a low corner near 20 Hz, flat mid-band, a capsule resonance bump and roll-off.
  const curve = Array.from({ length: 61 }, (_, i) => {
    const logF = 1 + (i / 60) * 3.3; // 10 Hz … 20 kHz
    const f = 10 ** logF;
    const low = 1 / Math.sqrt(1 + (20 / f) ** 2);
    const r = f / 9000;
    const res = 1 / Math.sqrt((1 - r * r) ** 2 + (r / 1.6) ** 2);
    const db = 20 * Math.log10(low * res);
    const x = 20 + (i / 60) * 300;
    const y = 70 - db * 4.5;
    return `${i === 0 ? "M" : "L"}${x.toFixed(1)},${y.toFixed(1)}`;
  }).join(" ");

  return (
    <figure className="grid-paper relative overflow-hidden rounded-lg border border-rule bg-paper shadow-[0_1px_0_var(--color-rule)]">
      <svg viewBox="0 0 340 320" className="h-auto w-full" role="img" aria-labelledby="hero-diagram-title">
        <title id="hero-diagram-title">A capsule and bias resistor driving a JFET follower, with its frequency response</title>
        <g stroke="var(--color-ink)" strokeWidth="1.6" fill="none" strokeLinecap="round">
          {/* polarisation rail and bias resistor */}
          <path d="M40 28 H110" />
          <path d="M75 28 V40 l6 3 -12 6 12 6 -12 6 12 6 -6 3 V84" />
          {/* capsule: two plates */}
          <path d="M75 84 V96 M58 96 H92 M58 104 H92 M75 104 V122" />
          <path d="M60 122 H90 M65 127 H85 M70 132 H80" />
          {/* coupling to the gate */}
          <path d="M75 90 H130" />
          {/* JFET */}
          <path d="M130 90 H146 M146 74 V106 M146 78 H166 V60 M146 102 H166 V140" />
          <path d="M156 98 l10 4 -10 4" fill="var(--color-ink)" />
          <path d="M166 60 V28 H110" />
          {/* source resistor to ground */}
          <path d="M166 140 V148 l6 3 -12 6 12 6 -12 6 12 6 -6 3 V196 M151 196 H181 M156 201 H176 M161 206 H171" />
          {/* output */}
          <path d="M166 140 H210" />
          <circle cx="214" cy="140" r="4" fill="var(--color-brass)" stroke="var(--color-brass-deep)" />
        </g>
        <g fontFamily="var(--font-mono)" fontSize="9" fill="var(--color-ink-soft)">
          <text x="84" y="56">1G</text>
          <text x="96" y="102">capsule</text>
          <text x="176" y="96">J1</text>
          <text x="176" y="172">Rs</text>
          <text x="222" y="143">out</text>
          <text x="42" y="22">+pol</text>
        </g>
        <g transform="translate(0,226)">
          <rect x="20" y="0" width="300" height="82" fill="var(--color-paper)" opacity="0.85" />
          <path d="M20 70 H320 M20 0 V82" stroke="var(--color-rule)" strokeWidth="1" />
          <path d={curve} stroke="var(--color-trace)" strokeWidth="2.2" fill="none" transform="translate(0,-40)" />
          <text x="24" y="78" fontFamily="var(--font-mono)" fontSize="8" fill="var(--color-ink-soft)">
            10 Hz
          </text>
          <text x="290" y="78" fontFamily="var(--font-mono)" fontSize="8" fill="var(--color-ink-soft)">
            20 kHz
          </text>
        </g>
      </svg>
    </figure>
  );
}
