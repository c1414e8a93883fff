"use client";
/**
 * The overlays laid over the live curve: the design's variants, a sweep of one parameter over a list of values,
 * a pinned earlier result, another saved revision, and the spread band (Monte Carlo over the tolerances).
 */
import { useEffect, useState } from "react";
import { parseFieldValue } from "@/sim/circuit/field";
import type { RevisionOverlay } from "../solver/protocol";
import type { OverlayChoice } from "../solver/use-live-solve";

export interface RevisionSource {
  workspaceId: string;
  designId: string;
}

interface RevisionSummary {
  id: string;
  number: number;
  message: string;
}

/** Runs of the spread band: enough for stable 5th/95th percentiles, short enough to feel live. */
export const SPREAD_RUNS = 200;
export const SPREAD_SEED = 1;

export function parseSweepValues(text: string): { values: string[] } | { problem: string } {
  const values = text.split(/[,;\s]+/).filter(Boolean);
  if (values.length < 2) return { problem: "List at least two values, separated by commas, such as 2k2, 4k7, 10k." };
  for (const v of values) {
    const parsed = parseFieldValue("resistor", "resistance", v);
    const plain = parseFieldValue("vcvs", "gain", v);
    if (!parsed.ok && !plain.ok) return { problem: `“${v}” is not a value: ${plain.message}` };
  }
  return { values };
}

export function OverlayControls({
  variantNames,
  parameterNames,
  value,
  onChange,
  revisions,
  canPin,
  pinnedLabel,
  onPin,
  onClearPin,
}: {
  variantNames: string[];
  parameterNames: string[];
  value: OverlayChoice;
  onChange: (next: OverlayChoice) => void;
  revisions?: RevisionSource;
  canPin: boolean;
  pinnedLabel: string | null;
  onPin: () => void;
  onClearPin: () => void;
}) {
  const [parameter, setParameter] = useState(parameterNames[0] ?? "");
  const [sweepText, setSweepText] = useState("");
  const [sweepProblem, setSweepProblem] = useState<string | null>(null);
  const chosen = new Set(value.variants);

  const toggleVariant = (name: string) =>
    onChange({
      ...value,
      variants: chosen.has(name) ? value.variants.filter((v) => v !== name) : [...value.variants, name],
    });

  const applySweep = () => {
    if (!parameter) return setSweepProblem("The design has no parameters to sweep: add one in the parameters table.");
    const parsed = parseSweepValues(sweepText);
    if ("problem" in parsed) return setSweepProblem(parsed.problem);
    setSweepProblem(null);
    onChange({ ...value, sweep: { parameter, values: parsed.values } });
  };

  return (
    <div className="space-y-4 text-sm">
      <fieldset aria-label="Variants">
        <legend className="font-semibold">Variants</legend>
        {variantNames.length === 0 ? (
          <p className="text-xs text-ink-soft">This design has no variants yet.</p>
        ) : (
          variantNames.map((name) => (
            <label key={name} className="mr-3 inline-flex items-center gap-1.5">
              <input type="checkbox" checked={chosen.has(name)} onChange={() => toggleVariant(name)} />
              {name}
            </label>
          ))
        )}
      </fieldset>
      <fieldset aria-label="Sweep" className="space-y-1">
        <legend className="font-semibold">Sweep a parameter</legend>
        <div className="flex flex-wrap items-center gap-2">
          <select
            value={parameter}
            onChange={(e) => setParameter(e.target.value)}
            aria-label="Parameter to sweep"
            className="rounded border border-rule bg-paper px-1"
          >
            {parameterNames.map((p) => (
              <option key={p}>{p}</option>
            ))}
          </select>
          <input
            value={sweepText}
            onChange={(e) => setSweepText(e.target.value)}
            placeholder="2k2, 4k7, 10k"
            aria-label="Sweep values"
            className="w-36 rounded border border-rule bg-paper px-1 font-mono"
          />
          <button
            type="button"
            onClick={applySweep}
            className="rounded border border-rule px-2 py-0.5 text-xs hover:bg-paper-deep"
          >
            Sweep
          </button>
          {value.sweep && (
            <button
              type="button"
              onClick={() => onChange({ ...value, sweep: undefined })}
              className="text-xs underline"
            >
              Clear sweep
            </button>
          )}
        </div>
        {sweepProblem && (
          <p className="text-xs text-caution" role="alert">
            {sweepProblem}
          </p>
        )}
      </fieldset>
      <fieldset aria-label="Pinned result" className="space-y-1">
        <legend className="font-semibold">Before and after</legend>
        <div className="flex items-center gap-2">
          <button
            type="button"
            disabled={!canPin}
            onClick={onPin}
            className="rounded bg-graphite px-2 py-0.5 text-xs text-paper disabled:opacity-40"
          >
            Pin this result
          </button>
          {pinnedLabel && (
            <>
              <span className="text-xs text-ink-soft">{pinnedLabel} kept</span>
              <button type="button" onClick={onClearPin} className="text-xs underline">
                Clear pin
              </button>
            </>
          )}
        </div>
      </fieldset>
      {revisions && (
        <RevisionPicker
          source={revisions}
          chosen={value.revisions}
          onChange={(r) => onChange({ ...value, revisions: r })}
        />
      )}
      <label className="inline-flex items-center gap-1.5">
        <input
          type="checkbox"
          checked={value.spread !== undefined}
          onChange={(e) =>
            onChange({ ...value, spread: e.target.checked ? { runs: SPREAD_RUNS, seed: SPREAD_SEED } : undefined })
          }
        />
        Spread band over the tolerances ({SPREAD_RUNS} runs)
      </label>
    </div>
  );
}

