"use client";

import { useMutation, useQuery, useQueryClient } from "@tanstack/react-query";
import { useState } from "react";
import { BENCH_PLOT_LABELS, BENCH_PLOTS, type BenchPlot, createBenchLinkSchema } from "@/components/schemas/design-bench-link";
import { primaryButton } from "@/components/ui/buttons";
import { Notice } from "@/components/ui/notice";
import { designsFetch, designUrl } from "./designs-api";
import { formatTime } from "./format-time";

interface LinkRow {
  id: string;
  revisionNumber: number | null;
  label: string;
  isPublic: boolean;
  expiresAt: string | null;
  revokedAt: string | null;
  accessCount: number;
  createdByName: string | null;
  view: { plot: string; variant?: string };
}

const input = "rounded-md border border-rule bg-white/70 px-2 py-1.5 text-sm outline-none focus:border-brass";

/**
 * Bench links of a design: make one (a revision or the latest, a view, public or members only, an expiry), copy its
 * address once, see how often each was opened, revoke.
 */
export function BenchLinksPanel(props: {
  workspaceId: string;
  designId: string;
  revisions: { id: string; number: number }[];
  variants: string[];
  allowPublicLinks: boolean;
}) {
  const url = `${designUrl(props.workspaceId, props.designId)}/bench-links`;
  const key = ["bench-links", props.designId];
  const queryClient = useQueryClient();
  const links = useQuery({ queryKey: key, queryFn: () => designsFetch<{ links: LinkRow[] }>(url) });
  const [revisionId, setRevisionId] = useState("");
  const [plot, setPlot] = useState<BenchPlot>("response");
  const [variant, setVariant] = useState("");
  const [destination, setDestination] = useState("");
  const [fromHz, setFromHz] = useState("");
  const [toHz, setToHz] = useState("");
  const [isPublic, setIsPublic] = useState(false);
  const [expires, setExpires] = useState("");
  const [label, setLabel] = useState("");
  const [formError, setFormError] = useState<string | null>(null);
  const [made, setMade] = useState<string | null>(null);
  const [copied, setCopied] = useState(false);

  const create = useMutation({
    mutationFn: (body: unknown) => designsFetch<{ path: string }>(url, { method: "POST", body }),
    onSuccess: ({ path }) => {
      setMade(`${window.location.origin}${path}`);
      setCopied(false);
      queryClient.invalidateQueries({ queryKey: key });
    },
  });
  const revoke = useMutation({
    mutationFn: (id: string) => designsFetch(`${url}/${id}`, { method: "DELETE" }),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: key }),
  });

  function submit(e: React.FormEvent) {
    e.preventDefault();
    const num = (s: string) => (s.trim() ? Number(s) : undefined);
    const parsed = createBenchLinkSchema.safeParse({
      revisionId: revisionId || null,
      label,
      isPublic,
      expiresAt: expires ? new Date(`${expires}T23:59:59Z`).toISOString() : null,
      view: { plot, variant: variant || undefined, destination: destination || undefined, fromHz: num(fromHz), toHz: num(toHz) },
    });
    if (!parsed.success) return setFormError(parsed.error.issues.map((i) => i.message).join(" "));
    setFormError(null);
    create.mutate(parsed.data);
  }

  return (
    <div className="space-y-4">
      <form onSubmit={submit} className="grid grid-cols-1 gap-3 sm:grid-cols-2" aria-label="Make a bench link">
        <label className="flex flex-col gap-1 text-sm">
          <span className="font-medium">Revision</span>
          <select value={revisionId} onChange={(e) => setRevisionId(e.target.value)} className={input}>
            <option value="">Always the latest</option>
            {props.revisions.map((r) => (
              <option key={r.id} value={r.id}>
                r{r.number}
              </option>
            ))}
          </select>
        </label>
        <label className="flex flex-col gap-1 text-sm">
          <span className="font-medium">Plot</span>
          <select value={plot} onChange={(e) => setPlot(e.target.value as BenchPlot)} className={input}>
            {BENCH_PLOTS.map((p) => (
              <option key={p} value={p}>
                {BENCH_PLOT_LABELS[p]}
              </option>
            ))}
          </select>
        </label>
        <label className="flex flex-col gap-1 text-sm">
          <span className="font-medium">Variant</span>
          <select value={variant} onChange={(e) => setVariant(e.target.value)} className={input}>
            <option value="">As drawn</option>
            {props.variants.map((v) => (
              <option key={v} value={v}>
                {v}
              </option>
            ))}
          </select>
        </label>
        <label className="flex flex-col gap-1 text-sm">
          <span className="font-medium">Destination (note)</span>
          <input value={destination} onChange={(e) => setDestination(e.target.value)} className={input} placeholder="e.g. 1.2 kΩ console input, 5 m" />
        </label>
        <div className="flex gap-2">
          <label className="flex min-w-0 flex-1 flex-col gap-1 text-sm">
            <span className="font-medium">From (Hz)</span>
            <input inputMode="decimal" value={fromHz} onChange={(e) => setFromHz(e.target.value)} className={input} placeholder="20" />
          </label>
          <label className="flex min-w-0 flex-1 flex-col gap-1 text-sm">
            <span className="font-medium">To (Hz)</span>
            <input inputMode="decimal" value={toHz} onChange={(e) => setToHz(e.target.value)} className={input} placeholder="20000" />
          </label>
        </div>
        <label className="flex flex-col gap-1 text-sm">
          <span className="font-medium">Expires (optional)</span>
          <input type="date" value={expires} onChange={(e) => setExpires(e.target.value)} className={input} />
        </label>
        <label className="flex flex-col gap-1 text-sm">
          <span className="font-medium">Label</span>
          <input value={label} onChange={(e) => setLabel(e.target.value)} className={input} placeholder="e.g. for the supplier" />
        </label>
        <label className="flex items-center gap-2 self-end text-sm">
          <input type="checkbox" checked={isPublic} onChange={(e) => setIsPublic(e.target.checked)} disabled={!props.allowPublicLinks} />
          {props.allowPublicLinks ? "Opens without signing in" : "Public links are off in this workspace's settings"}
        </label>
        {formError ? <p className="text-sm text-caution sm:col-span-2">{formError}</p> : null}
        {create.isError ? (
          <div className="sm:col-span-2">
            <Notice tone="error">{create.error.message}</Notice>
          </div>
        ) : null}
        <div className="sm:col-span-2">
          <button type="submit" className={primaryButton} disabled={create.isPending}>
            Make bench link
          </button>
        </div>
      </form>
      {made ? (
        <Notice tone="done">
          <span className="block">This address is shown once — copy it now:</span>
          <span className="mt-1 flex flex-wrap items-center gap-2">
            <code className="break-all font-mono text-xs" data-testid="new-bench-link">
              {made}
            </code>
            <button
              type="button"
              className="rounded border border-trace px-2 py-0.5 text-xs"
              onClick={async () => {
                await navigator.clipboard?.writeText(made).catch(() => {});
                setCopied(true);
              }}
            >
              {copied ? "Copied" : "Copy"}
            </button>
          </span>
        </Notice>
      ) : null}
      {links.isError ? <Notice tone="error">The bench links could not be loaded: {links.error.message}</Notice> : null}
      {links.isPending ? <p className="text-sm text-ink-soft">Loading bench links…</p> : null}
      {links.data && links.data.links.length === 0 ? <p className="text-sm text-ink-soft">No bench links yet.</p> : null}
      {links.data && links.data.links.length > 0 ? (
        <ul className="divide-y divide-rule rounded-md border border-rule">
          {links.data.links.map((link) => (
            <li key={link.id} className="flex flex-wrap items-center justify-between gap-2 px-3 py-2 text-sm">
              <span className="min-w-0">
                <span className="font-medium">{link.label || "Bench link"}</span>{" "}
                <span className="text-ink-soft">
                  · {link.revisionNumber ? `r${link.revisionNumber}` : "latest"} · {link.view.plot}
                  {link.view.variant ? ` · ${link.view.variant}` : ""} · {link.isPublic ? "public" : "members"}
                  {link.expiresAt ? ` · expires ${formatTime(link.expiresAt)}` : ""}
                </span>
                <span className="block text-xs text-ink-soft">
                  Opened {link.accessCount} time{link.accessCount === 1 ? "" : "s"} · by {link.createdByName ?? "—"}
                </span>
              </span>
              {link.revokedAt ? (
                <span className="text-xs text-caution">Revoked {formatTime(link.revokedAt)}</span>
              ) : (
                <button type="button" className="rounded border border-caution px-2 py-0.5 text-xs text-caution" onClick={() => revoke.mutate(link.id)}>
                  Revoke
                </button>
              )}
            </li>
          ))}
        </ul>
      ) : null}
      {revoke.isError ? <Notice tone="error">{revoke.error.message}</Notice> : null}
    </div>
  );
}
