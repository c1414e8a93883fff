"use client";
/**
 * The design's variants: a name, parameter overrides, and parts switched off or on. Overrides are validated like
 * parameters; a variant reaches the store only when all of it is valid.
 */
import { useState } from "react";
import { parameterSchema } from "@/components/schemas/bench-part";
import type { BenchVariant } from "../document/circuit";
import { useBench, useBenchStore } from "../store/bench-store-context";

const inputClass =
  "w-full rounded border border-rule bg-white/80 px-1.5 py-0.5 font-mono text-xs text-ink outline-none focus:border-brass";

/** "VPOL=80, RB=2G" ⇄ { VPOL: "80", RB: "2G" } */
function overridesText(parameters: Record<string, number | string>): string {
  return Object.entries(parameters)
    .map(([k, v]) => `${k}=${v}`)
    .join(", ");
}

function parseOverrides(
  text: string,
  parameters: Record<string, number | string>,
): { ok: true; value: Record<string, string> } | { ok: false; error: string } {
  const value: Record<string, string> = {};
  for (const item of text.split(",").map((s) => s.trim()).filter(Boolean)) {
    const [name, ...rest] = item.split("=");
    const key = name.trim();
    if (!Object.hasOwn(parameters, key)) return { ok: false, error: `${key} is not a parameter of the design.` };
    const check = parameterSchema(parameters, key).safeParse({ name: key, value: rest.join("=").trim() });
    if (!check.success) return { ok: false, error: check.error.issues[0]?.message ?? "Not a value." };
    value[key] = rest.join("=").trim();
  }
  return { ok: true, value };
}

function VariantRow({ variant, index }: { variant: BenchVariant; index: number }) {
  const store = useBenchStore();
  const readOnly = useBench((s) => s.readOnly);
  const document = useBench((s) => s.document);
  const [name, setName] = useState(variant.name);
  const [overrides, setOverrides] = useState(overridesText(variant.parameters));
  const [problem, setProblem] = useState<string | null>(null);
  const variants = document.circuit.variants;
  const partIds = document.circuit.parts.map((p) => p.id);

  const save = (patch: Partial<BenchVariant> = {}) => {
    const trimmed = name.trim();
    if (trimmed === "") return setProblem("Give the variant a name.");
    if (variants.some((v, i) => i !== index && v.name === trimmed)) return setProblem("Another variant has this name.");
    const parsed = parseOverrides(overrides, document.circuit.parameters);
    if (!parsed.ok) return setProblem(parsed.error);
    setProblem(null);
    const next = variants.map((v, i) => (i === index ? { ...v, name: trimmed, parameters: parsed.value, ...patch } : v));
    store.getState().setVariants(next);
  };
  const toggle = (list: "disable" | "enable", id: string) => {
    const current = new Set(variant[list]);
    if (current.has(id)) current.delete(id);
    else current.add(id);
    save({ [list]: partIds.filter((p) => current.has(p)) });
  };

  return (
    <li className="space-y-1 rounded border border-rule p-2">
      <div className="flex gap-1">
        <input
          aria-label="variant name"
          className={inputClass}
          value={name}
          disabled={readOnly}
          onChange={(e) => setName(e.target.value)}
          onBlur={() => save()}
        />
        {!readOnly && (
          <button
            type="button"
            aria-label={`remove variant ${variant.name}`}
            className="px-1 text-xs text-ink-soft hover:text-caution"
            onClick={() => store.getState().setVariants(variants.filter((_, i) => i !== index))}
          >
            ×
          </button>
        )}
      </div>
      <input
        aria-label={`${variant.name} parameter overrides`}
        className={inputClass}
        placeholder="VPOL=80, RB=2G"
        value={overrides}
        disabled={readOnly}
        onChange={(e) => setOverrides(e.target.value)}
        onBlur={() => save()}
      />
      <details className="text-xs">
        <summary className="cursor-pointer text-ink-soft">
          Parts switched: off {variant.disable.length}, on {variant.enable.length}
        </summary>
        <div className="mt-1 grid grid-cols-[1fr_auto_auto] gap-x-2 font-mono">
          <span />
          <span>off</span>
          <span>on</span>
          {partIds.map((id) => (
            <div key={id} className="contents">
              <span>{id}</span>
              <input type="checkbox" aria-label={`${variant.name}: switch ${id} off`} checked={variant.disable.includes(id)} disabled={readOnly} onChange={() => toggle("disable", id)} />
              <input type="checkbox" aria-label={`${variant.name}: switch ${id} on`} checked={variant.enable.includes(id)} disabled={readOnly} onChange={() => toggle("enable", id)} />
            </div>
          ))}
        </div>
      </details>
      {problem && <p className="text-[11px] text-caution">{problem}</p>}
    </li>
  );
}

export function VariantsEditor() {
  const store = useBenchStore();
  const readOnly = useBench((s) => s.readOnly);
  const variants = useBench((s) => s.document.circuit.variants);
  const add = () => {
    const names = new Set(variants.map((v) => v.name));
    let n = variants.length + 1;
    while (names.has(`variant ${n}`)) n++;
    store.getState().setVariants([...variants, { name: `variant ${n}`, parameters: {}, disable: [], enable: [] }]);
  };
  return (
    <section aria-label="Variants">
      <h3 className="mb-1 text-xs font-semibold text-ink">Variants</h3>
      <ul className="space-y-2">
        {variants.map((v, i) => (
          <VariantRow key={`${v.name}:${overridesText(v.parameters)}:${v.disable.join()}:${v.enable.join()}`} variant={v} index={i} />
        ))}
      </ul>
      {variants.length === 0 && <p className="text-xs text-ink-soft">No variants yet.</p>}
      {!readOnly && (
        <button type="button" onClick={add} className="mt-2 rounded border border-rule px-2 py-0.5 text-xs hover:bg-paper-deep">
          Add a variant
        </button>
      )}
    </section>
  );
}
