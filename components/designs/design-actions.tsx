"use client";

import { useMutation } from "@tanstack/react-query";
import { useRouter } from "next/navigation";
import { useState } from "react";
import { can } from "@/components/auth/roles";
import { designTitleSchema } from "@/components/schemas/design";
import { dangerButton, secondaryButton } from "@/components/ui/buttons";
import { Notice } from "@/components/ui/notice";
import { useMyWorkspaces } from "@/components/workspaces/use-workspaces";
import { designsFetch, designUrl } from "./designs-api";
import { Panel } from "./panel";

interface Props {
  workspaceId: string;
  slug: string;
  designId: string;
  title: string;
  deleted: boolean;
  canEdit: boolean;
  canDelete: boolean;
}

const input = "rounded-md border border-rule bg-white/70 px-3 py-1.5 text-sm outline-none focus:border-brass";

/** Rename, and delete or restore — each shown only to the roles the server lets do it. */
export function DesignActions(props: Props) {
  const router = useRouter();
  const [title, setTitle] = useState(props.title);
  const [titleError, setTitleError] = useState<string | null>(null);
  const url = designUrl(props.workspaceId, props.designId);
  const rename = useMutation({
    mutationFn: (next: string) => designsFetch(url, { method: "PATCH", body: { title: next } }),
    onSuccess: () => router.refresh(),
  });
  const remove = useMutation({
    mutationFn: () =>
      designsFetch(props.deleted ? `${url}/restore` : url, { method: props.deleted ? "POST" : "DELETE" }),
    onSuccess: () => router.refresh(),
  });
  return (
    <div className="space-y-4">
      {props.canEdit && !props.deleted ? (
        <form
          className="flex flex-wrap items-end gap-2"
          aria-label="Rename the design"
          onSubmit={(e) => {
            e.preventDefault();
            const parsed = designTitleSchema.safeParse(title);
            if (!parsed.success) return setTitleError(parsed.error.issues[0].message);
            setTitleError(null);
            rename.mutate(parsed.data);
          }}
        >
          <label className="flex min-w-0 flex-1 flex-col gap-1 text-sm">
            <span className="font-medium">Title</span>
            <input
              value={title}
              onChange={(e) => setTitle(e.target.value)}
              className={input}
              aria-invalid={titleError ? true : undefined}
            />
          </label>
          <button type="submit" className={secondaryButton} disabled={rename.isPending}>
            Rename
          </button>
          {titleError ? <p className="w-full text-sm text-caution">{titleError}</p> : null}
        </form>
      ) : null}
      {rename.isError ? <Notice tone="error">{rename.error.message}</Notice> : null}
      {props.canDelete ? (
        <div>
          <button
            type="button"
            className={props.deleted ? secondaryButton : dangerButton}
            onClick={() => remove.mutate()}
            disabled={remove.isPending}
          >
            {props.deleted ? "Restore design" : "Delete design"}
          </button>
          {!props.deleted ? (
            <p className="mt-1 text-xs text-ink-soft">
              Deleted designs leave the table and can be restored from “Deleted designs”.
            </p>
          ) : null}
          {remove.isError ? <Notice tone="error">{remove.error.message}</Notice> : null}
        </div>
      ) : null}
    </div>
  );
}

/** Fork into a workspace where the person is a designer or an owner; nothing shows for someone who has none. */
export function ForkPanel({ workspaceId, designId }: { workspaceId: string; designId: string }) {
  const router = useRouter();
  const workspaces = useMyWorkspaces();
  const targets = (workspaces.data ?? []).filter((w) => can(w.role, "design.create"));
  const [target, setTarget] = useState("");
  const fork = useMutation({
    mutationFn: (targetWorkspaceId: string) =>
      designsFetch<{ design: { id: string } }>(`${designUrl(workspaceId, designId)}/fork`, {
        method: "POST",
        body: { targetWorkspaceId },
      }),
    onSuccess: ({ design }) => {
      const slug = targets.find((w) => w.workspaceId === (target || targets[0]?.workspaceId))?.slug;
      if (slug) router.push(`/w/${slug}/designs/${design.id}`);
    },
  });
  if (workspaces.isPending || targets.length === 0) return null;
  return (
    <Panel title="Fork">
      <form
        className="flex flex-wrap items-end gap-2"
        aria-label="Fork the design"
        onSubmit={(e) => {
          e.preventDefault();
          fork.mutate(target || targets[0].workspaceId);
        }}
      >
        <label className="flex min-w-0 flex-1 flex-col gap-1 text-sm">
          <span className="font-medium">Fork the latest revision into</span>
          <select
            value={target || targets[0].workspaceId}
            onChange={(e) => setTarget(e.target.value)}
            className={input}
          >
            {targets.map((w) => (
              <option key={w.workspaceId} value={w.workspaceId}>
                {w.name}
              </option>
            ))}
          </select>
        </label>
        <button type="submit" className={secondaryButton} disabled={fork.isPending}>
          Fork
        </button>
        {fork.isError ? <p className="w-full text-sm text-caution">{fork.error.message}</p> : null}
      </form>
    </Panel>
  );
}
