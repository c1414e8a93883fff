/**
 * The value a drawn part shows beside its symbol, as on a schematic: a resistor's resistance, a capsule's
 * capacitance, a JFET's Idss and pinch-off. Evaluated with the engine's own field parser so "RB" shows as "1 GΩ";
 * a value that does not parse shows as written.
 */
import { parseFieldValue } from "@/sim/circuit/field";
import { KIND_SPECS } from "@/sim/circuit/kinds";
import { QUANTITIES } from "@/sim/circuit/quantities";
import type { PartKind } from "@/sim/circuit/types";
import type { BenchPart, RawValue } from "../document/circuit";
import { formatSI } from "./format-si";

/** The fields shown on the canvas for each kind, most telling first. */
export const KEY_FIELDS: Record<PartKind, string[]> = {
  resistor: ["resistance"],
  capacitor: ["capacitance"],
  inductor: ["inductance"],
  vsource: ["dc", "ac"],
  isource: ["dc", "ac"],
  vcvs: ["gain"],
  vccs: ["transconductance"],
  capsule: ["capacitance", "electret_voltage"],
  jfet: ["idss", "pinch_off"],
  triode: ["mu", "k"],
  bjt: ["beta"],
  transformer: ["ratio"],
  cable: ["length", "capacitance_per_m"],
  load: ["resistance", "capacitance"],
};

/** Short labels for the fields that need one on the canvas. */
const FIELD_TAGS: Record<string, string> = {
  ac: "ac",
  idss: "Idss",
  pinch_off: "Vp",
  mu: "µ",
  k: "k",
  beta: "β",
  ratio: "n",
  gain: "×",
  electret_voltage: "electret",
};

export function formatField(
  kind: PartKind,
  field: string,
  raw: RawValue,
  parameters: Record<string, RawValue>,
  type?: string,
): string {
  const spec = KIND_SPECS[kind].values[field];
  const result = parseFieldValue(kind, field, raw, parameters, { type });
  if (!result.ok || spec?.type !== "number") return String(raw);
  const value = result.value as number;
  const unit = QUANTITIES[spec.quantity].symbol;
  if (spec.quantity === "dimensionless" || spec.quantity === "gain" || spec.quantity === "count") {
    return Number(value.toPrecision(3)).toString();
  }
  return formatSI(value, unit);
}

/** The one-line text under a part: "1 GΩ", "Idss 4 mA · Vp −2 V", "12 V · ac 1 V". */
export function keyValueText(part: BenchPart, parameters: Record<string, RawValue>): string {
  const type = typeof part.values.type === "string" ? part.values.type : undefined;
  const shown = KEY_FIELDS[part.kind]
    .filter((field) => Object.hasOwn(part.values, field))
    .filter((field) => !(field === "ac" && Number(part.values.ac) === 0))
    .map((field) => {
      const text = formatField(part.kind, field, part.values[field], parameters, type);
      const tag = FIELD_TAGS[field];
      return tag ? (tag === "×" ? `×${text}` : `${tag} ${text}`) : text;
    });
  if (type && (part.kind === "jfet" || part.kind === "bjt")) shown.unshift(type === "n" ? "n-ch" : type === "p" ? "p-ch" : type);
  return shown.join(" · ");
}
