"use client";
/**
 * Choosing what the output drives: any number of presets (each becomes a curve of the family), a custom R ∥ C
 * checked as the engine would check it, and the cable length between the microphone and them.
 */
import { useState } from "react";
import { parseFieldValue } from "@/sim/circuit/field";
import { DESTINATION_PRESETS, type Destination, describeImpedance, MAX_CABLE_LENGTH_M } from "./presets";

export interface DestinationChoice {
  destinations: Destination[];
  cableLengthM: number;
}

export function DestinationPicker({
  value,
  onChange,
}: {
  value: DestinationChoice;
  onChange: (next: DestinationChoice) => void;
}) {
  const [r, setR] = useState("1k");
  const [c, setC] = useState("1n");
  const [problem, setProblem] = useState<string | null>(null);
  const [cable, setCable] = useState(String(value.cableLengthM));
  const chosen = new Set(value.destinations.map((d) => d.id));

  const toggle = (d: Destination) => {
    const destinations = chosen.has(d.id)
      ? value.destinations.filter((x) => x.id !== d.id)
      : [...value.destinations, d];
    onChange({ ...value, destinations });
  };

  const addCustom = () => {
    const resistance = parseFieldValue("load", "resistance", r);
    const capacitance = parseFieldValue("load", "capacitance", c === "" ? "0" : c);
    if (!resistance.ok) return setProblem(`Resistance: ${resistance.message}`);
    if (!capacitance.ok) return setProblem(`Capacitance: ${capacitance.message}`);
    const rOhm = resistance.value as number;
    if (!Number.isFinite(rOhm)) return setProblem("Resistance: give a finite resistance, such as 2k2.");
    setProblem(null);
    const d: Destination = {
      id: `custom-${r}-${c}`,
      name: `Custom ${describeImpedance({ resistanceOhm: rOhm, capacitanceF: capacitance.value as number })}`,
      kind: "custom",
      resistanceOhm: rOhm,
      capacitanceF: capacitance.value as number,
    };
    if (!chosen.has(d.id)) onChange({ ...value, destinations: [...value.destinations, d] });
  };

  const setLength = (text: string) => {
    setCable(text);
    const n = Number(text);
    if (text.trim() !== "" && Number.isFinite(n) && n >= 0 && n <= MAX_CABLE_LENGTH_M)
      onChange({ ...value, cableLengthM: n });
  };
  const cableNumber = Number(cable);
  const cableBad =
    cable.trim() === "" || !Number.isFinite(cableNumber) || cableNumber < 0 || cableNumber > MAX_CABLE_LENGTH_M;

  return (
    <fieldset className="space-y-3" aria-label="Destinations">
      <legend className="text-sm font-semibold">Destinations</legend>
      <ul className="space-y-1">
        {DESTINATION_PRESETS.map((d) => (
          <li key={d.id}>
            <label className="flex items-baseline gap-2 text-sm">
              <input type="checkbox" aria-label={d.name} checked={chosen.has(d.id)} onChange={() => toggle(d)} />
              <span>{d.name}</span>
              <span className="font-mono text-xs text-ink-soft">{describeImpedance(d)}</span>
            </label>
          </li>
        ))}
        {value.destinations
          .filter((d) => d.kind === "custom")
          .map((d) => (
            <li key={d.id}>
              <label className="flex items-baseline gap-2 text-sm">
                <input type="checkbox" checked onChange={() => toggle(d)} />
                <span>{d.name}</span>
              </label>
            </li>
          ))}
      </ul>
      <div className="flex flex-wrap items-end gap-2">
        <label className="text-xs">
          R
          <input
            value={r}
            onChange={(e) => setR(e.target.value)}
            className="ml-1 w-20 rounded border border-rule bg-paper px-1 font-mono text-sm"
          />
        </label>
        <label className="text-xs">
          ∥ C
          <input
            value={c}
            onChange={(e) => setC(e.target.value)}
            className="ml-1 w-20 rounded border border-rule bg-paper px-1 font-mono text-sm"
          />
        </label>
        <button
          type="button"
          onClick={addCustom}
          className="rounded border border-rule px-2 py-0.5 text-xs hover:bg-paper-deep"
        >
          Add custom input
        </button>
      </div>
      {problem && (
        <p className="text-xs text-caution" role="alert">
          {problem}
        </p>
      )}
      <label className="block text-xs">
        Cable length (m, about 100 pF/m)
        <input
          value={cable}
          onChange={(e) => setLength(e.target.value)}
          inputMode="decimal"
          aria-invalid={cableBad}
          className="ml-2 w-20 rounded border border-rule bg-paper px-1 font-mono text-sm"
        />
      </label>
      {cableBad && <p className="text-xs text-caution">Give a length from 0 to {MAX_CABLE_LENGTH_M} m, such as 10.</p>}
    </fieldset>
  );
}
