"use client";

import { PageLink } from "@/components/ui/page-link";
import { useState } from "react";
import { formatTime } from "@/components/designs/format-time";
import { createRemarkSchema, type RemarkAnchor } from "@/components/schemas/review";
import { secondaryButton } from "@/components/ui/buttons";
import { anchorQuery } from "./remark-outdated";
import { postRemark, setResolved } from "./reviews-api";
import { useSubmit } from "./use-submit";

export interface ThreadView {
  id: string;
  body: string;
  authorName: string | null;
  createdAt: string;
  anchor: RemarkAnchor;
  revisionNumber: number;
  resolvedAt: string | null;
  resolvedByName: string | null;
  outdated: boolean;
  replies: { id: string; body: string; authorName: string | null; createdAt: string }[];
}

/** One thread: the remark, its replies, a reply box, resolve/reopen and the way to the bench at its anchor. */
export function RemarkThread({ thread, reviewId, benchPath, canRemark }: { thread: ThreadView; reviewId: string; benchPath: string; canRemark: boolean }) {
  const [reply, setReply] = useState("");
  const replying = useSubmit(createRemarkSchema, (input) => postRemark(reviewId, input), () => setReply(""));
  const resolving = useSubmit(createRemarkSchema.options[1].pick({ parentId: true }), () => setResolved(thread.id, !thread.resolvedAt));
  const resolved = Boolean(thread.resolvedAt);
  return (
    <article id={`remark-${thread.id}`} className={`rounded-md border p-3 ${resolved ? "border-rule bg-paper-deep/40" : "border-rule bg-paper"}`} aria-label={`Remark by ${thread.authorName ?? "someone"}`}>
      <div className="mb-1 flex flex-wrap items-center gap-2 text-xs text-ink-soft">
        <span className="font-medium text-ink">{thread.authorName ?? "—"}</span>
        <span>on r{thread.revisionNumber}</span>
        <span>{formatTime(thread.createdAt)}</span>
        {thread.outdated ? (
          <span className="rounded-full border border-caution/40 bg-caution-bg px-2 py-0.5 font-medium text-caution" title="What this remark is about changed in a later revision">
            Outdated
          </span>
        ) : null}
        {resolved ? <span className="rounded-full border border-trace/40 bg-trace-light/40 px-2 py-0.5 font-medium text-ink">Resolved by {thread.resolvedByName ?? "—"}</span> : null}
      </div>
      <p className="whitespace-pre-wrap break-words text-sm text-ink">{thread.body}</p>
      {thread.replies.length > 0 ? (
        <ol className="mt-2 space-y-2 border-l-2 border-brass-light pl-3" aria-label="Replies">
          {thread.replies.map((r) => (
            <li key={r.id} className="text-sm">
              <span className="text-xs text-ink-soft">
                <span className="font-medium text-ink">{r.authorName ?? "—"}</span> · {formatTime(r.createdAt)}
              </span>
              <p className="whitespace-pre-wrap break-words">{r.body}</p>
            </li>
          ))}
        </ol>
      ) : null}
      <div className="mt-2 flex flex-wrap items-center gap-3 text-sm">
        <PageLink href={`${benchPath}${anchorQuery(thread.anchor)}`} className="text-brass-deep underline underline-offset-2">
          Open on the bench
        </PageLink>
        {canRemark ? (
          <button type="button" className="underline underline-offset-2" disabled={resolving.busy} onClick={() => resolving.submit({ parentId: thread.id })}>
            {resolved ? "Reopen" : "Resolve"}
          </button>
        ) : null}
      </div>
      {resolving.error ? <p className="mt-1 text-sm text-caution">{resolving.error}</p> : null}
      {canRemark ? (
        <form
          className="mt-2 flex flex-col gap-2 sm:flex-row"
          onSubmit={(event) => {
            event.preventDefault();
            void replying.submit({ body: reply, parentId: thread.id });
          }}
        >
          <label className="sr-only" htmlFor={`reply-${thread.id}`}>
            Reply
          </label>
          <input
            id={`reply-${thread.id}`}
            value={reply}
            onChange={(e) => setReply(e.target.value)}
            placeholder="Reply…"
            className="min-w-0 flex-1 rounded-md border border-rule bg-white/70 px-2 py-1.5 text-sm outline-none focus:border-brass"
          />
          <button type="submit" className={`${secondaryButton} px-3 py-1.5 text-sm`} disabled={replying.busy}>
            Reply
          </button>
        </form>
      ) : null}
      {replying.error ? <p className="mt-1 text-sm text-caution">{replying.error}</p> : null}
    </article>
  );
}
