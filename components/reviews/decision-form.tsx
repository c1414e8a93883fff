"use client";

import { useState } from "react";
import { decisionSchema, type Verdict } from "@/components/schemas/review";
import { primaryButton, secondaryButton } from "@/components/ui/buttons";
import { postDecision } from "./reviews-api";
import { useSubmit } from "./use-submit";

/** Approve, or ask for rework, with a reason (required either way: the sign-off report quotes it). */
export function DecisionForm({ reviewId }: { reviewId: string }) {
  const [reason, setReason] = useState("");
  const { submit, error, busy } = useSubmit(decisionSchema, (input) => postDecision(reviewId, input));
  const send = (verdict: Verdict) => void submit({ verdict, reason });
  return (
    <form aria-label="Decide" className="space-y-2" onSubmit={(e) => e.preventDefault()}>
      <label htmlFor="decision-reason" className="block text-sm font-medium">
        Reason
      </label>
      <textarea
        id="decision-reason"
        rows={3}
        value={reason}
        onChange={(e) => setReason(e.target.value)}
        className="w-full rounded-md border border-rule bg-white/70 px-2 py-1.5 text-sm outline-none focus:border-brass"
      />
      {error ? (
        <p role="alert" className="text-sm text-caution">
          {error}
        </p>
      ) : null}
      <div className="flex flex-wrap gap-2">
        <button type="button" className={primaryButton} disabled={busy} onClick={() => send("approve")}>
          Approve
        </button>
        <button type="button" className={`${secondaryButton} border-caution text-caution`} disabled={busy} onClick={() => send("rework")}>
          Ask for rework
        </button>
      </div>
    </form>
  );
}
