"use client";
/** "Start from…": the starting points, offered on an empty bench. Choosing one is an undoable step. */
import { useBench, useBenchStore } from "../store/bench-store-context";
import { STARTING_POINTS, startingPointDocument } from "./starting-points";

export function StartFrom() {
  const store = useBenchStore();
  const title = useBench((s) => s.document.circuit.title);
  return (
    <div
      className="absolute inset-x-3 bottom-14 z-10 mx-auto max-w-xl rounded-md border border-rule bg-paper/95 p-3 shadow"
      data-testid="start-from"
    >
      <p className="mb-2 text-sm font-semibold text-ink">Start from…</p>
      <ul className="grid gap-1.5 sm:grid-cols-2">
        {STARTING_POINTS.map((point) => (
          <li key={point.id}>
            <button
              type="button"
              className="w-full rounded border border-rule px-2 py-1.5 text-left hover:bg-paper-deep"
              onClick={() => {
                const document = startingPointDocument(point);
                // keep the design's own title; the topology's title goes in the notes of the file
                store.getState().replaceDocument({
                  ...document,
                  circuit: { ...document.circuit, title: title || document.circuit.title, notes: point.title },
                });
              }}
            >
              <span className="block text-[13px] font-medium text-ink">{point.title}</span>
              <span className="block text-[11px] leading-snug text-ink-soft">{point.summary}</span>
            </button>
          </li>
        ))}
      </ul>
      <p className="mt-2 text-[11px] text-ink-soft">Or draw from the tray. Values are invented starting values.</p>
    </div>
  );
}