function RevisionPicker({
  source,
  chosen,
  onChange,
}: {
  source: RevisionSource;
  chosen: RevisionOverlay[];
  onChange: (next: RevisionOverlay[]) => void;
}) {
  const base = `/api/workspaces/${source.workspaceId}/designs/${source.designId}/revisions`;
  const [list, setList] = useState<RevisionSummary[] | null>(null);
  const [problem, setProblem] = useState<string | null>(null);
  useEffect(() => {
    fetch(base)
      .then(async (r) =>
        r.ok ? ((await r.json()).revisions as RevisionSummary[]) : Promise.reject(new Error(`status ${r.status}`)),
      )
      .then(setList, () => setProblem("The saved revisions could not be listed; reload the page to try again."));
  }, [base]);

  const add = async (id: string) => {
    if (!id || chosen.some((r) => r.id === id)) return;
    const response = await fetch(`${base}/${id}`);
    if (!response.ok) return setProblem("That revision could not be opened; it may have been removed.");
    const { revision } = (await response.json()) as { revision: { id: string; number: number; circuit: unknown } };
    setProblem(null);
    onChange([...chosen, { id: revision.id, label: `Revision ${revision.number}`, circuit: revision.circuit }]);
  };

  return (
    <fieldset aria-label="Other revision" className="space-y-1">
      <legend className="font-semibold">Another revision</legend>
      <select
        value=""
        onChange={(e) => add(e.target.value)}
        aria-label="Overlay a revision"
        className="rounded border border-rule bg-paper px-1"
        disabled={!list}
      >
        <option value="">{list ? "Choose a revision…" : "Loading revisions…"}</option>
        {list?.map((r) => (
          <option key={r.id} value={r.id}>
            {r.number}: {r.message}
          </option>
        ))}
      </select>
      {chosen.map((r) => (
        <span key={r.id} className="ml-2 inline-flex items-center gap-1 text-xs">
          {r.label}
          <button
            type="button"
            aria-label={`Remove ${r.label}`}
            onClick={() => onChange(chosen.filter((x) => x.id !== r.id))}
            className="underline"
          >
            remove
          </button>
        </span>
      ))}
      {problem && <p className="text-xs text-caution">{problem}</p>}
    </fieldset>
  );
}
