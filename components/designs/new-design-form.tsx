"use client";

import { zodResolver } from "@hookform/resolvers/zod";
import { useMutation, useQueryClient } from "@tanstack/react-query";
import { useRouter } from "next/navigation";
import { useState } from "react";
import { useForm } from "react-hook-form";
import { z } from "zod";
import { createDesignSchema } from "@/components/schemas/design";
import { primaryButton, secondaryButton } from "@/components/ui/buttons";
import { Field } from "@/components/ui/field";
import { Notice } from "@/components/ui/notice";
import type { DesignRow } from "./design-types";
import { designsFetch, designsUrl } from "./designs-api";
import { designsKey } from "./designs-table";
import { readCircuitText } from "./read-circuit-file";

/** The form's fields: the API's title rule, plus how to start (the file's text is read into `circuit` on submit). */
const formSchema = createDesignSchema.pick({ title: true }).extend({ start: z.enum(["empty", "file"]), text: z.string() });
type FormValues = z.input<typeof formSchema>;

/** "New design": a title, then the empty starting circuit or a circuit file uploaded or pasted. */
export function NewDesignForm({ workspaceId, slug }: { workspaceId: string; slug: string }) {
  const [open, setOpen] = useState(false);
  const router = useRouter();
  const queryClient = useQueryClient();
  const form = useForm<FormValues>({ resolver: zodResolver(formSchema), defaultValues: { title: "", start: "empty", text: "" } });
  const start = form.watch("start");
  const create = useMutation({
    mutationFn: (body: unknown) => designsFetch<{ design: DesignRow }>(designsUrl(workspaceId), { method: "POST", body }),
    onSuccess: async ({ design }) => {
      await queryClient.invalidateQueries({ queryKey: designsKey(workspaceId) });
      router.push(`/w/${slug}/designs/${design.id}`);
    },
  });

  const submit = form.handleSubmit((values) => {
    if (values.start === "empty") return create.mutate({ title: values.title });
    const read = readCircuitText(values.text);
    if (!read.ok) return form.setError("text", { message: read.message });
    create.mutate({ title: values.title, circuit: read.circuit });
  });

  async function loadFile(file: File | undefined) {
    if (!file) return;
    form.setValue("text", await file.text(), { shouldValidate: false });
    if (!form.getValues("title")) form.setValue("title", file.name.replace(/\.json$/i, ""));
  }

  if (!open) {
    return (
      <button type="button" className={primaryButton} onClick={() => setOpen(true)}>
        New design
      </button>
    );
  }
  return (
    <form onSubmit={submit} className="space-y-4 rounded-md border border-rule bg-paper-deep/60 p-4" aria-label="New design" noValidate>
      <Field id="new-design-title" label="Title" {...form.register("title")} error={form.formState.errors.title?.message} />
      <fieldset className="space-y-2 text-sm">
        <legend className="font-medium">Start from</legend>
        <label className="flex items-center gap-2">
          <input type="radio" value="empty" {...form.register("start")} /> An empty circuit
        </label>
        <label className="flex items-center gap-2">
          <input type="radio" value="file" {...form.register("start")} /> A circuit file (upload or paste)
        </label>
      </fieldset>
      {start === "file" ? (
        <div className="space-y-2">
          <label className="flex flex-col gap-1 text-sm">
            <span className="font-medium">Circuit file (.json)</span>
            <input type="file" accept=".json,application/json" onChange={(e) => loadFile(e.target.files?.[0])} />
          </label>
          <label className="flex flex-col gap-1 text-sm">
            <span className="font-medium">…or paste it here</span>
            <textarea
              {...form.register("text")}
              rows={6}
              aria-invalid={form.formState.errors.text ? true : undefined}
              className="rounded-md border border-rule bg-white/70 px-3 py-2 font-mono text-xs outline-none focus:border-brass"
            />
          </label>
          {form.formState.errors.text ? <p className="text-sm text-caution">{form.formState.errors.text.message}</p> : null}
        </div>
      ) : null}
      {create.isError ? <Notice tone="error">{create.error.message}</Notice> : null}
      <div className="flex flex-wrap gap-2">
        <button type="submit" className={primaryButton} disabled={create.isPending}>
          {create.isPending ? "Creating…" : "Create design"}
        </button>
        <button type="button" className={secondaryButton} onClick={() => setOpen(false)}>
          Cancel
        </button>
      </div>
    </form>
  );
}
