"use client";
/**
 * The part sheet: the selected part's id, values (typed as the engine reads them — 4k7, 50 pF, 1G, RB*2 — with the
 * parsed SI value beside each), tolerances, enabled, noiseless, role and notes. react-hook-form with the zod schema
 * from components/schemas/bench-part.ts; a field reaches the store only when it is valid, on Enter or when it
 * loses focus; an invalid field shows the engine's message and the store keeps the last good value.
 */
import { zodResolver } from "@hookform/resolvers/zod";
import { useEffect, useMemo } from "react";
import { type FieldPath, useForm } from "react-hook-form";
import { type PartSheetInput, partSheetSchema } from "@/components/schemas/bench-part";
import { parseFieldValue } from "@/sim/circuit/field";
import { KIND_SPECS } from "@/sim/circuit/kinds";
import { QUANTITIES } from "@/sim/circuit/quantities";
import { FOCUS_SHEET_EVENT } from "../canvas/canvas-centre";
import type { BenchPart } from "../document/circuit";
import { useBench, useBenchStore } from "../store/bench-store-context";
import { formatSI } from "../symbols/format-si";
import { KIND_LABELS, pinLabel } from "../symbols/kind-names";
import { partToForm, toleranceFromForm } from "./part-form-values";

const inputClass =
  "w-full rounded border border-rule bg-white/80 px-2 py-1 font-mono text-[13px] text-ink outline-none focus:border-brass aria-[invalid=true]:border-caution disabled:bg-paper-deep";
/** The tolerance box beside a value: fixed and narrow (with w-full as well, it took the row and hid the value). */
const toleranceClass = inputClass.replace("w-full", "w-16 shrink-0");

function ParsedValue({ part, field, text, parameters }: { part: BenchPart; field: string; text: string; parameters: Record<string, number | string> }) {
  const spec = KIND_SPECS[part.kind].values[field];
  if (spec?.type !== "number") return null;
  const unit = QUANTITIES[spec.quantity].symbol;
  if (text.trim() === "") {
    const fallback = spec.default === undefined ? "none" : formatSI(spec.default, unit);
    return <span className="text-[11px] text-graphite">default {fallback}</span>;
  }
  const type = typeof part.values.type === "string" ? part.values.type : undefined;
  const result = parseFieldValue(part.kind, field, text, parameters, { part: part.id, type });
  if (!result.ok) return null;
  return (
    <span className="font-mono text-[11px] text-trace" data-testid={`parsed-${field}`}>
      = {formatSI(result.value as number, unit)}
    </span>
  );
}

