"use client";
/** The sheet for a selected wire or net label: the net's name (renamed everywhere) and whether it is the output. */
import { useState } from "react";
import { GROUND } from "@/sim/circuit/types";
import { useBench, useBenchStore } from "../store/bench-store-context";

const inputClass =
  "w-full rounded border border-rule bg-white/80 px-2 py-1 font-mono text-[13px] text-ink outline-none focus:border-brass aria-[invalid=true]:border-caution";

export function NetSheet({ net }: { net: string }) {
  const store = useBenchStore();
  const readOnly = useBench((s) => s.readOnly);
  const output = useBench((s) => s.document.circuit.output);
  const [text, setText] = useState(net);
  const [problem, setProblem] = useState<string | null>(null);
  const rename = () => {
    const result = store.getState().setNetName(net, text);
    setProblem(result.ok ? null : result.error);
  };
  return (
    <div className="space-y-3" data-testid="net-sheet">
      <p className="text-[11px] tracking-wide text-brass-deep uppercase">Net</p>
      {net === GROUND ? (
        <p className="text-sm text-ink-soft">Ground: net 0. Everything wired to a ground symbol is on it.</p>
      ) : (
        <div>
          <label className="block text-xs text-ink-soft" htmlFor="net-name">
            Name
          </label>
          <input
            id="net-name"
            className={inputClass}
            value={text}
            disabled={readOnly}
            aria-invalid={problem ? true : undefined}
            onChange={(e) => setText(e.target.value)}
            onBlur={rename}
            onKeyDown={(e) => e.key === "Enter" && rename()}
          />
          {problem && <p className="mt-0.5 text-xs text-caution">{problem}</p>}
        </div>
      )}
      {!readOnly && (
        <div className="flex flex-wrap gap-2 text-xs">
          <button
            type="button"
            className="rounded border border-rule px-2 py-1 hover:bg-paper-deep"
            onClick={() => store.getState().setOutput(net, output.minus)}
          >
            Output + here
          </button>
          <button
            type="button"
            className="rounded border border-rule px-2 py-1 hover:bg-paper-deep"
            onClick={() => store.getState().setOutput(output.plus, net)}
          >
            Output − here
          </button>
        </div>
      )}
      <p className="text-xs text-ink-soft">
        Output: <span className="font-mono">{output.plus}</span> − <span className="font-mono">{output.minus}</span>
      </p>
    </div>
  );
}
