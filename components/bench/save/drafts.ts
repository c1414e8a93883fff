/**
 * Local drafts: unsaved work kept in the browser's localStorage, keyed by design and the revision it started from,
 * so a reload (or a crash) never loses it and the bench can offer it back. A draft is removed once saved.
 */
import type { BenchDocument } from "../document/document";

export interface Draft {
  document: BenchDocument;
  savedAt: string;
  /** set when the draft was kept aside after someone else saved first */
  reason?: "conflict";
}

const PREFIX = "backplate:draft:";

export function draftKey(designId: string, parentRevisionId: string | null): string {
  return `${PREFIX}${designId}:${parentRevisionId ?? "none"}`;
}

type StorageLike = Pick<Storage, "getItem" | "setItem" | "removeItem">;

function storage(): StorageLike | null {
  try {
    return typeof window === "undefined" ? null : window.localStorage;
  } catch {
    return null;
  }
}

export function writeDraft(key: string, draft: Draft, store: StorageLike | null = storage()): boolean {
  if (!store) return false;
  try {
    store.setItem(key, JSON.stringify(draft));
    return true;
  } catch {
    // storage full or disabled: the editor still holds the work
    return false;
  }
}

export function readDraft(key: string, store: StorageLike | null = storage()): Draft | null {
  const text = store?.getItem(key);
  if (!text) return null;
  try {
    const draft = JSON.parse(text) as Draft;
    return draft?.document?.circuit && draft.document.layout && typeof draft.savedAt === "string" ? draft : null;
  } catch {
    return null;
  }
}

export function removeDraft(key: string, store: StorageLike | null = storage()): void {
  store?.removeItem(key);
}
