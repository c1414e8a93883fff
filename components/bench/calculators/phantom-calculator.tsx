"use client";
/** Phantom budget (IEC 61938 P48 / P24 / P12, sim/calculators/phantom): does a draw fit, and with what margin. */
import { useState } from "react";
import { PHANTOM_SYSTEMS, type PhantomSystemName, phantomFit } from "@/sim/calculators";
import { formatSi } from "../results/format";
import { CalculatorField } from "./field";
import { calculate, readQuantity } from "./quantity-input";

export function PhantomCalculator() {
  const [system, setSystem] = useState<PhantomSystemName>("P48");
  const [current, setCurrent] = useState("2 mA");
  const [needs, setNeeds] = useState("9 V");
  const i = readQuantity(current, "current");
  const v = readQuantity(needs, "voltage");
  const fit = i.ok && v.ok ? calculate(() => phantomFit(PHANTOM_SYSTEMS[system], i.value, v.value)) : null;
  return (
    <section aria-label="Phantom budget" className="space-y-2">
      <h3 className="text-sm font-semibold">Phantom budget (IEC 61938)</h3>
      <label className="block text-xs">
        <span className="text-ink-soft">System</span>
        <select
          value={system}
          onChange={(e) => setSystem(e.target.value as PhantomSystemName)}
          className="mt-0.5 block rounded border border-rule bg-paper px-1"
        >
          {Object.keys(PHANTOM_SYSTEMS).map((n) => (
            <option key={n}>{n}</option>
          ))}
        </select>
      </label>
      <div className="grid grid-cols-2 gap-2">
        <CalculatorField
          label="Current the microphone draws"
          value={current}
          onChange={setCurrent}
          problem={i.ok ? undefined : i.message}
        />
        <CalculatorField
          label="Voltage the circuit needs"
          value={needs}
          onChange={setNeeds}
          problem={v.ok ? undefined : v.message}
        />
      </div>
      {fit && !fit.ok && (
        <p className="text-xs text-caution" role="alert">
          {fit.message}
        </p>
      )}
      {fit?.ok && (
        <div className="text-xs" data-testid="phantom-result">
          <p className={fit.value.fits ? "text-trace" : "text-caution"}>{fit.value.message}</p>
          <p className="font-mono">Worst-case voltage at the microphone {formatSi(fit.value.worstCaseVoltageV, "V")}</p>
        </div>
      )}
    </section>
  );
}
