"use client";
/**
 * Cable and input loading (sim/calculators/cable-loading): source resistance, cable length and input R ∥ C → the
 * divider loss, the loss at 1 kHz and the −3 dB corner; "apply" writes the length into the selected cable.
 */
import { useState } from "react";
import { cableCapacitance, cableLoading } from "@/sim/calculators";
import { formatFixed, formatSi } from "../results/format";
import type { ApplyValues } from "./capsule-calculator";
import { CalculatorField } from "./field";
import { calculate, readQuantity } from "./quantity-input";

export function CableCalculator({
  selected,
  onApplyValues,
}: {
  selected?: { id: string; kind: string } | null;
  onApplyValues?: ApplyValues;
}) {
  const [source, setSource] = useState("200");
  const [length, setLength] = useState("10 m");
  const [rin, setRin] = useState("1k2");
  const [cin, setCin] = useState("470p");
  const rs = readQuantity(source, "resistance");
  const len = readQuantity(length, "length");
  const r = readQuantity(rin, "resistance");
  const c = readQuantity(cin, "capacitance");
  const result =
    rs.ok && len.ok && r.ok && c.ok
      ? calculate(() =>
          cableLoading({
            sourceResistanceOhm: rs.value,
            cableCapacitanceF: cableCapacitance(len.value),
            inputResistanceOhm: r.value,
            inputCapacitanceF: c.value,
          }),
        )
      : null;
  const problem = (x: { ok: boolean; message?: string }) => (x.ok ? undefined : x.message);
  return (
    <section aria-label="Cable and input loading" className="space-y-2">
      <h3 className="text-sm font-semibold">Cable and input loading</h3>
      <div className="grid grid-cols-2 gap-2">
        <CalculatorField label="Output (source) resistance" value={source} onChange={setSource} problem={problem(rs)} />
        <CalculatorField label="Cable length (100 pF/m)" value={length} onChange={setLength} problem={problem(len)} />
        <CalculatorField label="Input resistance" value={rin} onChange={setRin} problem={problem(r)} />
        <CalculatorField label="Input capacitance" value={cin} onChange={setCin} problem={problem(c)} />
      </div>
      {result && !result.ok && (
        <p className="text-xs text-caution" role="alert">
          {result.message}
        </p>
      )}
      {result?.ok && (
        <dl className="grid grid-cols-2 gap-x-3 text-xs" data-testid="cable-result">
          <dt>Divider loss</dt>
          <dd className="font-mono">{formatFixed(result.value.dividerLossDb, 2, "dB")}</dd>
          <dt>Loss at 1 kHz</dt>
          <dd className="font-mono">{formatFixed(result.value.lossAt1kHzDb, 2, "dB")}</dd>
          <dt>−3 dB corner</dt>
          <dd className="font-mono">{formatSi(result.value.cornerHz, "Hz")}</dd>
        </dl>
      )}
      <button
        type="button"
        disabled={!(len.ok && selected?.kind === "cable" && onApplyValues)}
        onClick={() => selected && onApplyValues?.(selected.id, { length: length.trim() })}
        className="rounded bg-brass px-2 py-0.5 text-xs text-ink disabled:opacity-40"
      >
        {selected?.kind === "cable" ? `Apply length to ${selected.id}` : "Select a cable to apply"}
      </button>
    </section>
  );
}
