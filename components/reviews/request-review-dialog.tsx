"use client";

import { useRouter } from "next/navigation";
import { useRef, useState } from "react";
import { ROLE_LABELS, type Role } from "@/components/auth/roles";
import { createReviewSchema } from "@/components/schemas/review";
import { primaryButton, secondaryButton } from "@/components/ui/buttons";
import { requestReview } from "./reviews-api";
import { useSubmit } from "./use-submit";

export interface ReviewerOption {
  id: string;
  name: string | null;
  email: string;
  role: Role;
}

/** "Request review": pick reviewers, a due day and a message for one revision. Opens the review when sent. */
export function RequestReviewDialog({ designId, revisions, reviewers }: { designId: string; revisions: { id: string; number: number }[]; reviewers: ReviewerOption[] }) {
  const dialog = useRef<HTMLDialogElement>(null);
  const router = useRouter();
  const [revisionId, setRevisionId] = useState(revisions[0]?.id ?? "");
  const [picked, setPicked] = useState<string[]>([]);
  const [dueAt, setDueAt] = useState("");
  const [message, setMessage] = useState("");
  const { submit, error, busy, clear } = useSubmit(createReviewSchema, async (input) => {
    const { path } = await requestReview(designId, input);
    dialog.current?.close();
    router.push(path);
  });
  // a refusal ("Pick at least one reviewer") is about the choices: changing them takes it away until the next send
  const toggle = (id: string) => {
    clear();
    setPicked((now) => (now.includes(id) ? now.filter((x) => x !== id) : [...now, id]));
  };
  return (
    <>
      <button type="button" className={primaryButton} onClick={() => dialog.current?.showModal()} disabled={revisions.length === 0}>
        Request review
      </button>
      <dialog ref={dialog} aria-labelledby="request-review-title" className="m-auto w-[min(32rem,calc(100vw-2rem))] rounded-lg border border-rule bg-paper p-0 text-ink backdrop:bg-ink/40">
        <form
          className="space-y-4 p-5"
          onSubmit={(event) => {
            event.preventDefault();
            void submit({ revisionId, reviewerIds: picked, dueAt, message });
          }}
        >
          <h2 id="request-review-title" className="font-display text-lg font-semibold">
            Request review
          </h2>
          <label className="block text-sm font-medium">
            Revision
            <select value={revisionId} onChange={(e) => setRevisionId(e.target.value)} className="mt-1 w-full rounded-md border border-rule bg-white/70 px-2 py-1.5">
              {revisions.map((r) => (
                <option key={r.id} value={r.id}>
                  r{r.number}
                </option>
              ))}
            </select>
          </label>
          <fieldset>
            <legend className="text-sm font-medium">Reviewers</legend>
            {reviewers.length === 0 ? <p className="text-sm text-ink-soft">No one in this workspace can review yet: invite a reviewer.</p> : null}
            <ul className="mt-1 max-h-48 space-y-1 overflow-y-auto">
              {reviewers.map((r) => (
                <li key={r.id}>
                  <label className="flex items-center gap-2 text-sm">
                    <input type="checkbox" checked={picked.includes(r.id)} onChange={() => toggle(r.id)} />
                    <span className="min-w-0 truncate">{r.name ?? r.email}</span>
                    <span className="text-xs text-ink-soft">{ROLE_LABELS[r.role]}</span>
                  </label>
                </li>
              ))}
            </ul>
          </fieldset>
          <label className="block text-sm font-medium">
            Due by (optional)
            <input type="date" value={dueAt} onChange={(e) => {
                clear();
                setDueAt(e.target.value);
              }} className="mt-1 w-full rounded-md border border-rule bg-white/70 px-2 py-1.5" />
          </label>
          <label className="block text-sm font-medium">
            Message
            <textarea rows={3} value={message} onChange={(e) => setMessage(e.target.value)} className="mt-1 w-full rounded-md border border-rule bg-white/70 px-2 py-1.5" />
          </label>
          {error ? (
            <p role="alert" className="text-sm text-caution">
              {error}
            </p>
          ) : null}
          <div className="flex justify-end gap-2">
            <button type="button" className={secondaryButton} onClick={() => dialog.current?.close()}>
              Cancel
            </button>
            <button type="submit" className={primaryButton} disabled={busy}>
              Send request
            </button>
          </div>
        </form>
      </dialog>
    </>
  );
}
