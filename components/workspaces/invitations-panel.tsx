"use client";

import { zodResolver } from "@hookform/resolvers/zod";
import { useMutation, useQuery, useQueryClient } from "@tanstack/react-query";
import { useForm } from "react-hook-form";
import { ApiError, apiFetch } from "@/components/api/client";
import { ROLE_LABELS, ROLES, type Role } from "@/components/auth/roles";
import { type InvitationCreateInput, invitationCreateSchema } from "@/components/schemas/workspace";
import { dangerButton, primaryButton } from "@/components/ui/buttons";
import { Field } from "@/components/ui/field";
import { Notice } from "@/components/ui/notice";

interface Invitation {
  id: string;
  email: string;
  role: Role;
  invitedByName: string | null;
  createdAt: string;
  expiresAt: string;
}

const invitationsKey = (workspaceId: string) => ["workspace", workspaceId, "invitations"] as const;

/** Owners: the open invitations, each with its expiry and a revoke button, and the form that sends a new one. */
export function InvitationsPanel({ workspaceId }: { workspaceId: string }) {
  const queryClient = useQueryClient();
  const url = `/api/workspaces/${workspaceId}/invitations`;
  const invitations = useQuery({
    queryKey: invitationsKey(workspaceId),
    queryFn: async () => (await apiFetch<{ invitations: Invitation[] }>(url)).invitations,
  });
  const { register, handleSubmit, formState, setError, reset } = useForm<InvitationCreateInput>({
    resolver: zodResolver(invitationCreateSchema),
    defaultValues: { role: "designer" },
  });
  const send = useMutation({
    mutationFn: (input: InvitationCreateInput) => apiFetch<{ invitation: Invitation }>(url, { method: "POST", body: input }),
    onSuccess: async () => {
      reset({ email: "", role: "designer" });
      await queryClient.invalidateQueries({ queryKey: invitationsKey(workspaceId) });
    },
    onError: (error) => {
      if (error instanceof ApiError && error.fields?.email) setError("email", { message: error.message });
    },
  });
  const revoke = useMutation({
    mutationFn: (invitationId: string) => apiFetch(url, { method: "DELETE", body: { invitationId } }),
    onSettled: () => queryClient.invalidateQueries({ queryKey: invitationsKey(workspaceId) }),
  });

  return (
    <section aria-labelledby="invitations-heading" className="grid gap-6 md:grid-cols-[1.3fr_1fr]">
      <div>
        <h2 id="invitations-heading" className="mb-3 text-xl font-bold">
          Open invitations
        </h2>
        {revoke.isError ? (
          <div className="mb-3">
            <Notice tone="error">{revoke.error.message}</Notice>
          </div>
        ) : null}
        {invitations.isPending ? (
          <p className="text-ink-soft">Loading invitations…</p>
        ) : invitations.isError ? (
          <Notice tone="error">{invitations.error.message}</Notice>
        ) : invitations.data.length === 0 ? (
          <Notice>No open invitations. Invite someone with the form.</Notice>
        ) : (
          <ul className="divide-y divide-rule overflow-hidden rounded-lg border border-rule bg-paper" aria-label="Open invitations">
            {invitations.data.map((invitation) => {
              const expired = new Date(invitation.expiresAt).getTime() < Date.now();
              return (
                <li key={invitation.id} className="flex flex-wrap items-center gap-x-4 gap-y-2 px-4 py-3" data-testid="invitation-row">
                  <div className="min-w-0 flex-1">
                    <p className="truncate font-mono text-sm">{invitation.email}</p>
                    <p className="text-xs text-ink-soft">
                      {ROLE_LABELS[invitation.role]} · {expired ? <span className="text-caution">expired</span> : "expires"}{" "}
                      {invitation.expiresAt.slice(0, 10)}
                      {invitation.invitedByName ? ` · by ${invitation.invitedByName}` : ""}
                    </p>
                  </div>
                  <button
                    type="button"
                    className={dangerButton}
                    disabled={revoke.isPending}
                    aria-label={`Revoke the invitation to ${invitation.email}`}
                    onClick={() => revoke.mutate(invitation.id)}
                  >
                    Revoke
                  </button>
                </li>
              );
            })}
          </ul>
        )}
      </div>
      <div className="rounded-lg border border-rule bg-paper-deep/60 p-5">
        <h3 className="mb-3 text-lg font-bold">Invite someone</h3>
        <form onSubmit={handleSubmit((v) => send.mutate(v))} noValidate className="flex flex-col gap-4" aria-label="Invite someone">
          {send.isError && !(send.error instanceof ApiError && send.error.fields?.email) ? (
            <Notice tone="error">{send.error.message}</Notice>
          ) : null}
          {send.isSuccess ? <Notice tone="done">Invitation sent to {send.data.invitation.email}. The link works for 7 days.</Notice> : null}
          <Field id="invite-email" label="E-mail" type="email" error={formState.errors.email?.message} {...register("email")} />
          <div className="flex flex-col gap-1">
            <label htmlFor="invite-role" className="text-sm font-medium">
              Role
            </label>
            <select id="invite-role" className="rounded-md border border-rule bg-white/70 px-3 py-2" {...register("role")}>
              {ROLES.map((role) => (
                <option key={role} value={role}>
                  {ROLE_LABELS[role]}
                </option>
              ))}
            </select>
          </div>
          <div>
            <button type="submit" className={primaryButton} disabled={send.isPending}>
              {send.isPending ? "Sending…" : "Send invitation"}
            </button>
          </div>
        </form>
      </div>
    </section>
  );
}
