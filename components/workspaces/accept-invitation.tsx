"use client";

import { useMutation, useQueryClient } from "@tanstack/react-query";
import { useRouter } from "next/navigation";
import { apiFetch } from "@/components/api/client";
import { primaryButton } from "@/components/ui/buttons";
import { Notice } from "@/components/ui/notice";
import { WORKSPACES_KEY } from "./use-workspaces";

export function AcceptInvitationButton({ token, workspaceName }: { token: string; workspaceName: string }) {
  const router = useRouter();
  const queryClient = useQueryClient();
  const accept = useMutation({
    mutationFn: () => apiFetch<{ slug: string }>(`/api/invitations/${token}`, { method: "POST" }),
    onSuccess: async ({ slug }) => {
      await queryClient.invalidateQueries({ queryKey: WORKSPACES_KEY });
      router.push(`/w/${slug}`);
      router.refresh();
    },
  });
  return (
    <div className="flex flex-col gap-3">
      {accept.isError ? <Notice tone="error">{accept.error.message}</Notice> : null}
      <div>
        <button type="button" className={primaryButton} disabled={accept.isPending} onClick={() => accept.mutate()}>
          {accept.isPending ? "Joining…" : `Join ${workspaceName}`}
        </button>
      </div>
    </div>
  );
}
