"use client";

import { keepPreviousData, useMutation, useQuery, useQueryClient } from "@tanstack/react-query";
import { type ColumnDef, flexRender, getCoreRowModel, type SortingState, useReactTable } from "@tanstack/react-table";
import { PageLink } from "@/components/ui/page-link";
import { useEffect, useMemo, useState } from "react";
import { DESIGN_STATUS_LABELS, DESIGN_STATUSES, type DesignSort, type DesignStatus } from "@/components/schemas/design";
import { Notice } from "@/components/ui/notice";
import type { DesignListResponse, DesignRow } from "./design-types";
import { designsFetch, designsUrl, designUrl } from "./designs-api";
import { formatTime } from "./format-time";
import { StatusBadge } from "./status-badge";
import { TargetsCell } from "./targets-cell";

const PAGE_SIZE = 10;
/** Wait this long after the last keystroke before searching, so typing does not send a request per letter. */
const SEARCH_DEBOUNCE_MS = 250;

const COLUMN_SORT: Record<string, DesignSort> = { title: "title", status: "status", updatedAt: "updated", createdAt: "created" };

/** Columns a phone leaves out so the table fits 390 px without sideways scrolling; the design page has them all. */
const WIDE_ONLY = new Set(["createdBy", "updatedAt"]);
const cellClass = (id: string) => (WIDE_ONLY.has(id) ? "hidden md:table-cell" : "");

export const designsKey = (workspaceId: string) => ["designs", workspaceId] as const;

/**
 * The workspace's designs: search, filters by status and by a person who saved a revision, sortable columns and
 * pages, all answered by the server (the table only draws what the API returns). Deleted designs are a second view
 * where designers and owners restore them.
 */
