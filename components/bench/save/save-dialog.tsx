"use client";
/**
 * Saving a revision: a message, then POST …/revisions with the revision the bench started from. A 409 (someone
 * saved first) shows who and when and offers: fork this work as a new design, or load their revision and keep this
 * work as a local draft. Nothing the person drew is dropped on any path.
 */
import { zodResolver } from "@hookform/resolvers/zod";
import { useState } from "react";
import { useForm } from "react-hook-form";
import { z } from "zod";
import { revisionMessageSchema } from "@/components/schemas/design";
import { primaryButton, secondaryButton } from "@/components/ui/buttons";
import { DesignApiError, designsFetch, designUrl } from "@/components/designs/designs-api";
import type { BenchDocument } from "../document/document";

export interface SavedRevision {
  id: string;
  number: number;
}

interface Conflict {
  headRevisionId: string;
  headNumber: number;
  authorName: string | null;
  savedAt: string;
}

const messageForm = z.object({ message: revisionMessageSchema });

export function SaveDialog({
  workspaceId,
  designId,
  parentRevisionId,
  document,
  onSaved,
  onLoadTheirs,
  onClose,
}: {
  workspaceId: string;
  designId: string;
  parentRevisionId: string | null;
  document: BenchDocument;
  onSaved: (revision: SavedRevision) => void;
  /** load the head revision; the caller keeps the current work as a draft first */
  onLoadTheirs: (headRevisionId: string) => Promise<void>;
  onClose: () => void;
}) {
  const form = useForm<{ message: string }>({ resolver: zodResolver(messageForm), defaultValues: { message: "" } });
  const [problem, setProblem] = useState<string | null>(null);
  const [conflict, setConflict] = useState<Conflict | null>(null);
  const [busy, setBusy] = useState(false);
  const [forked, setForked] = useState<string | null>(null);

  const save = form.handleSubmit(async ({ message }) => {
    setBusy(true);
    setProblem(null);
    try {
      const { revision } = await designsFetch<{ revision: SavedRevision }>(
        `${designUrl(workspaceId, designId)}/revisions`,
        {
          method: "POST",
          body: { circuit: document.circuit, layout: document.layout, message, parentRevisionId },
        },
      );
      onSaved(revision);
    } catch (error) {
      if (error instanceof DesignApiError && error.status === 409 && error.detail) {
        setConflict(error.detail as Conflict);
      } else {
        setProblem(error instanceof Error ? error.message : String(error));
      }
    } finally {
      setBusy(false);
    }
  });

  const fork = async () => {
    setBusy(true);
    setProblem(null);
    try {
      const title = `${document.circuit.title || "Design"} (my version)`.slice(0, 120);
      const { design } = await designsFetch<{ design: { id: string } }>(`/api/workspaces/${workspaceId}/designs`, {
        method: "POST",
        body: {
          title,
          circuit: document.circuit,
          message: form.getValues("message") || "Forked after a conflicting save",
        },
      });
      setForked(design.id);
    } catch (error) {
      setProblem(error instanceof Error ? error.message : String(error));
    } finally {
      setBusy(false);
    }
  };

  return (
    <div
      role="dialog"
      aria-modal="true"
      aria-labelledby="save-title"
      className="fixed inset-0 z-50 flex items-start justify-center bg-ink/30 p-4 pt-24"
    >
      <div className="w-full max-w-md rounded-md border border-rule bg-paper p-5 shadow-xl">
        <h2 id="save-title" className="mb-3 font-display text-lg">
          {conflict ? "Someone saved first" : "Save a revision"}
        </h2>
        {!conflict && (
          <form onSubmit={save} className="space-y-3" noValidate>
            <label htmlFor="revision-message" className="block text-sm font-medium">
              What changed?
            </label>
            <textarea
              id="revision-message"
              rows={3}
              className="w-full rounded border border-rule bg-white/80 px-2 py-1 text-sm outline-none focus:border-brass aria-[invalid=true]:border-caution"
              aria-invalid={form.formState.errors.message ? true : undefined}
              {...form.register("message")}
            />
            {form.formState.errors.message && (
              <p className="text-sm text-caution">{form.formState.errors.message.message}</p>
            )}
            <div className="flex justify-end gap-2">
              <button type="button" className={secondaryButton} onClick={onClose} disabled={busy}>
                Cancel
              </button>
              <button type="submit" className={primaryButton} disabled={busy}>
                {busy ? "Saving…" : "Save revision"}
              </button>
            </div>
          </form>
        )}
        {conflict && (
          <div className="space-y-3 text-sm" data-testid="save-conflict">
            <p>
              {conflict.authorName ?? "Someone"} saved r{conflict.headNumber} at{" "}
              {new Date(conflict.savedAt).toLocaleString()} after you started. Your work was not saved, and it is still
              here.
            </p>
            {forked ? (
              <p>
                Your version is now a new design.{" "}
                <a className="underline" href={`../../designs/${forked}/bench`}>
                  Open it
                </a>
                .
              </p>
            ) : (
              <div className="flex flex-col gap-2">
                <button type="button" className={primaryButton} onClick={fork} disabled={busy}>
                  Fork my version as a new design
                </button>
                <button
                  type="button"
                  className={secondaryButton}
                  disabled={busy}
                  onClick={async () => {
                    setBusy(true);
                    try {
                      await onLoadTheirs(conflict.headRevisionId);
                    } catch (error) {
                      setProblem(error instanceof Error ? error.message : String(error));
                    } finally {
                      setBusy(false);
                    }
                  }}
                >
                  Load r{conflict.headNumber} and keep mine as a local draft
                </button>
                <button type="button" className="text-ink-soft underline" onClick={onClose}>
                  Keep editing mine
                </button>
              </div>
            )}
          </div>
        )}
        {problem && (
          <p role="alert" className="mt-3 text-sm text-caution">
            {problem}
          </p>
        )}
      </div>
    </div>
  );
}
