"use client";
/**
 * Photos and PDFs of a design (or of one review): choose a file and an optional caption, upload with a progress bar,
 * see who attached what and when, download (always as a file, never opened on Backplate's page), delete where the
 * role allows. The limits are shown before choosing; the server's refusal is shown as it says what to fix.
 */
import { useMutation, useQuery, useQueryClient } from "@tanstack/react-query";
import { useRef, useState } from "react";
import { apiFetch } from "@/components/api/client";
import type { Role } from "@/components/auth/roles";
import { formatTime } from "@/components/designs/format-time";
import {
  ATTACHMENT_ACCEPT,
  ATTACHMENT_LIMITS_TEXT,
  type AttachmentSummary,
  attachmentFieldsSchema,
  CAPTION_MAX_CHARS,
  MAX_ATTACHMENT_BYTES,
  mayDeleteAttachment,
} from "@/components/schemas/attachment";
import { primaryButton } from "@/components/ui/buttons";
import { Notice } from "@/components/ui/notice";
import { formatSize } from "./format-size";
import { uploadWithProgress } from "./upload-with-progress";

type AttachmentRow = AttachmentSummary;

const input = "rounded-md border border-rule bg-white/70 px-2 py-1.5 text-sm outline-none focus:border-brass";

export function AttachmentsPanel(props: { workspaceId: string; designId: string; reviewId?: string; role: Role; userId: string; canUpload: boolean }) {
  const url = `/api/workspaces/${props.workspaceId}/designs/${props.designId}/attachments`;
  const listUrl = props.reviewId ? `${url}?reviewId=${props.reviewId}` : url;
  const key = ["attachments", props.designId, props.reviewId ?? "design"];
  const queryClient = useQueryClient();
  const list = useQuery({ queryKey: key, queryFn: () => apiFetch<{ attachments: AttachmentRow[] }>(listUrl) });
  const fileInput = useRef<HTMLInputElement>(null);
  const [file, setFile] = useState<File | null>(null);
  const [caption, setCaption] = useState("");
  const [progress, setProgress] = useState<number | null>(null);
  const [error, setError] = useState<string | null>(null);
  const [done, setDone] = useState<string | null>(null);

  const choose = (chosen: File | undefined) => {
    setError(null);
    setDone(null);
    setFile(chosen ?? null);
    if (chosen && chosen.size > MAX_ATTACHMENT_BYTES) {
      setError(`${chosen.name} is ${formatSize(chosen.size)}; attachments are limited to ${formatSize(MAX_ATTACHMENT_BYTES)}. Choose a smaller file.`);
    }
  };

  const upload = async () => {
    if (!file) return setError("Choose a file to attach first.");
    const fields = attachmentFieldsSchema.safeParse({ caption, reviewId: props.reviewId ?? "" });
    if (!fields.success) return setError(fields.error.issues[0].message);
    const form = new FormData();
    form.set("file", file);
    form.set("caption", fields.data.caption ?? "");
    if (props.reviewId) form.set("reviewId", props.reviewId);
    setError(null);
    setDone(null);
    setProgress(0);
    try {
      const saved = await uploadWithProgress<{ attachment: { filename: string } }>(url, form, setProgress);
      setDone(`Attached ${saved.attachment.filename}.`);
      setFile(null);
      setCaption("");
      if (fileInput.current) fileInput.current.value = "";
      await queryClient.invalidateQueries({ queryKey: key });
    } catch (e) {
      setError(e instanceof Error ? e.message : String(e));
    } finally {
      setProgress(null);
    }
  };

  const remove = useMutation({
    mutationFn: (row: AttachmentRow) => apiFetch<void>(`${url}/${row.id}`, { method: "DELETE" }),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: key }),
  });

  const rows = list.data?.attachments ?? [];
  const busy = progress !== null;
  return (
    <div className="space-y-3" data-testid="attachments">
      {props.canUpload ? (
        <div className="space-y-2">
          <p className="text-xs text-ink-soft">Attach {ATTACHMENT_LIMITS_TEXT}. Files are offered as downloads only.</p>
          <label className="flex flex-col gap-1 text-sm">
            File
            <input ref={fileInput} type="file" accept={ATTACHMENT_ACCEPT} disabled={busy} onChange={(e) => choose(e.target.files?.[0])} className="text-xs" />
          </label>
          <label className="flex flex-col gap-1 text-sm">
            Caption (optional)
            <input
              className={input}
              value={caption}
              maxLength={CAPTION_MAX_CHARS}
              disabled={busy}
              placeholder="e.g. prototype 2, capsule side"
              onChange={(e) => setCaption(e.target.value)}
            />
          </label>
          <div className="flex items-center gap-3">
            <button type="button" className={primaryButton} disabled={busy || !file} onClick={upload}>
              {busy ? "Uploading…" : "Attach"}
            </button>
            {busy ? (
              <progress className="h-2 flex-1" max={1} value={progress ?? 0} aria-label="Upload progress">
                {Math.round((progress ?? 0) * 100)} %
              </progress>
            ) : null}
          </div>
          {error ? <Notice tone="error">{error}</Notice> : null}
          {done ? <Notice tone="done">{done}</Notice> : null}
        </div>
      ) : null}
      {list.error ? <Notice tone="error">{list.error.message}</Notice> : null}
      {remove.error ? <Notice tone="error">{remove.error.message}</Notice> : null}
      {list.isPending ? <p className="text-sm text-ink-soft">Loading attachments…</p> : null}
      {list.isSuccess && rows.length === 0 ? <p className="text-sm text-ink-soft">No attachments yet.</p> : null}
      {rows.length > 0 ? (
        <ul className="divide-y divide-rule text-sm" aria-label="Attachments, newest first">
          {rows.map((row) => (
            <li key={row.id} className="flex items-start justify-between gap-2 py-2">
              <div className="min-w-0 flex-1">
                <a href={`${url}/${row.id}`} download={row.filename} className="break-all font-medium underline underline-offset-2">
                  {row.filename}
                </a>
                {row.caption ? <p className="break-words text-ink">{row.caption}</p> : null}
                <p className="text-xs text-ink-soft">
                  {formatSize(row.sizeBytes)} · {row.uploadedByName ?? "—"} · {formatTime(row.createdAt)}
                  {!props.reviewId && row.reviewId ? " · in a review" : ""}
                </p>
              </div>
              {mayDeleteAttachment(props.role, row.uploadedById === props.userId) ? (
                <button
                  type="button"
                  className="shrink-0 text-xs text-caution underline disabled:opacity-50"
                  disabled={remove.isPending}
                  aria-label={`Delete ${row.filename}`}
                  onClick={() => {
                    if (window.confirm(`Delete ${row.filename}? It cannot be brought back.`)) remove.mutate(row);
                  }}
                >
                  Delete
                </button>
              ) : null}
            </li>
          ))}
        </ul>
      ) : null}
    </div>
  );
}
