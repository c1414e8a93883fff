"use client";

import { useInfiniteQuery } from "@tanstack/react-query";
import { apiFetch } from "@/components/api/client";
import { secondaryButton } from "@/components/ui/buttons";
import { Notice } from "@/components/ui/notice";

interface AuditEntry {
  id: number;
  action: string;
  targetType: string;
  targetId: string;
  detail: Record<string, unknown>;
  createdAt: string;
  actorName: string | null;
  actorEmail: string | null;
}

/** A readable line for the entry's detail: "from → to" pairs and plain values. */
function describe(detail: Record<string, unknown>): string {
  return Object.entries(detail ?? {})
    .map(([key, value]) => {
      if (value && typeof value === "object" && "from" in value && "to" in value) {
        const change = value as { from: unknown; to: unknown };
        return `${key}: ${String(change.from)} → ${String(change.to)}`;
      }
      return `${key}: ${typeof value === "object" ? JSON.stringify(value) : String(value)}`;
    })
    .join(" · ");
}

export function AuditTable({ workspaceId }: { workspaceId: string }) {
  const audit = useInfiniteQuery({
    queryKey: ["workspace", workspaceId, "audit"],
    initialPageParam: null as number | null,
    queryFn: ({ pageParam }) =>
      apiFetch<{ entries: AuditEntry[]; nextBefore: number | null }>(
        `/api/workspaces/${workspaceId}/audit${pageParam ? `?before=${pageParam}` : ""}`,
      ),
    getNextPageParam: (last) => last.nextBefore,
  });
  if (audit.isPending) return <p className="text-ink-soft">Loading the audit log…</p>;
  if (audit.isError) return <Notice tone="error">{audit.error.message}</Notice>;
  const entries = audit.data.pages.flatMap((page) => page.entries);
  if (entries.length === 0) return <Notice>Nothing recorded yet.</Notice>;
  return (
    <div className="flex flex-col gap-4">
      <div className="overflow-x-auto rounded-lg border border-rule bg-paper">
        <table className="w-full text-left text-sm">
          <thead className="bg-paper-deep font-mono text-xs uppercase tracking-wider text-ink-soft">
            <tr>
              <th className="px-3 py-2">When (UTC)</th>
              <th className="px-3 py-2">Who</th>
              <th className="px-3 py-2">What</th>
              <th className="px-3 py-2">Detail</th>
            </tr>
          </thead>
          <tbody className="divide-y divide-rule">
            {entries.map((entry) => (
              <tr key={entry.id} data-testid="audit-row">
                <td className="whitespace-nowrap px-3 py-2 font-mono text-xs">{entry.createdAt.slice(0, 16).replace("T", " ")}</td>
                <td className="px-3 py-2">{entry.actorName ?? entry.actorEmail ?? "—"}</td>
                <td className="whitespace-nowrap px-3 py-2 font-mono text-xs text-trace">{entry.action}</td>
                <td className="px-3 py-2 text-ink-soft">{describe(entry.detail)}</td>
              </tr>
            ))}
          </tbody>
        </table>
      </div>
      {audit.hasNextPage ? (
        <div>
          <button type="button" className={secondaryButton} disabled={audit.isFetchingNextPage} onClick={() => audit.fetchNextPage()}>
            {audit.isFetchingNextPage ? "Loading…" : "Older entries"}
          </button>
        </div>
      ) : null}
    </div>
  );
}
