"use client";

import { zodResolver } from "@hookform/resolvers/zod";
import { useMutation } from "@tanstack/react-query";
import { useRouter } from "next/navigation";
import { useState } from "react";
import { useForm } from "react-hook-form";
import { z } from "zod";
import { saveRevisionSchema } from "@/components/schemas/design";
import { primaryButton } from "@/components/ui/buttons";
import { Notice } from "@/components/ui/notice";
import type { HeadConflict } from "./design-types";
import { DesignApiError, designsFetch, designUrl } from "./designs-api";
import { formatTime } from "./format-time";
import { readCircuitText } from "./read-circuit-file";

const formSchema = saveRevisionSchema.pick({ message: true }).extend({ text: z.string() });
type FormValues = z.input<typeof formSchema>;

/**
 * Saves a new revision from a pasted or uploaded circuit file. It names the head it started from; when someone saved
 * first the server answers 409, the draft stays in the box untouched, and the form says who saved and when.
 */
export function SaveRevisionForm({ workspaceId, designId, headRevisionId }: { workspaceId: string; designId: string; headRevisionId: string | null }) {
  const router = useRouter();
  const [conflict, setConflict] = useState<HeadConflict | null>(null);
  const [saved, setSaved] = useState<number | null>(null);
  const form = useForm<FormValues>({ resolver: zodResolver(formSchema), defaultValues: { message: "", text: "" } });
  const save = useMutation({
    mutationFn: (body: unknown) =>
      designsFetch<{ revision: { number: number } }>(`${designUrl(workspaceId, designId)}/revisions`, { method: "POST", body }),
    onSuccess: ({ revision }) => {
      setSaved(revision.number);
      setConflict(null);
      form.reset({ message: "", text: "" });
      router.refresh();
    },
    onError: (error) => {
      if (error instanceof DesignApiError && error.status === 409) {
        setConflict((error.detail as HeadConflict) ?? null);
        // Fetch the newer head into the history; the form's state (the draft) survives a refresh.
        router.refresh();
      }
    },
  });
  const submit = form.handleSubmit((values) => {
    const read = readCircuitText(values.text);
    if (!read.ok) return form.setError("text", { message: read.message });
    setSaved(null);
    save.mutate({ parentRevisionId: headRevisionId, circuit: read.circuit, message: values.message });
  });

  return (
    <form onSubmit={submit} className="space-y-3" aria-label="Save a revision" noValidate>
      <label className="flex flex-col gap-1 text-sm">
        <span className="font-medium">Circuit file (.json)</span>
        <input
          type="file"
          accept=".json,application/json"
          onChange={async (e) => {
            const file = e.target.files?.[0];
            if (file) form.setValue("text", await file.text());
          }}
        />
      </label>
      <label className="flex flex-col gap-1 text-sm">
        <span className="font-medium">…or paste the circuit file</span>
        <textarea
          {...form.register("text")}
          rows={5}
          aria-invalid={form.formState.errors.text ? true : undefined}
          className="rounded-md border border-rule bg-white/70 px-3 py-2 font-mono text-xs outline-none focus:border-brass"
        />
      </label>
      {form.formState.errors.text ? <p className="text-sm text-caution">{form.formState.errors.text.message}</p> : null}
      <label className="flex flex-col gap-1 text-sm">
        <span className="font-medium">What changed</span>
        <input
          {...form.register("message")}
          aria-invalid={form.formState.errors.message ? true : undefined}
          className="rounded-md border border-rule bg-white/70 px-3 py-2 outline-none focus:border-brass"
          placeholder="e.g. Source resistor 4k7 → 3k3 for more headroom"
        />
      </label>
      {form.formState.errors.message ? <p className="text-sm text-caution">{form.formState.errors.message.message}</p> : null}
      {save.isError ? (
        <Notice tone="error">
          {save.error.message}
          {conflict ? (
            <span className="mt-1 block">
              r{conflict.headNumber} was saved by {conflict.authorName ?? "someone"} at {formatTime(conflict.savedAt)}. Your draft is still
              in the box above. Look at r{conflict.headNumber} in the history; “Save revision” again puts your draft on top of it.
            </span>
          ) : null}
        </Notice>
      ) : null}
      {saved ? <Notice tone="done">Saved as r{saved}.</Notice> : null}
      <button type="submit" className={primaryButton} disabled={save.isPending}>
        {save.isPending ? "Saving…" : "Save revision"}
      </button>
    </form>
  );
}
