"use client";
/**
 * Capsule from physics (sim/calculators/capsule-physics): radius, gap, tension, membrane areal density and
 * polarisation → capacitance, strain per pascal, resonance, sensitivity, collapse margin; "apply" writes the
 * capacitance, strain_per_pa and resonance into the selected capsule.
 */
import { useState } from "react";
import { capsuleFigures } from "@/sim/calculators";
import { formatSi } from "../results/format";
import { CalculatorField } from "./field";
import { type CalculatorQuantity, calculate, readQuantity } from "./quantity-input";

export type ApplyValues = (partId: string, values: Record<string, string>) => void;

const INPUTS: { key: string; label: string; quantity: CalculatorQuantity; initial: string }[] = [
  { key: "radius", label: "Membrane radius", quantity: "length", initial: "12.5 mm" },
  { key: "gap", label: "Gap to backplate", quantity: "length", initial: "25 µm" },
  { key: "tension", label: "Membrane tension (N/m)", quantity: "number", initial: "3000" },
  { key: "density", label: "Membrane areal density (kg/m²)", quantity: "number", initial: "0.0085" },
  { key: "polarisation", label: "Polarisation", quantity: "voltage", initial: "60 V" },
];

export function CapsuleCalculator({
  selected,
  onApplyValues,
}: {
  selected?: { id: string; kind: string } | null;
  onApplyValues?: ApplyValues;
}) {
  const [text, setText] = useState<Record<string, string>>(Object.fromEntries(INPUTS.map((i) => [i.key, i.initial])));
  const read = Object.fromEntries(INPUTS.map((i) => [i.key, readQuantity(text[i.key] ?? "", i.quantity)]));
  const allRead = Object.values(read).every((r) => r.ok);
  const value = (k: string) => (read[k].ok ? (read[k] as { value: number }).value : Number.NaN);
  const result = allRead
    ? calculate(() =>
        capsuleFigures({
          radiusM: value("radius"),
          gapM: value("gap"),
          tensionNPerM: value("tension"),
          arealDensityKgPerM2: value("density"),
          polarisationV: value("polarisation"),
        }),
      )
    : null;
  const canApply = result?.ok && selected?.kind === "capsule" && onApplyValues;
  return (
    <section aria-label="Capsule from physics" className="space-y-2">
      <h3 className="text-sm font-semibold">Capsule from physics</h3>
      <div className="grid grid-cols-2 gap-2">
        {INPUTS.map((i) => (
          <CalculatorField
            key={i.key}
            label={i.label}
            value={text[i.key]}
            onChange={(v) => setText({ ...text, [i.key]: v })}
            problem={read[i.key].ok ? undefined : (read[i.key] as { message: string }).message}
          />
        ))}
      </div>
      {result && !result.ok && (
        <p className="text-xs text-caution" role="alert">
          {result.message}
        </p>
      )}
      {result?.ok && (
        <dl className="grid grid-cols-2 gap-x-3 text-xs" data-testid="capsule-result">
          <dt>Capacitance</dt>
          <dd className="font-mono">{formatSi(result.value.capacitanceF, "F")}</dd>
          <dt>Strain per pascal</dt>
          <dd className="font-mono">{result.value.strain_per_pa.toExponential(3)} /Pa</dd>
          <dt>Resonance</dt>
          <dd className="font-mono">{formatSi(result.value.resonanceHz, "Hz")}</dd>
          <dt>Open-circuit sensitivity</dt>
          <dd className="font-mono">{formatSi(result.value.sensitivityVPerPa, "V/Pa")}</dd>
          <dt>Polarisation / collapse</dt>
          <dd className={`font-mono ${result.value.polarisationToCollapseRatio > 0.5 ? "text-caution" : ""}`}>
            {(result.value.polarisationToCollapseRatio * 100).toFixed(0)} %
          </dd>
        </dl>
      )}
      <button
        type="button"
        disabled={!canApply}
        onClick={() =>
          result?.ok &&
          selected &&
          onApplyValues?.(selected.id, {
            capacitance: formatSi(result.value.capacitanceF, "F", 4),
            strain_per_pa: result.value.strain_per_pa.toPrecision(4),
            resonance: formatSi(result.value.resonanceHz, "Hz", 4),
          })
        }
        className="rounded bg-brass px-2 py-0.5 text-xs text-ink disabled:opacity-40"
      >
        {selected?.kind === "capsule" ? `Apply to ${selected.id}` : "Select a capsule to apply"}
      </button>
    </section>
  );
}
