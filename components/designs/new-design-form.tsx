"use client";

import { zodResolver } from "@hookform/resolvers/zod";
import { useMutation, useQueryClient } from "@tanstack/react-query";
import { useRouter } from "next/navigation";
import { useState } from "react";
import { useForm } from "react-hook-form";
import { z } from "zod";
import { STARTING_POINTS, startingPointFiles } from "@/components/bench/starting-points/starting-points";
import { createDesignSchema } from "@/components/schemas/design";
import { primaryButton, secondaryButton } from "@/components/ui/buttons";
import { Field } from "@/components/ui/field";
import { Notice } from "@/components/ui/notice";
import type { DesignRow } from "./design-types";
import { designsFetch, designsUrl } from "./designs-api";
import { designsKey } from "./designs-table";
import { readCircuitText } from "./read-circuit-file";

/** How a design can start: empty, from a starting point (`point:<id>`), or from a circuit file. */
const STARTS = ["empty", "file", ...STARTING_POINTS.map((p) => `point:${p.id}`)] as const;

/** The form's fields: the API's title rule, plus how to start (the file's text is read into `circuit` on submit). */
const formSchema = createDesignSchema
  .pick({ title: true })
  .extend({ start: z.enum(STARTS, { error: "Choose how the design starts." }), text: z.string() });
type FormValues = z.input<typeof formSchema>;

/**
 * What a starting point's create request carries: its circuit under the design's own title (the topology's name goes
 * in the file's notes, as the bench's "Start from…" does) and its drawing, so the bench opens with it placed.
 */
function startingPointBody(title: string, id: string) {
  const point = STARTING_POINTS.find((p) => p.id === id);
  const files = startingPointFiles(id);
  if (!point || !files) return null;
  const circuit = { ...(files.circuit as Record<string, unknown>), title, notes: point.title };
  return { title, circuit, layout: files.layout as unknown as Record<string, unknown>, message: `Started from “${point.title}”` };
}

/** "New design": a title, then the empty starting circuit, one of the starting points, or a circuit file. */
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
    if (values.start.startsWith("point:")) {
      const body = startingPointBody(values.title, values.start.slice("point:".length));
      if (!body) return form.setError("start", { message: "That starting point is no longer offered. Choose another." });
      return create.mutate(body);
    }
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
        {STARTING_POINTS.map((point) => (
          <label key={point.id} className="flex items-start gap-2">
            <input type="radio" value={`point:${point.id}`} {...form.register("start")} className="mt-1" />
            <span>
              <span className="block">{point.title}</span>
              <span className="block text-xs text-ink-soft">{point.summary}</span>
            </span>
          </label>
        ))}
        <label className="flex items-center gap-2">
          <input type="radio" value="file" {...form.register("start")} /> A circuit file (upload or paste)
        </label>
        {form.formState.errors.start ? <p className="text-sm text-caution">{form.formState.errors.start.message}</p> : null}
        <p className="text-xs text-ink-soft">Starting points are generic circuits of the trade with invented starting values.</p>
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
