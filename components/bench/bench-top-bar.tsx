"use client";
/** The bench's top bar: title, revision, variant, undo/redo, import/export, save. */
import { type ChangeEvent, useRef } from "react";
import { useBench, useBenchStore } from "./store/bench-store-context";

const barButton =
  "rounded border border-rule bg-paper px-2 py-1 text-xs text-ink hover:bg-paper-deep disabled:cursor-not-allowed disabled:opacity-50";

export function BenchTopBar({
  revisionNumber,
  canSave,
  onSave,
  onImport,
  onExport,
}: {
  revisionNumber: number | null;
  canSave: boolean;
  onSave: () => void;
  onImport: (text: string) => void;
  onExport: () => void;
}) {
  const store = useBenchStore();
  const title = useBench((s) => s.document.circuit.title);
  const variants = useBench((s) => s.document.circuit.variants);
  const variant = useBench((s) => s.variant);
  const readOnly = useBench((s) => s.readOnly);
  const dirty = useBench((s) => s.dirty);
  const canUndo = useBench((s) => s.history.past.length > 0);
  const canRedo = useBench((s) => s.history.future.length > 0);
  const fileInput = useRef<HTMLInputElement>(null);

  const readFile = async (event: ChangeEvent<HTMLInputElement>) => {
    const file = event.target.files?.[0];
    event.target.value = "";
    if (file) onImport(await file.text());
  };

  return (
    <header className="flex flex-wrap items-center gap-x-3 gap-y-2 border-b border-rule bg-paper px-3 py-2">
      {/* a whole row on a phone, so a long title wraps instead of being cut off */}
      <div className="min-w-0 basis-full sm:basis-0 sm:flex-1">
        <h1 className="break-words font-display sm:truncate text-base font-semibold text-ink" title={title}>
          {title || "Untitled design"}
        </h1>
        <p className="text-[11px] text-ink-soft">
          {revisionNumber === null ? "Not saved yet" : `Revision r${revisionNumber}`}
          {dirty && !readOnly && <span className="ml-1 text-brass-deep">· unsaved changes</span>}
          {readOnly && <span className="ml-1">· read-only</span>}
        </p>
      </div>
      <label className="flex items-center gap-1 text-xs text-ink-soft">
        Variant
        <select
          className="max-w-40 rounded border border-rule bg-white/80 px-1 py-0.5 text-xs text-ink"
          value={variant ?? ""}
          onChange={(e) => store.getState().setVariant(e.target.value === "" ? null : e.target.value)}
          aria-label="Variant"
        >
          <option value="">As drawn</option>
          {variants.map((v) => (
            <option key={v.name} value={v.name}>
              {v.name}
            </option>
          ))}
        </select>
      </label>
      {!readOnly && (
        <div className="flex items-center gap-1">
          <button
            type="button"
            className={barButton}
            disabled={!canUndo}
            onClick={() => store.getState().undo()}
            title="Undo (Ctrl+Z)"
          >
            Undo
          </button>
          <button
            type="button"
            className={barButton}
            disabled={!canRedo}
            onClick={() => store.getState().redo()}
            title="Redo (Ctrl+Shift+Z)"
          >
            Redo
          </button>
        </div>
      )}
      <div className="flex items-center gap-1">
        {!readOnly && (
          <>
            <button type="button" className={barButton} onClick={() => fileInput.current?.click()}>
              Import
            </button>
            <input
              ref={fileInput}
              type="file"
              accept=".json,application/json"
              className="hidden"
              onChange={readFile}
              aria-label="Import a circuit file"
              data-testid="import-input"
            />
          </>
        )}
        <button type="button" className={barButton} onClick={onExport}>
          Export
        </button>
        {canSave && (
          <button
            type="button"
            className="rounded bg-ink px-3 py-1 text-xs font-medium text-paper hover:bg-graphite disabled:opacity-50"
            onClick={onSave}
          >
            Save revision
          </button>
        )}
      </div>
    </header>
  );
}
