/**
 * The circuit file as the bench edits it: the contract's backplate/circuit file (version 1) with every value kept
 * as the person wrote it ("4k7", "RB*2") and the optional fields filled with the contract's defaults, so the store
 * never has to ask "is this key present?". Extra top-level fields of an imported file (notes, colours) are kept.
 */
import type { PartKind, SourceRole, ToleranceDistribution } from "@/sim/circuit/types";

/** A value as written in a file: a JSON number or a string (literal, parameter name or expression). */
export type RawValue = number | string;

export interface BenchPart {
  id: string;
  kind: PartKind;
  /** pin name → net name; every pin of the kind is present */
  pins: Record<string, string>;
  values: Record<string, RawValue>;
  enabled: boolean;
  tolerance: Record<string, RawValue>;
  tolerance_distribution: ToleranceDistribution;
  noiseless: boolean;
  role?: SourceRole;
  /** free text kept with the part (the contract allows extra fields) */
  notes?: string;
}

export interface BenchVariant {
  name: string;
  parameters: Record<string, RawValue>;
  disable: string[];
  enable: string[];
}

export interface BenchCircuit {
  format: "backplate/circuit";
  version: 1;
  title: string;
  parameters: Record<string, RawValue>;
  parts: BenchPart[];
  output: { plus: string; minus: string };
  variants: BenchVariant[];
  analyses?: Record<string, unknown>;
  targets?: unknown[];
  /** any other optional top-level field of the file (notes, colours) */
  [extra: string]: unknown;
}

const asRecord = (value: unknown): Record<string, unknown> =>
  value !== null && typeof value === "object" && !Array.isArray(value) ? (value as Record<string, unknown>) : {};

/**
 * Fills the contract's defaults into a circuit file that has already been accepted by the engine (a stored revision,
 * a starting point, an import checked with `elaborate`). It does not validate: call the engine first.
 */
export function normaliseCircuit(file: unknown): BenchCircuit {
  const raw = asRecord(file);
  const parts = (Array.isArray(raw.parts) ? raw.parts : []).map((p): BenchPart => {
    const part = asRecord(p);
    const out: BenchPart = {
      ...part,
      id: String(part.id),
      kind: part.kind as PartKind,
      pins: { ...(asRecord(part.pins) as Record<string, string>) },
      values: { ...(asRecord(part.values) as Record<string, RawValue>) },
      enabled: part.enabled !== false,
      tolerance: { ...(asRecord(part.tolerance) as Record<string, RawValue>) },
      tolerance_distribution: part.tolerance_distribution === "normal" ? "normal" : "uniform",
      noiseless: part.noiseless === true,
    };
    if (part.role === "input" || part.role === "supply") out.role = part.role;
    else delete out.role;
    if (typeof part.notes !== "string") delete out.notes;
    return out;
  });
  const output = asRecord(raw.output);
  return {
    ...raw,
    format: "backplate/circuit",
    version: 1,
    title: typeof raw.title === "string" ? raw.title : "",
    parameters: { ...(asRecord(raw.parameters) as Record<string, RawValue>) },
    parts,
    output: { plus: String(output.plus ?? "0"), minus: String(output.minus ?? "0") },
    variants: (Array.isArray(raw.variants) ? raw.variants : []).map((v) => {
      const variant = asRecord(v);
      return {
        ...variant,
        name: String(variant.name),
        parameters: { ...(asRecord(variant.parameters) as Record<string, RawValue>) },
        disable: Array.isArray(variant.disable) ? variant.disable.map(String) : [],
        enable: Array.isArray(variant.enable) ? variant.enable.map(String) : [],
      };
    }),
  };
}