export function PartSheet({ part }: { part: BenchPart }) {
  const store = useBenchStore();
  const readOnly = useBench((s) => s.readOnly);
  const parameters = useBench((s) => s.document.circuit.parameters);
  const otherIds = useBench((s) => s.document.circuit.parts.map((p) => p.id).filter((id) => id !== part.id).join("\u0000"));
  const schema = useMemo(
    () => partSheetSchema({ kind: part.kind, id: part.id, otherIds: otherIds ? otherIds.split("\u0000") : [], parameters }),
    [part.kind, part.id, otherIds, parameters],
  );
  const form = useForm<PartSheetInput>({
    resolver: zodResolver(schema),
    defaultValues: partToForm(part),
    mode: "onChange",
  });
  const { register, formState, trigger, getValues, reset, resetField, watch, setFocus } = form;
  const spec = KIND_SPECS[part.kind];

  // the store changed the part (undo, a calculator, another field): show it, keeping edits not yet accepted
  useEffect(() => {
    reset(partToForm(part), { keepDirtyValues: true, keepErrors: true });
  }, [part, reset]);

  useEffect(() => {
    const focus = () => {
      const first = Object.keys(spec.values)[0];
      if (first) setFocus(`values.${first}` as FieldPath<PartSheetInput>);
    };
    window.addEventListener(FOCUS_SHEET_EVENT, focus);
    return () => window.removeEventListener(FOCUS_SHEET_EVENT, focus);
  }, [setFocus, spec.values]);

  /** Writes one field to the store if, and only if, it is valid. */
  const commit = async (name: FieldPath<PartSheetInput>) => {
    if (readOnly) return;
    const valid = await trigger(name);
    if (!valid) return;
    const state = store.getState();
    const value = getValues(name);
    if (name === "id") {
      const result = state.renamePart(part.id, String(value));
      if (!result.ok) form.setError("id", { message: result.error });
      return;
    }
    if (name.startsWith("values.")) {
      const field = name.slice("values.".length);
      const text = String(value).trim();
      state.setValue(part.id, field, text === "" ? undefined : text);
    } else if (name.startsWith("tolerance.")) {
      state.updatePart(part.id, { tolerance: toleranceFromForm(getValues("tolerance") as Record<string, string>) });
    } else if (name === "notes") {
      state.updatePart(part.id, { notes: String(value) });
    } else if (name === "enabled" || name === "noiseless") {
      state.updatePart(part.id, { [name]: Boolean(value) });
    } else if (name === "role") {
      state.updatePart(part.id, { role: value === "" ? undefined : (value as "input" | "supply") });
    } else if (name === "tolerance_distribution") {
      state.updatePart(part.id, { tolerance_distribution: value as "uniform" | "normal" });
    }
    resetField(name, { defaultValue: value as never });
  };

  const textProps = (name: FieldPath<PartSheetInput>) => ({
    ...register(name, { onBlur: () => commit(name) }),
    onKeyDown: (e: React.KeyboardEvent) => {
      if (e.key === "Enter") {
        e.preventDefault();
        commit(name);
      }
    },
    disabled: readOnly,
  });
  const changeProps = (name: FieldPath<PartSheetInput>) => register(name, { onChange: () => commit(name), disabled: readOnly });

  const valuesWatched = watch("values") as Record<string, string>;
  const errors = formState.errors;

  return (
    <form
      aria-label={`Part sheet: ${part.id}`}
      className="space-y-4"
      onSubmit={(e) => e.preventDefault()}
      noValidate
      data-testid="part-sheet"
    >
      <div>
        <p className="text-[11px] tracking-wide text-brass-deep uppercase">{KIND_LABELS[part.kind]}</p>
        <label className="mt-1 block text-xs font-medium text-ink-soft" htmlFor="sheet-id">
          Id
        </label>
        <input id="sheet-id" className={inputClass} aria-invalid={errors.id ? true : undefined} {...textProps("id")} />
        {errors.id && <p className="mt-0.5 text-xs text-caution">{errors.id.message}</p>}
      </div>

      <fieldset className="space-y-2">
        <legend className="mb-1 text-xs font-semibold text-ink">Values</legend>
        {Object.entries(spec.values).map(([field, valueSpec]) => {
          const name = `values.${field}` as FieldPath<PartSheetInput>;
          const error = (errors.values as Record<string, { message?: string }> | undefined)?.[field]?.message;
          const inputId = `sheet-value-${field}`;
          if (valueSpec.type === "choice") {
            return (
              <div key={field}>
                <label className="block text-xs text-ink-soft" htmlFor={inputId}>
                  {field}
                </label>
                <select id={inputId} className={inputClass} {...changeProps(name)}>
                  {valueSpec.choices.map((c) => (
                    <option key={c} value={c}>
                      {c}
                    </option>
                  ))}
                </select>
              </div>
            );
          }
          const tolName = `tolerance.${field}` as FieldPath<PartSheetInput>;
          const tolError = (errors.tolerance as Record<string, { message?: string }> | undefined)?.[field]?.message;
          return (
            <div key={field}>
              <div className="flex items-baseline justify-between gap-2">
                <label className="text-xs text-ink-soft" htmlFor={inputId}>
                  {field.replaceAll("_", " ")}
                  {valueSpec.required && <span className="text-caution"> *</span>}
                </label>
                <ParsedValue part={part} field={field} text={valuesWatched?.[field] ?? ""} parameters={parameters} />
              </div>
              <div className="flex gap-1">
                <input
                  id={inputId}
                  className={`${inputClass} min-w-0`}
                  aria-invalid={error ? true : undefined}
                  aria-describedby={error ? `${inputId}-error` : undefined}
                  placeholder={QUANTITIES[valueSpec.quantity].examples.split(",")[0]}
                  autoComplete="off"
                  spellCheck={false}
                  {...textProps(name)}
                />
                <input
                  aria-label={`${field} tolerance`}
                  title="Tolerance, such as 5%"
                  placeholder="±%"
                  className={toleranceClass}
                  aria-invalid={tolError ? true : undefined}
                  autoComplete="off"
                  {...textProps(tolName)}
                />
              </div>
              {error && (
                <p id={`${inputId}-error`} className="mt-0.5 text-xs leading-snug text-caution" role="alert">
                  {error}
                </p>
              )}
              {tolError && <p className="mt-0.5 text-xs text-caution">{tolError}</p>}
            </div>
          );
        })}
      </fieldset>

      <fieldset className="space-y-1.5 text-sm">
        <legend className="mb-1 text-xs font-semibold text-ink">Settings</legend>
        <label className="flex items-center gap-2">
          <input type="checkbox" {...changeProps("enabled")} /> Enabled (off removes it from the analysis)
        </label>
        <label className="flex items-center gap-2">
          <input type="checkbox" {...changeProps("noiseless")} /> Noiseless
        </label>
        <label className="flex items-center gap-2 text-xs text-ink-soft">
          Tolerance spread
          <select className={`${inputClass} w-auto`} {...changeProps("tolerance_distribution")}>
            <option value="uniform">uniform</option>
            <option value="normal">normal (tolerance = 3σ)</option>
          </select>
        </label>
        {spec.takesRole && (
          <label className="flex items-center gap-2 text-xs text-ink-soft">
            Role
            <select className={`${inputClass} w-auto`} {...changeProps("role")}>
              <option value="">none</option>
              <option value="supply">supply</option>
              <option value="input">input</option>
            </select>
          </label>
        )}
      </fieldset>

      <div>
        <p className="mb-1 text-xs font-semibold text-ink">Pins</p>
        <ul className="space-y-0.5 font-mono text-xs text-ink-soft">
          {spec.pins.map((pin) => (
            <li key={pin}>
              {pinLabel(part.kind, pin)} → <span className="text-ink">{part.pins[pin]}</span>
            </li>
          ))}
        </ul>
      </div>

      <div>
        <label className="mb-1 block text-xs font-semibold text-ink" htmlFor="sheet-notes">
          Notes
        </label>
        <textarea
          id="sheet-notes"
          rows={3}
          className={`${inputClass} font-sans`}
          {...register("notes", { onBlur: () => commit("notes"), disabled: readOnly })}
        />
        {errors.notes && <p className="text-xs text-caution">{errors.notes.message}</p>}
      </div>
    </form>
  );
}
