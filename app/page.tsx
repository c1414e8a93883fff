import Link from "next/link";
import { HeroDiagram } from "@/components/landing/hero-diagram";

const BENCH_STEPS = [
  {
    title: "Capsule and bias",
    text: "Capsule capacitance and polarisation, the gigaohm bias network, electret or externally polarised.",
  },
  {
    title: "Impedance converter",
    text: "JFET, valve or bipolar follower with its operating point, region and small-signal values shown as you edit.",
  },
  {
    title: "Output and destination",
    text: "Transformer or transformerless output, phantom powering, then the cable and the console input it must drive.",
  },
];

const FIGURES = [
  { name: "Sensitivity", unit: "mV/Pa · dB re 1 V/Pa", note: "open-circuit, at 1 kHz, into the chosen load" },
  { name: "Self-noise", unit: "dB(A) SPL", note: "A-weighted per IEC 61672-1, referred through the sensitivity" },
  { name: "Corners", unit: "Hz", note: "−3 dB low and high, found on the response itself" },
  { name: "Output impedance", unit: "Ω", note: "at 1 kHz, every drive off" },
  { name: "Polarity", unit: "in / inverting", note: "a positive pressure against the output's sign" },
  { name: "Spread", unit: "mean · σ · 5–95 %", note: "Monte Carlo over each part's tolerance" },
];

const REVIEW_POINTS = [
  "Every save is a revision nobody can silently overwrite.",
  "Reviewers remark on a part, a net, a frequency range or a figure, then decide.",
  "Measurements from the bench are laid over the simulation, with the deviation in a band.",
  "A bench link opens one revision read-only with its live simulation.",
];

export default function LandingPage() {
  return (
    <>
      <section className="border-b border-rule">
        <div className="mx-auto grid max-w-6xl items-center gap-10 px-4 py-12 sm:px-6 md:grid-cols-[1.1fr_1fr] md:py-20">
          <div>
            <p className="mb-3 font-mono text-xs uppercase tracking-[0.2em] text-brass-deep">
              Condenser-microphone electronics
            </p>
            <h1 className="text-4xl font-bold leading-[1.05] text-ink sm:text-5xl">
              Sign off the front end before you solder it.
            </h1>
            <p className="mt-5 max-w-xl text-lg text-ink-soft">
              Draw the capsule, bias network, impedance converter and output stage on the bench. Backplate solves it in
              your browser and gives the figures a design is signed off on: response into real loads, sensitivity,
              self-noise in dB(A), output impedance, polarity and tolerance spread.
            </p>
            <div className="mt-8 flex flex-wrap gap-3">
              <Link
                href="/#bench"
                className="rounded-md bg-ink px-5 py-2.5 font-medium text-paper hover:bg-graphite"
              >
                How the bench works
              </Link>
              <Link
                href="/#figures"
                className="rounded-md border border-ink px-5 py-2.5 font-medium text-ink hover:bg-paper-deep"
              >
                The figures you get
              </Link>
            </div>
          </div>
          <HeroDiagram />
        </div>
      </section>

      <section id="bench" className="mx-auto max-w-6xl scroll-mt-20 px-4 py-14 sm:px-6">
        <h2 className="text-2xl font-bold sm:text-3xl">Draw it on the bench</h2>
        <p className="mt-2 max-w-2xl text-ink-soft">
          Parts from the tray, wires between pins, values typed the way they are printed — 4k7, 2n2, 1G, 50 pF — and the
          solver answers while you type.
        </p>
        <ol className="mt-8 grid gap-4 md:grid-cols-3">
          {BENCH_STEPS.map((step, index) => (
            <li key={step.title} className="rounded-lg border border-rule bg-paper p-5">
              <span className="font-mono text-sm text-brass-deep">0{index + 1}</span>
              <h3 className="mt-1 text-lg font-bold">{step.title}</h3>
              <p className="mt-2 text-ink-soft">{step.text}</p>
            </li>
          ))}
        </ol>
      </section>

      <section id="figures" className="scroll-mt-20 border-y border-rule bg-paper-deep">
        <div className="mx-auto max-w-6xl px-4 py-14 sm:px-6">
          <h2 className="text-2xl font-bold sm:text-3xl">The figures you sign off</h2>
          <dl className="mt-8 grid gap-px overflow-hidden rounded-lg border border-rule bg-rule sm:grid-cols-2 lg:grid-cols-3">
            {FIGURES.map((figure) => (
              <div key={figure.name} className="bg-paper p-5">
                <dt className="font-display text-lg font-bold">{figure.name}</dt>
                <dd className="mt-1 font-mono text-sm text-trace">{figure.unit}</dd>
                <dd className="mt-2 text-sm text-ink-soft">{figure.note}</dd>
              </div>
            ))}
          </dl>
          <div className="mt-10 rounded-lg bg-ink p-5 text-paper">
            <p className="text-sm text-paper/70">The same solver runs headless, for test and production pipelines:</p>
            <pre className="mt-2 overflow-x-auto font-mono text-sm text-brass-light">
              <code>npm run --silent sim -- design.json --variant pad</code>
            </pre>
          </div>
        </div>
      </section>

      <section id="reviews" className="mx-auto max-w-6xl scroll-mt-20 px-4 py-14 sm:px-6">
        <h2 className="text-2xl font-bold sm:text-3xl">Review on real circuits</h2>
        <p className="mt-2 max-w-2xl text-ink-soft">
          Seniors teach on the designs the team actually builds; juniors read along with a viewer's seat.
        </p>
        <ul className="mt-6 grid gap-3 sm:grid-cols-2">
          {REVIEW_POINTS.map((point) => (
            <li key={point} className="flex gap-3 rounded-md border border-rule p-4">
              <span aria-hidden="true" className="mt-1.5 h-2 w-2 shrink-0 rounded-full bg-trace" />
              <span>{point}</span>
            </li>
          ))}
        </ul>
      </section>

      <section id="safety" className="mx-auto max-w-6xl scroll-mt-20 px-4 pb-16 sm:px-6">
        <div className="rounded-lg border-l-4 border-caution bg-caution-bg p-5" role="note" aria-label="Safety caution">
          <h2 className="text-lg font-bold text-caution">Caution: lethal voltages</h2>
          <p className="mt-2 text-ink">
            Valve supplies of hundreds of volts and polarisation supplies can kill. Capacitors hold charge after power is
            removed and can recover charge after discharge; phantom power can damage equipment and hearing when
            hot-plugged. A simulation is not a safety assessment: work to your local electrical codes and qualified
            practice.
          </p>
        </div>
      </section>
    </>
  );
}
