"use client";

import { useMutation, useQuery, useQueryClient } from "@tanstack/react-query";
import { useRouter } from "next/navigation";
import { useState } from "react";
import { apiFetch } from "@/components/api/client";
import { can, ROLE_LABELS, ROLES, type Role } from "@/components/auth/roles";
import { dangerButton } from "@/components/ui/buttons";
import { Notice } from "@/components/ui/notice";
import { InvitationsPanel } from "./invitations-panel";
import { WORKSPACES_KEY } from "./use-workspaces";

interface Member {
  userId: string;
  name: string | null;
  email: string;
  role: Role;
  joinedAt: string;
}

export const membersKey = (workspaceId: string) => ["workspace", workspaceId, "members"] as const;

/** The member list; owners change roles, remove people and manage invitations; anyone may leave. */
export function MembersPanel({ workspaceId, myUserId, myRole }: { workspaceId: string; myUserId: string; myRole: Role }) {
  const queryClient = useQueryClient();
  const router = useRouter();
  const [failure, setFailure] = useState<string | null>(null);
  const manage = can(myRole, "members.manage");
  const url = `/api/workspaces/${workspaceId}/members`;
  const members = useQuery({
    queryKey: membersKey(workspaceId),
    queryFn: async () => (await apiFetch<{ members: Member[] }>(url)).members,
  });
  const changeRole = useMutation({
    mutationFn: (input: { userId: string; role: Role }) => apiFetch(url, { method: "PATCH", body: input }),
    onMutate: () => setFailure(null),
    onError: (error) => setFailure(error.message),
    onSettled: () => queryClient.invalidateQueries({ queryKey: membersKey(workspaceId) }),
  });
  const remove = useMutation({
    mutationFn: (userId: string) => apiFetch(url, { method: "DELETE", body: { userId } }),
    onMutate: () => setFailure(null),
    onError: (error) => setFailure(error.message),
    onSuccess: async (_data, userId) => {
      if (userId === myUserId) {
        await queryClient.invalidateQueries({ queryKey: WORKSPACES_KEY });
        router.push("/workspaces");
        return;
      }
      await queryClient.invalidateQueries({ queryKey: membersKey(workspaceId) });
    },
  });

  return (
    <div className="flex flex-col gap-10">
      <section aria-labelledby="members-heading">
        <h2 id="members-heading" className="mb-3 text-xl font-bold">
          Members
        </h2>
        {failure ? (
          <div className="mb-3">
            <Notice tone="error">{failure}</Notice>
          </div>
        ) : null}
        {members.isPending ? (
          <p className="text-ink-soft">Loading members…</p>
        ) : members.isError ? (
          <Notice tone="error">
            {members.error.message}{" "}
            <button type="button" className="underline" onClick={() => members.refetch()}>
              Try again
            </button>
          </Notice>
        ) : (
          <ul className="divide-y divide-rule overflow-hidden rounded-lg border border-rule bg-paper">
            {members.data.map((member) => {
              const self = member.userId === myUserId;
              return (
                <li key={member.userId} className="flex flex-wrap items-center gap-x-4 gap-y-2 px-4 py-3" data-testid="member-row">
                  {/* On a phone the name takes the whole first line and the controls wrap below it. */}
                  <div className="min-w-0 basis-full sm:flex-1 sm:basis-auto">
                    <p className="truncate font-medium">
                      {member.name ?? member.email}
                      {self ? <span className="ml-2 text-xs text-ink-soft">(you)</span> : null}
                    </p>
                    <p className="truncate font-mono text-xs text-ink-soft">{member.email}</p>
                  </div>
                  {manage ? (
                    <label className="flex items-center gap-2 text-sm">
                      <span className="sr-only">Role of {member.name ?? member.email}</span>
                      <select
                        value={member.role}
                        disabled={changeRole.isPending}
                        onChange={(event) => changeRole.mutate({ userId: member.userId, role: event.target.value as Role })}
                        className="rounded-md border border-rule bg-white/70 px-2 py-1.5"
                      >
                        {ROLES.map((role) => (
                          <option key={role} value={role}>
                            {ROLE_LABELS[role]}
                          </option>
                        ))}
                      </select>
                    </label>
                  ) : (
                    <span className="rounded-full bg-paper-deep px-3 py-1 text-xs font-medium text-ink-soft">{ROLE_LABELS[member.role]}</span>
                  )}
                  {self ? (
                    <button
                      type="button"
                      className={dangerButton}
                      disabled={remove.isPending}
                      onClick={() => {
                        if (window.confirm("Leave this workspace? You will need a new invitation to come back.")) remove.mutate(member.userId);
                      }}
                    >
                      Leave
                    </button>
                  ) : manage ? (
                    <button
                      type="button"
                      className={dangerButton}
                      disabled={remove.isPending}
                      aria-label={`Remove ${member.name ?? member.email}`}
                      onClick={() => {
                        if (window.confirm(`Remove ${member.name ?? member.email} from this workspace?`)) remove.mutate(member.userId);
                      }}
                    >
                      Remove
                    </button>
                  ) : null}
                </li>
              );
            })}
          </ul>
        )}
      </section>
      {manage ? <InvitationsPanel workspaceId={workspaceId} /> : null}
    </div>
  );
}
