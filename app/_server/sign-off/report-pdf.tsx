import "server-only";
/**
 * The sign-off report as a PDF (@react-pdf/renderer, rendered on the server with renderToBuffer). A4, the standard
 * Helvetica faces (embedded by every PDF reader); text outside their WinAnsi character set is spelt out first.
 */
import { Document, G, Line, Link, Page, Path, Rect, renderToBuffer, StyleSheet, Svg, Text, View } from "@react-pdf/renderer";
import type { PlotGeometry } from "@/components/report/plot-geometry";
import type { ReportModel } from "@/components/report/report-model";
import { SYMBOL_STROKE } from "@/components/bench/symbols/symbol-geometry";
import type { PlacedSymbol, SchematicGeometry } from "@/components/report/schematic-geometry";

/** Characters the standard PDF fonts lack, in words or ASCII. */
const SPELT: Record<string, string> = { "−": "-", "Ω": " ohm", "√": "sqrt ", "→": ">", "∥": "||", "≤": "<=", "≥": ">=", "✓": "ok", "×": "x" };
const pdfText = (s: string) => s.replace(/[−Ω√→∥≤≥✓×]/g, (c) => SPELT[c] ?? "?");

const INK = "#15181c";
const SOFT = "#3c434b";
const RULE = "#d8cfbd";
const BRASS = "#b27a24";
const CAUTION = "#b4410b";

const s = StyleSheet.create({
  page: { padding: 40, paddingBottom: 50, fontFamily: "Helvetica", fontSize: 9, color: INK, lineHeight: 1.35 },
  brand: { fontFamily: "Helvetica-Bold", fontSize: 8, color: BRASS },
  h1: { fontFamily: "Helvetica-Bold", fontSize: 18, marginTop: 4, marginBottom: 4, lineHeight: 1.2 },
  meta: { color: SOFT, marginTop: 2 },
  h2: { fontFamily: "Helvetica-Bold", fontSize: 12, marginTop: 14, marginBottom: 5, borderBottomWidth: 1, borderBottomColor: RULE, paddingBottom: 2 },
  h3: { fontFamily: "Helvetica-Bold", fontSize: 10, marginTop: 8, marginBottom: 3 },
  row: { flexDirection: "row", borderBottomWidth: 0.5, borderBottomColor: RULE, paddingVertical: 2 },
  head: { flexDirection: "row", borderBottomWidth: 1, borderBottomColor: INK, paddingVertical: 2, fontFamily: "Helvetica-Bold" },
  mono: { fontFamily: "Courier", fontSize: 8.5 },
  caution: { borderWidth: 1, borderColor: CAUTION, backgroundColor: "#fbeee4", color: CAUTION, padding: 6, marginTop: 8 },
  // placed from the top (A4 is 842 pt high): a render-prop text placed with `bottom` under the page's lineHeight is
  // not drawn at all (react-pdf 4.9), so both footer texts sit at the same `top`
  footerLeft: { position: "absolute", top: 808, left: 40, right: 130, color: SOFT, fontSize: 7.5 },
  footerRight: { position: "absolute", top: 808, left: 455, width: 100, textAlign: "right", color: SOFT, fontSize: 7.5 },
  small: { color: SOFT, fontSize: 8 },
});

function Table({ columns, rows, widths }: { columns: string[]; rows: string[][]; widths: number[] }) {
  return (
    <View>
      <View style={s.head} fixed>
        {columns.map((c, i) => (
          <Text key={c} style={{ width: `${widths[i]}%`, paddingRight: 4 }}>{pdfText(c)}</Text>
        ))}
      </View>
      {rows.map((r, k) => (
        // biome-ignore lint/suspicious/noArrayIndexKey: report rows are static
        <View key={k} style={s.row} wrap={false}>
          {r.map((cell, i) => (
            // biome-ignore lint/suspicious/noArrayIndexKey: cells are positional
            <Text key={i} style={{ width: `${widths[i]}%`, paddingRight: 4 }}>{pdfText(cell)}</Text>
          ))}
        </View>
      ))}
    </View>
  );
}

