/**
 * The bench's state (zustand, vanilla so it runs in tests and one store exists per mounted bench): the document,
 * the selection, the chosen variant, read-only mode, undo/redo history and the dirty flag. Every editing action is a
 * pure edit from edits.ts recorded in the history; in read-only mode editing actions do nothing.
 */
import { createStore, type StoreApi } from "zustand/vanilla";
import type { PartKind } from "@/sim/circuit/types";
import type { BenchVariant, RawValue } from "../document/circuit";
import type { BenchDocument } from "../document/document";
import type { Endpoint } from "../document/layout";
import { type Clip, copySelection, pasteClip } from "./clipboard";
import * as edits from "./edits";
import { type History, HISTORY_LIMIT, record, redo, undo } from "./history";
import { EMPTY_SELECTION, type ItemRef, type Selection } from "./selection";

export interface BenchState {
  document: BenchDocument;
  selection: Selection;
  /** the variant the results show; null is the design as drawn */
  variant: string | null;
  readOnly: boolean;
  history: History<BenchDocument>;
  /** the document differs from the one last loaded or saved */
  dirty: boolean;
  clipboard: Clip | null;

  loadDocument(document: BenchDocument, options?: { dirty?: boolean }): void;
  /** replaces the whole document as one undoable step (an import, a starting point) */
  replaceDocument(document: BenchDocument): void;
  /** after a save: the current document is the saved one */
  markSaved(): void;
  setReadOnly(readOnly: boolean): void;
  setVariant(variant: string | null): void;
  select(selection: Partial<Selection>): void;
  clearSelection(): void;

  addPart(kind: PartKind, at: { x: number; y: number }): string | null;
  addGround(at: { x: number; y: number }): string | null;
  addNetLabel(at: { x: number; y: number }, net: string): string | null;
  /** `record: false` while dragging; call `checkpoint()` once when the drag starts */
  movePart(item: ItemRef, at: { x: number; y: number }, options?: { record?: boolean }): void;
  /** makes the current document undoable as one step (before a drag) */
  checkpoint(): void;
  rotatePart(ids?: string[]): void;
  deleteSelection(): void;
  connect(from: Endpoint, to: Endpoint): void;
  disconnect(wireIds: string[]): void;
  setValue(partId: string, field: string, raw: RawValue | undefined): void;
  updatePart(partId: string, patch: edits.PartPatch): void;
  renamePart(from: string, to: string): edits.EditResult;
  setParameter(name: string, raw: RawValue | undefined): void;
  setNetName(net: string, name: string): edits.EditResult;
  setOutput(plus: string, minus: string): void;
  setVariants(variants: BenchVariant[]): void;
  setTitle(title: string): void;
  copy(): void;
  paste(): void;
  undo(): void;
  redo(): void;
}

export type BenchStore = StoreApi<BenchState>;

const READ_ONLY_MESSAGE = "This bench is read-only.";

