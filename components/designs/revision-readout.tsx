import type { BenchView } from "@/components/schemas/design-bench-link";
import { FiguresPanel } from "./figures-panel";
import { OperatingPoint } from "./operating-point";
import { PartsList } from "./parts-list";
import { ResponsePlot } from "./response-plot";
import type { RevisionRun } from "./run-revision";

function Section({ title, children }: { title: string; children: React.ReactNode }) {
  return (
    <section className="space-y-2" aria-label={title}>
      <h2 className="font-display text-base font-semibold text-ink">{title}</h2>
      {children}
    </section>
  );
}

/**
 * What a read-only page shows of one revision: the figures and response the engine computed on the server, the
 * operating point, and the parts with their values and variants. `view` narrows the plot the way a bench link asks.
 */
export function RevisionReadout({ run, circuit, view }: { run: RevisionRun; circuit: unknown; view?: BenchView }) {
  const plot = view?.plot ?? "response";
  return (
    <div className="space-y-6">
      {run.ok ? (
        <>
          <Section title="Figures">
            <FiguresPanel figures={run.document.figures} />
          </Section>
          {run.document.ac && plot !== "figures" ? (
            <Section title={plot === "phase" ? "Phase response" : "Frequency response"}>
              <ResponsePlot
                ac={run.document.ac}
                quantity={plot === "phase" ? "phase" : "magnitude"}
                fromHz={view?.fromHz}
                toHz={view?.toHz}
                label={`${plot === "phase" ? "Phase" : "Magnitude"} of the output${view?.variant ? `, variant “${view.variant}”` : ""}${
                  view?.fromHz || view?.toHz ? `, ${view.fromHz ?? "…"}–${view.toHz ?? "…"} Hz` : ""
                }`}
              />
            </Section>
          ) : null}
          {run.document.op ? (
            <Section title="Operating point">
              <OperatingPoint op={run.document.op} />
            </Section>
          ) : null}
        </>
      ) : (
        <div role="alert" className="rounded-md border border-caution/40 bg-caution-bg px-4 py-3 text-sm text-caution">
          <p className="font-medium">The engine could not solve this revision.</p>
          <p>{run.message}</p>
        </div>
      )}
      <Section title="Parts">
        <PartsList circuit={circuit} />
      </Section>
    </div>
  );
}