function PlotSvg({ g, title, legend, note }: { g: PlotGeometry; title: string; legend: ReportModel["plots"][number]["legend"]; note?: string }) {
  return (
    <View wrap={false} style={{ marginBottom: 8 }}>
      <Text style={s.h3}>{pdfText(title)}</Text>
      <Svg width={g.width} height={g.height} viewBox={`0 0 ${g.width} ${g.height}`}>
        <Rect x={g.frame.x} y={g.frame.y} width={g.frame.width} height={g.frame.height} fill="#fbf9f3" stroke={RULE} strokeWidth={0.8} />
        {g.xTicks.map((t) => (
          <G key={`x${t.label}`}>
            <Line x1={t.x} x2={t.x} y1={g.frame.y} y2={g.frame.y + g.frame.height} stroke={RULE} strokeWidth={0.5} />
            <Text x={t.x} y={g.height - 12} style={{ fontSize: 7 }} textAnchor="middle" fill={SOFT}>{t.label}</Text>
          </G>
        ))}
        {g.yTicks.map((t) => (
          <G key={`y${t.label}`}>
            <Line x1={g.frame.x} x2={g.frame.x + g.frame.width} y1={t.y} y2={t.y} stroke={RULE} strokeWidth={0.5} />
            <Text x={g.frame.x - 4} y={t.y + 2.5} style={{ fontSize: 7 }} textAnchor="end" fill={SOFT}>{pdfText(t.label)}</Text>
          </G>
        ))}
        {g.paths.map((p) => (
          <Path key={p.label} d={p.d} fill="none" stroke={p.colour} strokeWidth={p.dashed ? 1.1 : 1.6} strokeDasharray={p.dashed ? "4 2" : undefined} />
        ))}
        <Text x={g.frame.x + g.frame.width} y={g.height - 2} style={{ fontSize: 7 }} textAnchor="end" fill={SOFT}>Frequency (Hz)</Text>
        <Text x={2} y={g.frame.y + 6} style={{ fontSize: 7 }} fill={SOFT}>{pdfText(g.yUnit)}</Text>
      </Svg>
      <View style={{ flexDirection: "row", flexWrap: "wrap", marginTop: 2 }}>
        {legend.map((l) => (
          <View key={l.label} style={{ flexDirection: "row", alignItems: "center", marginRight: 10 }}>
            <View style={{ width: 14, height: 2, backgroundColor: l.colour, marginRight: 3 }} />
            <Text style={s.small}>{pdfText(l.label)}{l.dashed ? " (dashed)" : ""}</Text>
          </View>
        ))}
      </View>
      {note ? <Text style={s.small}>{pdfText(note)}</Text> : null}
    </View>
  );
}

/** Symbol strokes as react-pdf paths: the same path data the bench and the report page draw. */
function PdfSymbol({ placed, colour }: { placed: PlacedSymbol; colour: string }) {
  return (
    <G transform={placed.transform}>
      {placed.strokes.map((st) => (
        <Path
          key={st.d}
          d={st.d}
          stroke={colour}
          strokeWidth={st.width ?? SYMBOL_STROKE}
          strokeDasharray={st.dash}
          strokeLinecap="round"
          strokeLinejoin="round"
          fill={st.filled ? colour : "none"}
        />
      ))}
    </G>
  );
}

function SchematicSvg({ g }: { g: SchematicGeometry }) {
  const font = { fontSize: g.fontSize };
  return (
    <Svg width={g.width} height={g.height} viewBox={`0 0 ${g.width} ${g.height}`}>
      {g.wires.map((w, i) => (
        // biome-ignore lint/suspicious/noArrayIndexKey: wires are positional
        <Path key={i} d={w.d} stroke={INK} strokeWidth={0.9} fill="none" />
      ))}
      {g.grounds.map((gr, i) => (
        // biome-ignore lint/suspicious/noArrayIndexKey: grounds are positional
        <PdfSymbol key={`g${i}`} placed={gr} colour={INK} />
      ))}
      {g.parts.map((p) => (
        <PdfSymbol key={p.id} placed={p} colour={p.enabled ? INK : "#8a8f96"} />
      ))}
      {g.parts.map((p) => (
        <G key={`t${p.id}`}>
          <Rect x={p.plate.x} y={p.plate.y} width={p.plate.width} height={p.plate.height} fill="#fbf9f3" />
          <Text x={p.name.x} y={p.name.y} style={{ ...font, fontFamily: "Helvetica-Bold" }} textAnchor="middle" fill={INK}>{pdfText(p.name.text)}</Text>
          {p.value ? <Text x={p.value.x} y={p.value.y} style={font} textAnchor="middle" fill={SOFT}>{pdfText(p.value.text)}</Text> : null}
        </G>
      ))}
      {g.labels.map((l, i) => (
        // biome-ignore lint/suspicious/noArrayIndexKey: labels are positional
        <G key={`l${i}`}>
          <Path d={l.flag} fill="#fbf3e3" stroke={BRASS} strokeWidth={0.8} />
          <Text x={l.text.x} y={l.text.y} style={font} fill="#7a5316">{pdfText(l.text.text)}</Text>
        </G>
      ))}
    </Svg>
  );
}

