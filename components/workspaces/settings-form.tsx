"use client";

import { zodResolver } from "@hookform/resolvers/zod";
import { useMutation, useQueryClient } from "@tanstack/react-query";
import { useRouter } from "next/navigation";
import { useForm } from "react-hook-form";
import { apiFetch } from "@/components/api/client";
import { type WorkspaceSettingsInput, workspaceSettingsSchema } from "@/components/schemas/workspace";
import { dangerButton, primaryButton } from "@/components/ui/buttons";
import { Field } from "@/components/ui/field";
import { Notice } from "@/components/ui/notice";
import { WORKSPACES_KEY } from "./use-workspaces";

interface Settings {
  name: string;
  allowPublicLinks: boolean;
  allowSelfApproval: boolean;
}

export function WorkspaceSettingsForm({ workspaceId, initial }: { workspaceId: string; initial: Settings }) {
  const queryClient = useQueryClient();
  const router = useRouter();
  const { register, handleSubmit, formState } = useForm<WorkspaceSettingsInput>({
    resolver: zodResolver(workspaceSettingsSchema),
    defaultValues: initial,
  });
  const save = useMutation({
    mutationFn: (input: WorkspaceSettingsInput) => apiFetch(`/api/workspaces/${workspaceId}`, { method: "PATCH", body: input }),
    onSuccess: async () => {
      await queryClient.invalidateQueries({ queryKey: WORKSPACES_KEY });
      router.refresh();
    },
  });
  const remove = useMutation({
    mutationFn: () => apiFetch(`/api/workspaces/${workspaceId}`, { method: "DELETE" }),
    onSuccess: async () => {
      await queryClient.invalidateQueries({ queryKey: WORKSPACES_KEY });
      router.push("/workspaces");
    },
  });
  return (
    <div className="flex flex-col gap-8">
      <form onSubmit={handleSubmit((v) => save.mutate(v))} noValidate className="flex flex-col gap-5 rounded-lg border border-rule bg-paper-deep/60 p-5" aria-label="Workspace settings">
        {save.isError ? <Notice tone="error">{save.error.message}</Notice> : null}
        {save.isSuccess ? <Notice tone="done">Settings saved.</Notice> : null}
        <Field id="settings-name" label="Workspace name" error={formState.errors.name?.message} {...register("name")} />
        <label className="flex items-start gap-3">
          <input type="checkbox" className="mt-1 h-4 w-4 accent-brass" {...register("allowPublicLinks")} />
          <span>
            <span className="block font-medium">Allow public bench links</span>
            <span className="text-sm text-ink-soft">A bench link marked public opens its revision without signing in.</span>
          </span>
        </label>
        <label className="flex items-start gap-3">
          <input type="checkbox" className="mt-1 h-4 w-4 accent-brass" {...register("allowSelfApproval")} />
          <span>
            <span className="block font-medium">Allow self-approval</span>
            <span className="text-sm text-ink-soft">Whether someone may approve a revision they saved themselves.</span>
          </span>
        </label>
        <div>
          <button type="submit" className={primaryButton} disabled={save.isPending}>
            {save.isPending ? "Saving…" : "Save settings"}
          </button>
        </div>
      </form>
      <section className="rounded-lg border border-caution/40 bg-caution-bg/50 p-5">
        <h2 className="text-lg font-bold text-caution">Delete the workspace</h2>
        <p className="mb-4 mt-1 text-sm text-ink-soft">Deletes every design, revision, bench link and member of {initial.name}. This cannot be undone.</p>
        {remove.isError ? <Notice tone="error">{remove.error.message}</Notice> : null}
        <button
          type="button"
          className={dangerButton}
          disabled={remove.isPending}
          onClick={() => {
            const typed = window.prompt(`Type the workspace's name (${initial.name}) to delete it.`);
            if (typed === initial.name) remove.mutate();
          }}
        >
          Delete workspace
        </button>
      </section>
    </div>
  );
}
