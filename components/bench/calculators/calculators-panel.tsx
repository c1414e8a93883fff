"use client";
/** The side calculators together, for the results drawer's "Calculators" tab. */
import type { ApplyValues } from "./capsule-calculator";
import { CableCalculator } from "./cable-calculator";
import { CapsuleCalculator } from "./capsule-calculator";
import { PhantomCalculator } from "./phantom-calculator";

export function CalculatorsPanel({
  selected,
  onApplyValues,
  readOnly,
}: {
  selected?: { id: string; kind: string } | null;
  onApplyValues?: ApplyValues;
  readOnly?: boolean;
}) {
  const apply = readOnly ? undefined : onApplyValues;
  return (
    <div className="grid grid-cols-1 gap-6 md:grid-cols-3">
      <CapsuleCalculator selected={selected} onApplyValues={apply} />
      <PhantomCalculator />
      <CableCalculator selected={selected} onApplyValues={apply} />
    </div>
  );
}
