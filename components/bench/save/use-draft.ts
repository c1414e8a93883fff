"use client";
/**
 * Keeps the bench's unsaved work in a local draft while it is dirty (written shortly after each change), and finds
 * a draft left by an earlier visit so the bench can offer it back.
 */
import { useEffect, useState } from "react";
import type { BenchDocument } from "../document/document";
import { type Draft, draftKey, readDraft, removeDraft, writeDraft } from "./drafts";

/** Wait after the last change before writing, ms: typing does not write on every key. */
const DRAFT_DELAY_MS = 400;

export function useDraft(options: {
  designId?: string;
  parentRevisionId: string | null;
  document: BenchDocument;
  dirty: boolean;
  enabled: boolean;
}) {
  const { designId, parentRevisionId, document, dirty, enabled } = options;
  const key = designId ? draftKey(designId, parentRevisionId) : null;
  const [offer, setOffer] = useState<Draft | null>(null);

  // on opening (and after loading another revision): is there work left from before?
  useEffect(() => {
    if (!key || !enabled) return;
    setOffer(readDraft(key));
  }, [key, enabled]);

  useEffect(() => {
    if (!key || !enabled || !dirty) return;
    const timer = setTimeout(() => writeDraft(key, { document, savedAt: new Date().toISOString() }), DRAFT_DELAY_MS);
    return () => clearTimeout(timer);
  }, [key, enabled, dirty, document]);

  return {
    offer,
    dismissOffer() {
      if (key) removeDraft(key);
      setOffer(null);
    },
    acceptOffer() {
      setOffer(null);
    },
    clear() {
      if (key) removeDraft(key);
    },
    keepAside(document: BenchDocument, parent: string | null) {
      if (!designId) return;
      writeDraft(draftKey(designId, parent), { document, savedAt: new Date().toISOString(), reason: "conflict" });
    },
  };
}
