"use client";
/** Attach the rendered PDF to one of the revision's reviews (stored as an attachment of that review). */
import { useState } from "react";

export function AttachReportForm({ url, reviews }: { url: string; reviews: { id: string; label: string }[] }) {
  const [reviewId, setReviewId] = useState(reviews[0]?.id ?? "");
  const [status, setStatus] = useState<{ ok: boolean; text: string } | null>(null);
  const [busy, setBusy] = useState(false);
  if (reviews.length === 0) return <p className="text-sm text-ink-soft">This revision has no review yet; request one to attach the report to it.</p>;
  const attach = async () => {
    setBusy(true);
    setStatus(null);
    try {
      const response = await fetch(url, { method: "POST", headers: { "Content-Type": "application/json" }, body: JSON.stringify({ reviewId }), credentials: "same-origin" });
      const data = await response.json().catch(() => null);
      if (!response.ok) throw new Error(data?.error?.message ?? `The server answered ${response.status}. Try again.`);
      setStatus({ ok: true, text: `Attached ${data.attachment.filename} to the review.` });
    } catch (e) {
      setStatus({ ok: false, text: e instanceof Error ? e.message : String(e) });
    } finally {
      setBusy(false);
    }
  };
  return (
    <div className="flex flex-wrap items-end gap-2">
      <label className="flex flex-col gap-1 text-sm">
        Review
        <select value={reviewId} onChange={(e) => setReviewId(e.target.value)} className="rounded border border-rule bg-paper px-2 py-1 text-sm">
          {reviews.map((r) => <option key={r.id} value={r.id}>{r.label}</option>)}
        </select>
      </label>
      <button type="button" onClick={attach} disabled={busy} className="rounded bg-graphite px-3 py-1.5 text-sm text-paper disabled:opacity-50">
        {busy ? "Attaching…" : "Attach the PDF to this review"}
      </button>
      {status && <p role={status.ok ? "status" : "alert"} className={`w-full text-sm ${status.ok ? "text-trace" : "text-caution"}`}>{status.text}</p>}
    </div>
  );
}
