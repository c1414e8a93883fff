"use client";

import { zodResolver } from "@hookform/resolvers/zod";
import { useMutation, useQueryClient } from "@tanstack/react-query";
import { PageLink } from "@/components/ui/page-link";
import { useRouter } from "next/navigation";
import { useForm } from "react-hook-form";
import { ApiError, apiFetch } from "@/components/api/client";
import { ROLE_LABELS } from "@/components/auth/roles";
import { type WorkspaceCreateInput, workspaceCreateSchema } from "@/components/schemas/workspace";
import { primaryButton } from "@/components/ui/buttons";
import { Field } from "@/components/ui/field";
import { Notice } from "@/components/ui/notice";
import { type MyWorkspace, useMyWorkspaces, WORKSPACES_KEY } from "./use-workspaces";

/** The caller's workspaces (loading, empty, error states) and a form to create one. */
export function WorkspaceList() {
  const workspaces = useMyWorkspaces();
  return (
    <div className="grid gap-8 md:grid-cols-[1.4fr_1fr]">
      <section aria-label="Your workspaces">
        {workspaces.isPending ? (
          <p className="text-ink-soft">Loading your workspaces…</p>
        ) : workspaces.isError ? (
          <Notice tone="error">
            {workspaces.error.message}{" "}
            <button type="button" className="underline" onClick={() => workspaces.refetch()}>
              Try again
            </button>
          </Notice>
        ) : workspaces.data.length === 0 ? (
          <Notice>
            You are not in a workspace yet. Create one beside this list, or open the invitation link an owner sent you.
          </Notice>
        ) : (
          <ul className="flex flex-col gap-3">
            {workspaces.data.map((workspace) => (
              <li key={workspace.workspaceId}>
                <PageLink
                  href={`/w/${workspace.slug}`}
                  className="flex items-center justify-between rounded-lg border border-rule bg-paper p-4 hover:border-brass"
                >
                  <span>
                    <span className="block font-display text-lg font-bold">{workspace.name}</span>
                    <span className="font-mono text-xs text-ink-soft">/w/{workspace.slug}</span>
                  </span>
                  <span className="rounded-full bg-paper-deep px-3 py-1 text-xs font-medium text-ink-soft">
                    {ROLE_LABELS[workspace.role]}
                  </span>
                </PageLink>
              </li>
            ))}
          </ul>
        )}
      </section>
      <CreateWorkspaceForm />
    </div>
  );
}

function CreateWorkspaceForm() {
  const router = useRouter();
  const queryClient = useQueryClient();
  const { register, handleSubmit, formState, setError } = useForm<WorkspaceCreateInput>({
    resolver: zodResolver(workspaceCreateSchema),
  });
  const create = useMutation({
    mutationFn: (input: WorkspaceCreateInput) =>
      apiFetch<{ workspace: MyWorkspace }>("/api/workspaces", { method: "POST", body: input }),
    onSuccess: async ({ workspace }) => {
      await queryClient.invalidateQueries({ queryKey: WORKSPACES_KEY });
      router.push(`/w/${workspace.slug}`);
    },
    onError: (error) => {
      if (error instanceof ApiError && error.fields?.name) setError("name", { message: error.fields.name });
    },
  });
  return (
    <section className="rounded-lg border border-rule bg-paper-deep/60 p-5">
      <h2 className="mb-3 text-lg font-bold">New workspace</h2>
      <form onSubmit={handleSubmit((values) => create.mutate(values))} noValidate className="flex flex-col gap-4">
        {create.isError && !(create.error instanceof ApiError && create.error.fields) ? (
          <Notice tone="error">{create.error.message}</Notice>
        ) : null}
        <Field
          id="workspace-name"
          label="Name"
          hint="Your team or company. You become its owner."
          error={formState.errors.name?.message}
          {...register("name")}
        />
        <div>
          <button type="submit" className={primaryButton} disabled={create.isPending}>
            {create.isPending ? "Creating…" : "Create workspace"}
          </button>
        </div>
      </form>
    </section>
  );
}
