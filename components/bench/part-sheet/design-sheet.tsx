"use client";
/** The sheet when nothing is selected: the design's output nets, parameters and variants. */
import { netNames } from "../document/nets";
import { useBench, useBenchStore } from "../store/bench-store-context";
import { ParametersTable } from "./parameters-table";
import { VariantsEditor } from "./variants-editor";

const selectClass = "w-full rounded border border-rule bg-white/80 px-1.5 py-0.5 font-mono text-xs text-ink";

export function DesignSheet() {
  const store = useBenchStore();
  const readOnly = useBench((s) => s.readOnly);
  const circuit = useBench((s) => s.document.circuit);
  const nets = netNames(circuit);
  const options = [...new Set([...nets, circuit.output.plus, circuit.output.minus])];
  return (
    <div className="space-y-5" data-testid="design-sheet">
      <section aria-label="Output">
        <h3 className="mb-1 text-xs font-semibold text-ink">Output</h3>
        <div className="grid grid-cols-2 gap-2">
          <label className="text-[11px] text-ink-soft">
            + net
            <select
              className={selectClass}
              value={circuit.output.plus}
              disabled={readOnly}
              onChange={(e) => store.getState().setOutput(e.target.value, circuit.output.minus)}
            >
              {options.map((n) => (
                <option key={n} value={n}>
                  {n}
                </option>
              ))}
            </select>
          </label>
          <label className="text-[11px] text-ink-soft">
            − net
            <select
              className={selectClass}
              value={circuit.output.minus}
              disabled={readOnly}
              onChange={(e) => store.getState().setOutput(circuit.output.plus, e.target.value)}
            >
              {options.map((n) => (
                <option key={n} value={n}>
                  {n}
                </option>
              ))}
            </select>
          </label>
        </div>
      </section>
      <ParametersTable />
      <VariantsEditor />
    </div>
  );
}
