/**
 * The sign-off report as a page: the same model the PDF draws, in the site's paper-and-brass look. Plots and the
 * circuit picture are the same vector geometry as the PDF, drawn as inline SVG.
 */
import { SymbolPaths } from "@/components/bench/symbols/part-symbol";
import { SYMBOL_STROKE } from "@/components/bench/symbols/symbol-geometry";
import type { PlotGeometry } from "./plot-geometry";
import type { ReportModel } from "./report-model";
import type { SchematicGeometry } from "./schematic-geometry";

function Section({ title, children }: { title: string; children: React.ReactNode }) {
  return (
    <section aria-label={title} className="space-y-2">
      <h2 className="border-b border-rule pb-1 font-display text-lg font-semibold text-ink">{title}</h2>
      {children}
    </section>
  );
}

function Table({ columns, rows, label }: { columns: string[]; rows: string[][]; label: string }) {
  return (
    <div className="overflow-x-auto rounded-md border border-rule">
      <table className="w-full text-left text-sm" aria-label={label}>
        <thead className="bg-paper-deep text-xs uppercase tracking-wide text-ink-soft">
          <tr>{columns.map((c) => <th key={c} className="px-3 py-1.5 font-medium">{c}</th>)}</tr>
        </thead>
        <tbody>
          {rows.map((r, k) => (
            // biome-ignore lint/suspicious/noArrayIndexKey: report rows are static
            <tr key={k} className="border-t border-rule">
              {r.map((cell, i) => (
                // biome-ignore lint/suspicious/noArrayIndexKey: cells are positional
                <td key={i} className="break-words px-3 py-1.5 align-top [overflow-wrap:anywhere]">{cell}</td>
              ))}
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}

function Plot({ g, title }: { g: PlotGeometry; title: string }) {
  return (
    <svg viewBox={`0 0 ${g.width} ${g.height}`} className="w-full" role="img" aria-label={title}>
      <rect x={g.frame.x} y={g.frame.y} width={g.frame.width} height={g.frame.height} fill="#fbf9f3" stroke="#d8cfbd" />
      {g.xTicks.map((t) => (
        <g key={`x${t.label}`}>
          <line x1={t.x} x2={t.x} y1={g.frame.y} y2={g.frame.y + g.frame.height} stroke="#d8cfbd" strokeWidth={0.5} />
          <text x={t.x} y={g.height - 10} fontSize={8} textAnchor="middle" fill="#3c434b">{t.label}</text>
        </g>
      ))}
      {g.yTicks.map((t) => (
        <g key={`y${t.label}`}>
          <line x1={g.frame.x} x2={g.frame.x + g.frame.width} y1={t.y} y2={t.y} stroke="#d8cfbd" strokeWidth={0.5} />
          <text x={g.frame.x - 4} y={t.y + 3} fontSize={8} textAnchor="end" fill="#3c434b">{t.label}</text>
        </g>
      ))}
      {g.paths.map((p) => (
        <path key={p.label} d={p.d} fill="none" stroke={p.colour} strokeWidth={p.dashed ? 1.2 : 1.8} strokeDasharray={p.dashed ? "4 2" : undefined} />
      ))}
      <text x={2} y={g.frame.y + 6} fontSize={8} fill="#3c434b">{g.yUnit}</text>
    </svg>
  );
}

function Schematic({ g }: { g: SchematicGeometry }) {
  const font = { fontSize: g.fontSize, fontFamily: "Helvetica, Arial, sans-serif" };
  return (
    <svg viewBox={`0 0 ${g.width} ${g.height}`} className="w-full max-w-3xl" role="img" aria-label="Circuit drawn from the bench layout">
      <g fill="none" stroke="#15181c" strokeLinecap="round" strokeLinejoin="round">
        {g.wires.map((w, i) => (
          // biome-ignore lint/suspicious/noArrayIndexKey: wires are positional
          <path key={i} d={w.d} strokeWidth={0.9} />
        ))}
        {g.grounds.map((gr, i) => (
          // biome-ignore lint/suspicious/noArrayIndexKey: grounds are positional
          <g key={`g${i}`} transform={gr.transform} strokeWidth={SYMBOL_STROKE} color="#15181c">
            <SymbolPaths strokes={gr.strokes} />
          </g>
        ))}
        {g.parts.map((p) => (
          <g key={p.id} transform={p.transform} strokeWidth={SYMBOL_STROKE} color={p.enabled ? "#15181c" : "#8a8f96"} stroke="currentColor">
            <SymbolPaths strokes={p.strokes} />
          </g>
        ))}
      </g>
      {g.parts.map((p) => (
        <g key={`t${p.id}`} data-part-label={p.id}>
          <rect x={p.plate.x} y={p.plate.y} width={p.plate.width} height={p.plate.height} fill="#fbf9f3" opacity={0.9} />
          <text x={p.name.x} y={p.name.y} {...font} fontWeight={700} textAnchor="middle" fill="#15181c">{p.name.text}</text>
          {p.value ? <text x={p.value.x} y={p.value.y} {...font} textAnchor="middle" fill="#3c434b">{p.value.text}</text> : null}
        </g>
      ))}
      {g.labels.map((l, i) => (
        // biome-ignore lint/suspicious/noArrayIndexKey: labels are positional
        <g key={`l${i}`}>
          <path d={l.flag} fill="#fbf3e3" stroke="#b27a24" strokeWidth={0.8} />
          <text x={l.text.x} y={l.text.y} {...font} fill="#7a5316">{l.text.text}</text>
        </g>
      ))}
    </svg>
  );
}

export function ReportView({ report: r }: { report: ReportModel }) {
  const verdict = r.decisions.at(-1);
  return (
    <article className="space-y-8" data-testid="sign-off-report">
      <header className="space-y-1">
        <p className="text-xs font-semibold uppercase tracking-widest text-brass-deep">Sign-off report</p>
        <h1 className="font-display text-2xl font-bold text-ink sm:text-3xl">{r.title} — r{r.revisionNumber}</h1>
        <p className="text-sm text-ink-soft">
          {r.workspaceName} · saved by {r.authorName}, {r.savedAt} · “{r.revisionMessage}”
        </p>
        <p className="text-sm" data-testid="report-decision">
          Decision: {verdict ? `${verdict.verdict === "approve" ? "Approved" : "Rework"} by ${verdict.reviewer}, ${verdict.at}` : "none yet"}
        </p>
        <p className="text-sm">
          <a href={r.benchUrl} className="underline">Open the bench</a>
        </p>
      </header>
      {r.cautions.length > 0 && (
        <div role="note" className="rounded-md border border-caution/40 bg-caution-bg px-4 py-3 text-sm text-caution">
          <strong>Caution — lethal voltages.</strong> {r.cautions.join(" ")} Capacitors keep their charge after power-off: discharge them before touching. Work to your local codes and qualified practice.
        </div>
      )}
      {r.engineError && <p role="alert" className="text-sm text-caution">The engine could not solve this revision: {r.engineError}</p>}
      <Section title="Circuit">
        {r.schematic ? <Schematic g={r.schematic} /> : <p className="text-sm text-ink-soft">This revision was saved without a bench layout; its parts are listed below.</p>}
      </Section>
      <Section title="Figures">
        <Table label="Figures" columns={["Figure", "Value"]} rows={r.figures.map((f) => [f.label, f.value])} />
        {r.checks.length > 0 ? (
          <Table label="Target checks" columns={["Figure", "Variant", "Value", "Target", "Result"]} rows={r.checks.map((c) => [c.figure, c.variant, c.value, c.range, c.pass ? "pass" : "FAIL"])} />
        ) : (
          <p className="text-sm text-ink-soft">This revision sets no targets.</p>
        )}
      </Section>
      <Section title="Parameters and parts">
        {r.parameters.length > 0 && <Table label="Parameters" columns={["Parameter", "Value"]} rows={r.parameters.map((p) => [p.name, p.value])} />}
        <Table label="Parts" columns={["Part", "Kind", "Values", "Nets"]} rows={r.parts.map((p) => [p.enabled ? p.id : `${p.id} (off)`, p.kind, p.values, p.nets])} />
      </Section>
      <Section title="Plots">
        {r.plots.map((p) => (
          <figure key={p.title} className="space-y-1">
            <figcaption className="text-sm font-semibold">{p.title}</figcaption>
            <Plot g={p.geometry} title={p.title} />
            <ul className="flex flex-wrap gap-x-4 text-xs text-ink-soft">
              {p.legend.map((l) => (
                <li key={l.label} className="flex items-center gap-1">
                  <span className="inline-block h-0.5 w-4" style={{ background: l.colour }} />
                  {l.label}
                  {l.dashed ? " (dashed)" : ""}
                </li>
              ))}
            </ul>
          </figure>
        ))}
      </Section>
      <Section title="Measurements against simulation">
        {r.measurements.length === 0 ? (
          <p className="text-sm text-ink-soft">No measurements have been uploaded for this design.</p>
        ) : (
          <Table label="Measurements against simulation" columns={["Measurement", "Kind", "Points", "Offset at 1 kHz", "Largest deviation", "At", "Band"]} rows={r.measurements.map((m) => [m.problem ? `${m.name} — ${m.problem}` : m.name, m.kind, String(m.points), m.offset, m.maxDeviation, m.at, m.band])} />
        )}
      </Section>
      <Section title="Remarks">
        {r.remarks.length === 0 ? <p className="text-sm text-ink-soft">No remarks on this revision.</p> : null}
        <ul className="space-y-2">
          {r.remarks.map((m, i) => (
            // biome-ignore lint/suspicious/noArrayIndexKey: remarks are in time order
            <li key={i} className={`text-sm ${m.reply ? "ml-6" : ""}`}>
              <span className="font-semibold">{m.author}</span> on {m.anchor} · <span className="text-ink-soft">{m.at}{m.resolved ? " · resolved" : ""}</span>
              <p>{m.body}</p>
            </li>
          ))}
        </ul>
      </Section>
      <Section title="Decisions">
        {r.decisions.length === 0 ? <p className="text-sm text-ink-soft">No reviewer has decided yet.</p> : null}
        <ul className="space-y-2">
          {r.decisions.map((d, i) => (
            // biome-ignore lint/suspicious/noArrayIndexKey: decisions are in time order
            <li key={i} className="text-sm">
              <span className={`font-semibold ${d.verdict === "approve" ? "text-trace" : "text-caution"}`}>{d.verdict === "approve" ? "Approve" : "Rework"}</span> — {d.reviewer}, {d.at}
              <p>{d.reason}</p>
            </li>
          ))}
        </ul>
      </Section>
    </article>
  );
}
