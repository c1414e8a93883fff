"use client";

import { useRouter } from "next/navigation";
import { useState } from "react";
import { ApiError, apiFetch } from "@/components/api/client";
import { TARGET_FIGURE_LABELS, TARGET_FIGURES, type TargetFigure, targetsSchema } from "@/components/schemas/targets";
import { primaryButton, secondaryButton } from "@/components/ui/buttons";

interface Row {
  /** stable key of the row while it is edited */
  key: number;
  figure: TargetFigure;
  min: string;
  max: string;
  variant: string;
}

const cell = "w-full min-w-0 rounded-md border border-rule bg-white/70 px-2 py-1 text-sm outline-none focus:border-brass";

function rowsOf(circuit: Record<string, unknown>): Row[] {
  const targets = Array.isArray(circuit.targets) ? (circuit.targets as { figure: string; min?: number; max?: number; variant?: string }[]) : [];
  return targets.map((t, i) => ({ key: i, figure: t.figure as TargetFigure, min: t.min?.toString() ?? "", max: t.max?.toString() ?? "", variant: t.variant ?? "" }));
}

const num = (text: string) => (text.trim() === "" ? undefined : Number(text));

/**
 * The design's targets (the circuit file's `targets`), saved as a new revision on top of the head so the change has
 * an author, a time and its own checks like any other.
 */
export function TargetsEditor({ workspaceId, designId, head, variants }: { workspaceId: string; designId: string; head: { id: string; circuit: Record<string, unknown> }; variants: string[] }) {
  const router = useRouter();
  const [rows, setRows] = useState<Row[]>(() => rowsOf(head.circuit));
  const [error, setError] = useState<string | null>(null);
  const [busy, setBusy] = useState(false);
  const set = (i: number, patch: Partial<Row>) => setRows((now) => now.map((r, j) => (j === i ? { ...r, ...patch } : r)));
  async function save() {
    setError(null);
    const parsed = targetsSchema.safeParse({
      targets: rows.map((r) => ({ figure: r.figure, min: num(r.min), max: num(r.max), variant: r.variant || undefined })),
    });
    if (!parsed.success) {
      const issue = parsed.error.issues[0];
      setError(`Target ${Number(issue.path[1] ?? 0) + 1}: ${issue.message}`);
      return;
    }
    setBusy(true);
    try {
      await apiFetch(`/api/workspaces/${workspaceId}/designs/${designId}/revisions`, {
        method: "POST",
        body: { parentRevisionId: head.id, circuit: { ...head.circuit, targets: parsed.data.targets }, message: `Targets: ${parsed.data.targets.length} set` },
      });
      router.refresh();
    } catch (caught) {
      setError(caught instanceof ApiError ? caught.message : "The targets were not saved. Try again.");
    } finally {
      setBusy(false);
    }
  }
  return (
    <div className="space-y-2">
      {rows.length === 0 ? <p className="text-sm text-ink-soft">No targets. Add one to have every saved revision checked.</p> : null}
      {rows.map((row, i) => (
        <div key={row.key} className="grid grid-cols-2 gap-2 rounded-md border border-rule/70 p-2 sm:grid-cols-[minmax(0,2fr)_1fr_1fr]">
          <select aria-label={`Target ${i + 1} figure`} value={row.figure} onChange={(e) => set(i, { figure: e.target.value as TargetFigure })} className={`${cell} col-span-2 sm:col-span-1`}>
            {(Object.keys(TARGET_FIGURES) as TargetFigure[]).map((f) => (
              <option key={f} value={f}>
                {TARGET_FIGURE_LABELS[f]} ({TARGET_FIGURES[f]})
              </option>
            ))}
          </select>
          <input aria-label={`Target ${i + 1} minimum`} placeholder="min" inputMode="decimal" value={row.min} onChange={(e) => set(i, { min: e.target.value })} className={cell} />
          <input aria-label={`Target ${i + 1} maximum`} placeholder="max" inputMode="decimal" value={row.max} onChange={(e) => set(i, { max: e.target.value })} className={cell} />
          <select aria-label={`Target ${i + 1} variant`} value={row.variant} onChange={(e) => set(i, { variant: e.target.value })} className={`${cell} col-span-1 sm:col-span-2`}>
            <option value="">The design as drawn</option>
            {variants.map((v) => (
              <option key={v} value={v}>
                Variant {v}
              </option>
            ))}
          </select>
          <button type="button" className="text-sm text-caution underline" onClick={() => setRows((now) => now.filter((_, j) => j !== i))}>
            Remove
          </button>
        </div>
      ))}
      {error ? (
        <p role="alert" className="text-sm text-caution">
          {error}
        </p>
      ) : null}
      <div className="flex flex-wrap gap-2">
        <button type="button" className={`${secondaryButton} px-3 py-1.5 text-sm`} onClick={() => setRows((now) => [...now, { key: Date.now(), figure: "low_corner_hz", min: "", max: "", variant: "" }])}>
          Add target
        </button>
        <button type="button" className={`${primaryButton} px-3 py-1.5 text-sm`} disabled={busy} onClick={() => void save()}>
          Save targets as a new revision
        </button>
      </div>
    </div>
  );
}
