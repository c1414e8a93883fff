/** A part ⇄ the part sheet's form values (every value as text; "" where the file gives none). */
import { KIND_SPECS } from "@/sim/circuit/kinds";
import type { PartSheetInput } from "@/components/schemas/bench-part";
import type { BenchPart } from "../document/circuit";

export function partToForm(part: BenchPart): PartSheetInput {
  const spec = KIND_SPECS[part.kind];
  const values: Record<string, string> = {};
  const tolerance: Record<string, string> = {};
  for (const [field, valueSpec] of Object.entries(spec.values)) {
    const given = part.values[field];
    values[field] = given === undefined ? (valueSpec.type === "choice" ? valueSpec.default : "") : String(given);
    if (valueSpec.type === "number") tolerance[field] = part.tolerance[field] === undefined ? "" : String(part.tolerance[field]);
  }
  return {
    id: part.id,
    values,
    tolerance,
    tolerance_distribution: part.tolerance_distribution,
    enabled: part.enabled,
    noiseless: part.noiseless,
    role: part.role ?? "",
    notes: part.notes ?? "",
  };
}

/** The tolerance map written back: empty entries dropped. */
export function toleranceFromForm(tolerance: Record<string, string>): Record<string, string> {
  return Object.fromEntries(Object.entries(tolerance).filter(([, v]) => v.trim() !== "").map(([k, v]) => [k, v.trim()]));
}