export function DesignsTable({ workspaceId, slug, canRestore }: { workspaceId: string; slug: string; canRestore: boolean }) {
  const [search, setSearch] = useState("");
  const [q, setQ] = useState("");
  const [status, setStatus] = useState<DesignStatus | "">("");
  const [author, setAuthor] = useState("");
  const [show, setShow] = useState<"active" | "deleted">("active");
  const [sorting, setSorting] = useState<SortingState>([{ id: "updatedAt", desc: true }]);
  const [page, setPage] = useState(1);

  useEffect(() => {
    const timer = setTimeout(() => {
      setQ(search.trim());
      setPage(1);
    }, SEARCH_DEBOUNCE_MS);
    return () => clearTimeout(timer);
  }, [search]);

  const params = new URLSearchParams({ page: String(page), pageSize: String(PAGE_SIZE), show });
  if (q) params.set("q", q);
  if (status) params.set("status", status);
  if (author) params.set("author", author);
  if (sorting[0]) {
    params.set("sort", COLUMN_SORT[sorting[0].id] ?? "updated");
    params.set("dir", sorting[0].desc ? "desc" : "asc");
  }
  const query = useQuery({
    queryKey: [...designsKey(workspaceId), params.toString()],
    queryFn: () => designsFetch<DesignListResponse>(`${designsUrl(workspaceId)}?${params}`),
    placeholderData: keepPreviousData,
  });
  const queryClient = useQueryClient();
  const restore = useMutation({
    mutationFn: (id: string) => designsFetch(`${designUrl(workspaceId, id)}/restore`, { method: "POST" }),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: designsKey(workspaceId) }),
  });

  const columns = useMemo<ColumnDef<DesignRow>[]>(
    () => [
      {
        id: "title",
        header: "Design",
        accessorKey: "title",
        cell: ({ row }) =>
          row.original.deletedAt ? (
            <span className="font-medium text-ink-soft">{row.original.title}</span>
          ) : (
            <PageLink href={`/w/${slug}/designs/${row.original.id}`} className="font-medium text-ink underline-offset-2 hover:underline">
              {row.original.title}
            </PageLink>
          ),
      },
      { id: "status", header: "Status", accessorKey: "status", cell: ({ row }) => <StatusBadge status={row.original.status} /> },
      { id: "targets", header: "Targets", enableSorting: false, cell: ({ row }) => <TargetsCell row={row.original} /> },
      {
        id: "head",
        header: "Latest revision",
        enableSorting: false,
        cell: ({ row }) =>
          row.original.headNumber ? (
            <span>
              <span className="font-mono">r{row.original.headNumber}</span>
              <span className="text-ink-soft"> · {row.original.headAuthorName ?? "—"}</span>
            </span>
          ) : (
            "—"
          ),
      },
      { id: "createdBy", header: "Created by", enableSorting: false, cell: ({ row }) => row.original.createdByName ?? "—" },
      {
        id: "updatedAt",
        header: "Updated",
        accessorKey: "updatedAt",
        cell: ({ row }) => <span className="whitespace-nowrap font-mono text-xs">{formatTime(row.original.updatedAt)}</span>,
      },
      ...(show === "deleted" && canRestore
        ? [
            {
              id: "restore",
              header: "",
              enableSorting: false,
              cell: ({ row }: { row: { original: DesignRow } }) => (
                <button
                  type="button"
                  className="rounded border border-ink px-2 py-0.5 text-xs hover:bg-paper-deep"
                  onClick={() => restore.mutate(row.original.id)}
                  disabled={restore.isPending}
                >
                  Restore
                </button>
              ),
            } satisfies ColumnDef<DesignRow>,
          ]
        : []),
    ],
    [slug, show, canRestore, restore],
  );

  const data = query.data;
  const table = useReactTable({
    data: data?.rows ?? [],
    columns,
    getCoreRowModel: getCoreRowModel(),
    manualSorting: true,
    manualPagination: true,
    enableSortingRemoval: false,
    state: { sorting },
    onSortingChange: (updater) => {
      setSorting(updater);
      setPage(1);
    },
    pageCount: data ? Math.max(1, Math.ceil(data.total / PAGE_SIZE)) : 1,
  });
  const pages = data ? Math.max(1, Math.ceil(data.total / PAGE_SIZE)) : 1;
  const filtered = Boolean(q || status || author);

  return (
    <div className="space-y-4">
      <div className="flex flex-wrap items-end gap-3">
        <label className="flex min-w-0 flex-1 basis-56 flex-col gap-1 text-sm">
          <span className="font-medium">Search titles</span>
          <input
            type="search"
            value={search}
            onChange={(e) => setSearch(e.target.value)}
            placeholder="e.g. follower"
            className="rounded-md border border-rule bg-white/70 px-3 py-2 outline-none focus:border-brass"
          />
        </label>
        <label className="flex flex-col gap-1 text-sm">
          <span className="font-medium">Status</span>
          <select
            value={status}
            onChange={(e) => {
              setStatus(e.target.value as DesignStatus | "");
              setPage(1);
            }}
            className="rounded-md border border-rule bg-white/70 px-2 py-2"
          >
            <option value="">Any status</option>
            {DESIGN_STATUSES.map((s) => (
              <option key={s} value={s}>
                {DESIGN_STATUS_LABELS[s]}
              </option>
            ))}
          </select>
        </label>
        <label className="flex flex-col gap-1 text-sm">
          <span className="font-medium">Saved by</span>
          <select
            value={author}
            onChange={(e) => {
              setAuthor(e.target.value);
              setPage(1);
            }}
            className="max-w-[12rem] rounded-md border border-rule bg-white/70 px-2 py-2"
          >
            <option value="">Anyone</option>
            {(data?.authors ?? []).map((a) => (
              <option key={a.id} value={a.id}>
                {a.name ?? "Unnamed"}
              </option>
            ))}
          </select>
        </label>
        <label className="flex flex-col gap-1 text-sm">
          <span className="font-medium">Show</span>
          <select
            value={show}
            onChange={(e) => {
              setShow(e.target.value as "active" | "deleted");
              setPage(1);
            }}
            className="rounded-md border border-rule bg-white/70 px-2 py-2"
          >
            <option value="active">Designs</option>
            <option value="deleted">Deleted designs</option>
          </select>
        </label>
      </div>

      {query.isError ? (
        <Notice tone="error">
          The designs could not be loaded: {query.error.message}{" "}
          <button type="button" className="underline" onClick={() => query.refetch()}>
            Try again
          </button>
        </Notice>
      ) : null}
      {restore.isError ? <Notice tone="error">{restore.error.message}</Notice> : null}

      <div className="overflow-x-auto rounded-md border border-rule bg-paper">
        <table className="w-full text-left text-sm md:min-w-[40rem]" aria-busy={query.isFetching}>
          <caption className="sr-only">Designs of this workspace</caption>
          <thead className="bg-paper-deep text-xs uppercase tracking-wide text-ink-soft">
            {table.getHeaderGroups().map((group) => (
              <tr key={group.id}>
                {group.headers.map((header) => {
                  const sorted = header.column.getIsSorted();
                  return (
                    <th
                      key={header.id}
                      className={`px-3 py-2 font-medium ${cellClass(header.column.id)}`}
                      aria-sort={sorted === "asc" ? "ascending" : sorted === "desc" ? "descending" : undefined}
                    >
                      {header.column.getCanSort() ? (
                        <button type="button" onClick={header.column.getToggleSortingHandler()} className="inline-flex items-center gap-1 uppercase">
                          {flexRender(header.column.columnDef.header, header.getContext())}
                          <span aria-hidden="true" className="text-brass-deep">
                            {sorted === "asc" ? "▲" : sorted === "desc" ? "▼" : "↕"}
                          </span>
                        </button>
                      ) : (
                        flexRender(header.column.columnDef.header, header.getContext())
                      )}
                    </th>
                  );
                })}
              </tr>
            ))}
          </thead>
          <tbody>
            {query.isPending ? (
              <tr>
                <td colSpan={columns.length} className="px-3 py-8 text-center text-ink-soft">
                  Loading designs…
                </td>
              </tr>
            ) : table.getRowModel().rows.length === 0 ? (
              <tr>
                <td colSpan={columns.length} className="px-3 py-8 text-center text-ink-soft">
                  {show === "deleted"
                    ? "No deleted designs."
                    : filtered
                      ? "No design matches these filters. Clear the search or pick another status or person."
                      : "No designs yet. Start one with “New design”."}
                </td>
              </tr>
            ) : (
              table.getRowModel().rows.map((row) => (
                <tr key={row.id} className="border-t border-rule hover:bg-paper-deep/50">
                  {row.getVisibleCells().map((cell) => (
                    <td key={cell.id} className={`px-3 py-2 align-middle ${cellClass(cell.column.id)}`}>
                      {flexRender(cell.column.columnDef.cell, cell.getContext())}
                    </td>
                  ))}
                </tr>
              ))
            )}
          </tbody>
        </table>
      </div>

      <nav aria-label="Pages of designs" className="flex flex-wrap items-center justify-between gap-2 text-sm">
        <span className="text-ink-soft">
          {data ? `${data.total} design${data.total === 1 ? "" : "s"} · page ${page} of ${pages}` : " "}
        </span>
        <span className="flex gap-2">
          <button type="button" className="rounded border border-rule px-3 py-1 disabled:opacity-50" disabled={page <= 1} onClick={() => setPage(page - 1)}>
            Previous
          </button>
          <button type="button" className="rounded border border-rule px-3 py-1 disabled:opacity-50" disabled={page >= pages} onClick={() => setPage(page + 1)}>
            Next
          </button>
        </span>
      </nav>
    </div>
  );
}
