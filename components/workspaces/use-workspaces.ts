"use client";

import { useQuery } from "@tanstack/react-query";
import { apiFetch } from "@/components/api/client";
import type { Role } from "@/components/auth/roles";

/** One of the caller's workspaces as GET /api/workspaces returns it. */
export interface MyWorkspace {
  workspaceId: string;
  slug: string;
  name: string;
  role: Role;
  allowPublicLinks: boolean;
  allowSelfApproval: boolean;
}

export const WORKSPACES_KEY = ["workspaces"] as const;

export function useMyWorkspaces(enabled = true) {
  return useQuery({
    queryKey: WORKSPACES_KEY,
    queryFn: async () => (await apiFetch<{ workspaces: MyWorkspace[] }>("/api/workspaces")).workspaces,
    enabled,
  });
}