export function createBenchStore(
  initial: BenchDocument,
  options: { readOnly?: boolean; limit?: number } = {},
): BenchStore {
  const limit = options.limit ?? HISTORY_LIMIT;
  return createStore<BenchState>()((set, get) => {
    /** Applies an edit as one undoable step; an edit that returns the same document records nothing. */
    const apply = (change: (document: BenchDocument) => BenchDocument, extra: Partial<BenchState> = {}) => {
      const state = get();
      if (state.readOnly) return;
      const next = change(state.document);
      if (next === state.document) {
        if (Object.keys(extra).length > 0) set(extra);
        return;
      }
      set({ document: next, history: record(state.history, state.document, limit), dirty: true, ...extra });
    };
    const applyResult = (change: (document: BenchDocument) => edits.EditResult): edits.EditResult => {
      if (get().readOnly) return { ok: false, error: READ_ONLY_MESSAGE };
      const result = change(get().document);
      if (result.ok) apply(() => result.document);
      return result;
    };
    return {
      document: initial,
      selection: EMPTY_SELECTION,
      variant: null,
      readOnly: options.readOnly ?? false,
      history: { past: [], future: [] },
      dirty: false,
      clipboard: null,

      loadDocument(document, opts = {}) {
        const variants = new Set(document.circuit.variants.map((v) => v.name));
        const variant = get().variant;
        set({
          document,
          selection: EMPTY_SELECTION,
          history: { past: [], future: [] },
          dirty: opts.dirty ?? false,
          variant: variant !== null && variants.has(variant) ? variant : null,
        });
      },
      replaceDocument(document) {
        apply(() => document, { selection: EMPTY_SELECTION });
      },
      markSaved() {
        set({ dirty: false });
      },
      setReadOnly(readOnly) {
        set({ readOnly });
      },
      setVariant(variant) {
        set({ variant });
      },
      select(selection) {
        set({ selection: { ...EMPTY_SELECTION, ...selection } });
      },
      clearSelection() {
        set({ selection: EMPTY_SELECTION });
      },

      addPart(kind, at) {
        if (get().readOnly) return null;
        const { document, id } = edits.addPart(get().document, kind, at);
        apply(() => document, { selection: { ...EMPTY_SELECTION, parts: [id] } });
        return id;
      },
      addGround(at) {
        if (get().readOnly) return null;
        const { document, id } = edits.addGround(get().document, at);
        apply(() => document, { selection: { ...EMPTY_SELECTION, grounds: [id] } });
        return id;
      },
      addNetLabel(at, net) {
        if (get().readOnly) return null;
        const { document, id } = edits.addNetLabel(get().document, at, net);
        apply(() => document, { selection: { ...EMPTY_SELECTION, labels: [id] } });
        return id;
      },
      movePart(item, at, opts = {}) {
        if (opts.record === false) {
          if (get().readOnly) return;
          const next = edits.moveItem(get().document, item, at);
          if (next !== get().document) set({ document: next, dirty: true });
          return;
        }
        apply((d) => edits.moveItem(d, item, at));
      },
      checkpoint() {
        const state = get();
        if (state.readOnly) return;
        set({ history: record(state.history, state.document, limit) });
      },
      rotatePart(ids) {
        apply((d) => edits.rotateParts(d, ids ?? get().selection.parts));
      },
      deleteSelection() {
        apply((d) => edits.deleteItems(d, get().selection), { selection: EMPTY_SELECTION });
      },
      connect(from, to) {
        apply((d) => edits.connect(d, from, to));
      },
      disconnect(wireIds) {
        apply((d) => edits.disconnect(d, wireIds));
      },
      setValue(partId, field, raw) {
        apply((d) => edits.setValue(d, partId, field, raw));
      },
      updatePart(partId, patch) {
        apply((d) => edits.updatePart(d, partId, patch));
      },
      renamePart(from, to) {
        const result = applyResult((d) => edits.renamePart(d, from, to));
        if (result.ok) {
          const parts = get().selection.parts.map((id) => (id === from ? to.trim() : id));
          set({ selection: { ...get().selection, parts } });
        }
        return result;
      },
      setParameter(name, raw) {
        apply((d) => edits.setParameter(d, name, raw));
      },
      setNetName(net, name) {
        return applyResult((d) => edits.setNetName(d, net, name));
      },
      setOutput(plus, minus) {
        apply((d) => edits.setOutput(d, plus, minus));
      },
      setVariants(variants) {
        apply((d) => edits.setVariants(d, variants));
      },
      setTitle(title) {
        apply((d) => edits.setTitle(d, title));
      },
      copy() {
        const clip = copySelection(get().document, get().selection);
        if (clip) set({ clipboard: clip });
      },
      paste() {
        const clip = get().clipboard;
        if (!clip || get().readOnly) return;
        const { document, selection } = pasteClip(get().document, clip);
        apply(() => document, { selection });
        // a second paste lands one step further on
        set({ clipboard: copySelection(get().document, selection) });
      },
      undo() {
        const state = get();
        if (state.readOnly) return;
        const step = undo(state.history, state.document);
        if (step) set({ document: step.value, history: step.history, dirty: true, selection: EMPTY_SELECTION });
      },
      redo() {
        const state = get();
        if (state.readOnly) return;
        const step = redo(state.history, state.document);
        if (step) set({ document: step.value, history: step.history, dirty: true, selection: EMPTY_SELECTION });
      },
    };
  });
}