export function ReportDocument({ report: r }: { report: ReportModel }) {
  const verdict = r.decisions.at(-1);
  return (
    <Document title={`Sign-off report — ${r.title} r${r.revisionNumber}`} author="Backplate" subject="Sign-off report">
      <Page size="A4" style={s.page}>
        <Text style={s.brand}>BACKPLATE · SIGN-OFF REPORT</Text>
        <Text style={s.h1}>{pdfText(`${r.title} — r${r.revisionNumber}`)}</Text>
        <Text style={s.meta}>{pdfText(`${r.workspaceName} · saved by ${r.authorName}, ${r.savedAt} · “${r.revisionMessage}”`)}</Text>
        <Text style={s.meta}>{pdfText(`Decision: ${verdict ? `${verdict.verdict === "approve" ? "Approved" : "Rework"} by ${verdict.reviewer}, ${verdict.at}` : "none yet"}`)}</Text>
        <Text style={s.meta}>Bench (open with a workspace account):</Text>
        <Link src={r.benchUrl} style={[s.meta, s.mono]}>{r.benchUrl}</Link>
        {r.cautions.length > 0 ? (
          <View style={s.caution}>
            <Text style={{ fontFamily: "Helvetica-Bold" }}>Caution — lethal voltages.</Text>
            <Text>{pdfText(`${r.cautions.join(" ")} Capacitors keep their charge after power-off: discharge them before touching. Work to your local codes and qualified practice.`)}</Text>
          </View>
        ) : null}
        {r.engineError ? <Text style={[s.caution, { marginTop: 6 }]}>{pdfText(`The engine could not solve this revision: ${r.engineError}`)}</Text> : null}

        <Text style={s.h2}>Circuit</Text>
        {r.schematic ? <SchematicSvg g={r.schematic} /> : <Text style={s.small}>This revision was saved without a bench layout; its parts are listed below.</Text>}

        <Text style={s.h2}>Figures</Text>
        <Table columns={["Figure", "Value"]} widths={[55, 45]} rows={r.figures.map((f) => [f.label, f.value])} />
        <Text style={s.h3}>Target checks</Text>
        {r.checks.length === 0 ? (
          <Text style={s.small}>This revision sets no targets.</Text>
        ) : (
          <Table columns={["Figure", "Variant", "Value", "Target", "Result"]} widths={[30, 15, 20, 20, 15]} rows={r.checks.map((c) => [c.figure, c.variant, c.value, c.range, c.pass ? "pass" : "FAIL"])} />
        )}

        <Text style={s.h2}>Parameters and parts</Text>
        {r.parameters.length > 0 ? <Table columns={["Parameter", "Value"]} widths={[40, 60]} rows={r.parameters.map((p) => [p.name, p.value])} /> : null}
        <View style={{ marginTop: 6 }}>
          <Table columns={["Part", "Kind", "Values", "Nets"]} widths={[10, 14, 46, 30]} rows={r.parts.map((p) => [p.enabled ? p.id : `${p.id} (off)`, p.kind, p.values, p.nets])} />
        </View>

        <Text style={s.h2} break>Plots</Text>
        {r.plots.length === 0 ? <Text style={s.small}>No analysis produced a curve for this revision.</Text> : null}
        {r.plots.map((p) => (
          <PlotSvg key={p.title} g={p.geometry} title={p.title} legend={p.legend} note={p.note} />
        ))}

        <Text style={s.h2}>Measurements against simulation</Text>
        {r.measurements.length === 0 ? (
          <Text style={s.small}>No measurements have been uploaded for this design.</Text>
        ) : (
          <Table
            columns={["Measurement", "Kind", "Points", "Offset at 1 kHz", "Largest deviation", "At", "Band"]}
            widths={[22, 15, 8, 13, 14, 12, 16]}
            rows={r.measurements.map((m) => [m.problem ? `${m.name} — ${m.problem}` : m.name, m.kind, String(m.points), m.offset, m.maxDeviation, m.at, m.band])}
          />
        )}

        <Text style={s.h2}>Remarks</Text>
        {r.remarks.length === 0 ? <Text style={s.small}>No remarks on this revision.</Text> : null}
        {r.remarks.map((m, i) => (
          // biome-ignore lint/suspicious/noArrayIndexKey: remarks are in time order
          <View key={i} style={{ marginBottom: 4, marginLeft: m.reply ? 14 : 0 }} wrap={false}>
            <Text style={{ fontFamily: "Helvetica-Bold" }}>{pdfText(`${m.author} on ${m.anchor} · ${m.at}${m.resolved ? " · resolved" : ""}`)}</Text>
            <Text>{pdfText(m.body)}</Text>
          </View>
        ))}
        <Text style={s.h2}>Decisions</Text>
        {r.decisions.length === 0 ? <Text style={s.small}>No reviewer has decided yet.</Text> : null}
        {r.decisions.map((d, i) => (
          // biome-ignore lint/suspicious/noArrayIndexKey: decisions are in time order
          <View key={i} style={{ marginBottom: 4 }} wrap={false}>
            <Text style={{ fontFamily: "Helvetica-Bold", color: d.verdict === "approve" ? "#24706b" : CAUTION }}>{pdfText(`${d.verdict === "approve" ? "Approve" : "Rework"} — ${d.reviewer}, ${d.at}`)}</Text>
            <Text>{pdfText(d.reason)}</Text>
          </View>
        ))}
        <Text style={s.footerLeft} fixed>{pdfText(`${r.title} r${r.revisionNumber} · generated ${r.generatedAt}`)}</Text>
        <Text style={s.footerRight} fixed render={({ pageNumber, totalPages }) => `Page ${pageNumber} of ${totalPages}`} />
      </Page>
    </Document>
  );
}

export async function renderReportPdf(report: ReportModel): Promise<Buffer> {
  return renderToBuffer(<ReportDocument report={report} />);
}
