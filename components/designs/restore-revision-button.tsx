"use client";

import { useMutation } from "@tanstack/react-query";
import { useRouter } from "next/navigation";
import { designsFetch, designUrl } from "./designs-api";

/** Saves an old revision's circuit again as the newest revision (history is kept, nothing is overwritten). */
export function RestoreRevisionButton(props: { workspaceId: string; designId: string; revisionId: string; number: number; headRevisionId: string }) {
  const router = useRouter();
  const restore = useMutation({
    mutationFn: () =>
      designsFetch(`${designUrl(props.workspaceId, props.designId)}/revisions/${props.revisionId}/restore`, {
        method: "POST",
        body: { parentRevisionId: props.headRevisionId },
      }),
    onSuccess: () => router.refresh(),
  });
  return (
    <span className="inline-flex flex-col items-end">
      <button
        type="button"
        onClick={() => restore.mutate()}
        disabled={restore.isPending}
        className="rounded border border-ink px-2 py-0.5 text-xs hover:bg-paper-deep disabled:opacity-60"
      >
        {restore.isPending ? "Restoring…" : `Restore r${props.number}`}
      </button>
      {restore.isError ? <span role="alert" className="mt-1 max-w-56 text-right text-xs text-caution">{restore.error.message}</span> : null}
    </span>
  );
}
