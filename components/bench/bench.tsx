"use client";
/**
 * The composed bench: top bar, caution, tray | canvas | part sheet, and the live results below. Mounted by the
 * bench page (editable for designers and owners) and read-only by viewers, reviewers and bench links:
 * `<Bench circuit={…} layout={…} readOnly />`. On a phone the tray and sheet fold away and the canvas and results
 * stay (read-only use).
 */
import { ReactFlowProvider } from "@xyflow/react";
import { memo, Suspense, useCallback, useMemo, useState } from "react";
import { designsFetch, designUrl } from "@/components/designs/designs-api";
import { BenchTopBar } from "./bench-top-bar";
import { BenchCanvas } from "./canvas/bench-canvas";
import { CautionBanner } from "./caution-banner";
import { ReviewAnchor } from "./review-anchor";
import { type BenchDocument, openDocument, toExportFile } from "./document/document";
import { importCircuitText } from "./document/import-file";
import type { SimErrorJson } from "@/sim/errors";
import { SheetPanel } from "./part-sheet/sheet-panel";
import { type BenchLiveState, BenchResults } from "./results";
import { SaveDialog } from "./save/save-dialog";
import { useDraft } from "./save/use-draft";
import { StartFrom } from "./starting-points/start-from";
import { BenchStoreProvider, useBench, useBenchStore } from "./store/bench-store-context";
import { canvasProblem } from "./store/canvas-problem";
import { structureProblem } from "./store/structure-check";
import { Tray } from "./tray/tray";

// Each reads the store itself; memo keeps a new live result (which re-renders the body for the caution banner and
// the canvas's problem) from re-rendering the canvas, the tray and the part sheet when their props are unchanged.
const Canvas = memo(BenchCanvas);
const TrayPanel = memo(Tray);
const Sheet = memo(SheetPanel);

export interface BenchProps {
  circuit: unknown;
  layout?: unknown;
  readOnly?: boolean;
  workspaceId?: string;
  designId?: string;
  revision?: { id: string; number: number } | null;
}

export function Bench(props: BenchProps) {
  const document = useMemo(() => openDocument(props.circuit, props.layout), [props.circuit, props.layout]);
  return (
    <ReactFlowProvider>
      <BenchStoreProvider document={document} readOnly={props.readOnly}>
        <Suspense fallback={null}>
          <ReviewAnchor />
        </Suspense>
        <BenchBody {...props} />
      </BenchStoreProvider>
    </ReactFlowProvider>
  );
}

/** The same error, and the same high nets to the volt (the banner shows them rounded). */
function sameLiveState(a: BenchLiveState, b: BenchLiveState): boolean {
  const volts = (nets: Record<string, number> | null) =>
    nets === null ? null : JSON.stringify(Object.entries(nets).map(([net, v]) => [net, Math.round(v)]));
  return a.error === b.error && volts(a.highNets) === volts(b.highNets);
}

function download(name: string, text: string) {
  const url = URL.createObjectURL(new Blob([text], { type: "application/json" }));
  const link = Object.assign(window.document.createElement("a"), { href: url, download: name });
  link.click();
  setTimeout(() => URL.revokeObjectURL(url), 1000);
}

function BenchBody({ readOnly = false, workspaceId, designId, revision: initialRevision = null }: BenchProps) {
  const store = useBenchStore();
  const document = useBench((s) => s.document);
  const variant = useBench((s) => s.variant);
  const dirty = useBench((s) => s.dirty);
  const selection = useBench((s) => s.selection);
  const [revision, setRevision] = useState(initialRevision);
  const [saving, setSaving] = useState(false);
  const [importErrors, setImportErrors] = useState<SimErrorJson[] | null>(null);
  const [notice, setNotice] = useState<string | null>(null);
  const [sheetOpen, setSheetOpen] = useState(false);
  const canSave = !readOnly && !!workspaceId && !!designId;
  const draft = useDraft({ designId, parentRevisionId: revision?.id ?? null, document, dirty, enabled: !readOnly });

  // the live solve's error and operating point, told by the results below (null until the first solve answers)
  const [live, setLive] = useState<BenchLiveState>({ error: null, highNets: null });
  // kept as it was when neither the error nor the banner's rounded high voltages moved, so a new result does not
  // re-render the whole bench (the body, the banner, the results' props) after the plots have drawn
  const onLiveState = useCallback(
    (state: BenchLiveState) => setLive((was) => (sameLiveState(was, state) ? was : state)),
    [],
  );
  const structure = useMemo(() => structureProblem(document.circuit, variant), [document.circuit, variant]);
  const problem = useMemo(
    () => canvasProblem(structure, live.error, document.circuit),
    [structure, live.error, document.circuit],
  );
  const selectedPart =
    selection.parts.length === 1 ? document.circuit.parts.find((p) => p.id === selection.parts[0]) : undefined;
  // stable props for the results, which memo their panels
  const selectedId = selectedPart?.id;
  const selectedKind = selectedPart?.kind;
  const selected = useMemo(
    () => (selectedId && selectedKind ? { id: selectedId, kind: selectedKind } : null),
    [selectedId, selectedKind],
  );
  const onSelectPart = useCallback((id: string) => store.getState().select({ parts: [id] }), [store]);
  const onApplyValues = useCallback(
    (id: string, values: Record<string, string>) => {
      const part = store.getState().document.circuit.parts.find((p) => p.id === id);
      if (part) store.getState().updatePart(id, { values: { ...part.values, ...values } });
    },
    [store],
  );

  const onImport = (text: string) => {
    const result = importCircuitText(text);
    if (!result.ok) return setImportErrors(result.errors);
    setImportErrors(null);
    store.getState().replaceDocument(result.document);
    setNotice("Imported. Undo brings back what was here before.");
  };

  const loadRevision = async (revisionId: string) => {
    if (!workspaceId || !designId) return;
    const { revision: loaded } = await designsFetch<{
      revision: { id: string; number: number; circuit: unknown; layout: unknown };
    }>(`${designUrl(workspaceId, designId)}/revisions/${revisionId}`);
    const mine: BenchDocument = store.getState().document;
    // mine goes aside first, under the revision now loaded, so the bench offers it straight back
    draft.keepAside(mine, loaded.id);
    store.getState().loadDocument(openDocument(loaded.circuit, loaded.layout));
    setRevision({ id: loaded.id, number: loaded.number });
    setSaving(false);
    setNotice(`Loaded r${loaded.number}. Your version is kept as a local draft; restore it from the banner.`);
  };

  return (
    <div className="flex flex-col bg-paper" data-testid="bench">
      <BenchTopBar
        revisionNumber={revision?.number ?? null}
        canSave={canSave}
        onSave={() => setSaving(true)}
        onImport={onImport}
        onExport={() =>
          download(
            `${(document.circuit.title || "circuit").replace(/[^A-Za-z0-9._-]+/g, "-").slice(0, 60)}.json`,
            `${JSON.stringify(toExportFile(document), null, 2)}\n`,
          )
        }
      />
      <CautionBanner circuit={document.circuit} opNets={live.highNets} />
      {draft.offer && (
        <div
          className="flex flex-wrap items-center gap-2 border-b border-brass/40 bg-brass-light/40 px-4 py-1.5 text-sm"
          role="status"
          data-testid="draft-offer"
        >
          <span>
            {draft.offer.reason === "conflict" ? "Your version from before the conflicting save" : "Your unsaved draft"}{" "}
            from {new Date(draft.offer.savedAt).toLocaleString()} is kept in this browser.
          </span>
          <button
            type="button"
            className="rounded border border-ink px-2 py-0.5 text-xs"
            onClick={() => {
              const offered = draft.offer;
              if (!offered) return;
              store.getState().replaceDocument(openDocument(offered.document.circuit, offered.document.layout));
              draft.acceptOffer();
            }}
          >
            Restore your unsaved draft
          </button>
          <button type="button" className="text-xs text-ink-soft underline" onClick={draft.dismissOffer}>
            Discard it
          </button>
        </div>
      )}
      {notice && (
        <div
          className="flex items-center gap-2 border-b border-rule bg-trace-light/30 px-4 py-1 text-xs text-ink"
          role="status"
        >
          {notice}
          <button type="button" className="underline" onClick={() => setNotice(null)}>
            Dismiss
          </button>
        </div>
      )}
      {importErrors && (
        <div
          role="alert"
          className="border-b border-caution/40 bg-caution-bg px-4 py-2 text-sm text-caution"
          data-testid="import-errors"
        >
          <p className="font-semibold">The file was not imported; fix these and try again:</p>
          <ul className="ml-4 list-disc">
            {importErrors.slice(0, 8).map((e) => (
              <li key={`${e.code}:${e.part ?? ""}:${e.field ?? ""}:${e.message}`}>
                {e.part && (
                  <span className="font-mono">
                    {e.part}
                    {e.field ? `.${e.field}` : ""}:{" "}
                  </span>
                )}
                {e.message}
              </li>
            ))}
          </ul>
          <button type="button" className="mt-1 text-xs underline" onClick={() => setImportErrors(null)}>
            Dismiss
          </button>
        </div>
      )}
      <div className="grid h-[62vh] min-h-[420px] grid-cols-1 border-b border-rule md:h-[calc(100vh-11rem)] md:max-h-[760px] md:grid-cols-[176px_minmax(0,1fr)_288px] md:grid-rows-[minmax(0,1fr)]">
        <aside className="hidden min-h-0 overflow-y-auto border-r border-rule bg-paper-deep/40 md:block" aria-label="Tray panel">
          {!readOnly ? <TrayPanel /> : <p className="p-3 text-xs text-ink-soft">Read-only: the tray is for designers.</p>}
        </aside>
        <div className="relative min-h-0 min-w-0">
          <Canvas error={problem} />
          {!readOnly && document.circuit.parts.length === 0 && <StartFrom />}
          <button
            type="button"
            className="absolute right-3 top-3 z-10 rounded border border-rule bg-paper px-2 py-1 text-xs md:hidden"
            onClick={() => setSheetOpen((open) => !open)}
            aria-expanded={sheetOpen}
          >
            {sheetOpen ? "Hide details" : "Details"}
          </button>
          {sheetOpen && (
            <div className="absolute inset-x-2 top-12 bottom-2 z-10 overflow-y-auto rounded border border-rule bg-paper p-3 shadow md:hidden">
              <Sheet />
            </div>
          )}
        </div>
        <aside className="hidden min-h-0 overflow-y-auto border-l border-rule p-3 md:block" aria-label="Part sheet panel">
          <Sheet />
        </aside>
      </div>
      <section className="px-3 py-4 sm:px-4" aria-label="Results">
        <BenchResults
          document={document}
          variant={variant ?? undefined}
          readOnly={readOnly}
          selected={selected}
          onSelectPart={onSelectPart}
          onApplyValues={readOnly ? undefined : onApplyValues}
          revisions={workspaceId && designId ? { workspaceId, designId } : undefined}
          onLiveState={onLiveState}
        />
      </section>
      {saving && workspaceId && designId && (
        <SaveDialog
          workspaceId={workspaceId}
          designId={designId}
          parentRevisionId={revision?.id ?? null}
          document={document}
          onClose={() => setSaving(false)}
          onLoadTheirs={loadRevision}
          onSaved={(saved) => {
            draft.clear();
            setRevision(saved);
            store.getState().markSaved();
            setSaving(false);
            setNotice(`Saved as r${saved.number}.`);
          }}
        />
      )}
    </div>
  );
}
