"use client";
/**
 * The design's parameters: names that values and expressions use ("RB", "VPOL"). Each row edits in place; the
 * add row is a react-hook-form with the same zod schema (a valid name, a value that evaluates, no cycle).
 */
import { zodResolver } from "@hookform/resolvers/zod";
import { useMemo, useState } from "react";
import { useForm } from "react-hook-form";
import { parameterSchema } from "@/components/schemas/bench-part";
import { evaluateParameters } from "@/sim/circuit/parameters";
import { useBench, useBenchStore } from "../store/bench-store-context";
import { formatSI } from "../symbols/format-si";

const inputClass =
  "w-full rounded border border-rule bg-white/80 px-1.5 py-0.5 font-mono text-xs text-ink outline-none focus:border-brass aria-[invalid=true]:border-caution";

function ParameterRow({
  name,
  raw,
  shown,
  parameters,
}: {
  name: string;
  raw: string;
  /** the evaluated value in SI, or "" when it does not evaluate */
  shown: string;
  parameters: Record<string, number | string>;
}) {
  const store = useBenchStore();
  const readOnly = useBench((s) => s.readOnly);
  const [text, setText] = useState(raw);
  const [problem, setProblem] = useState<string | null>(null);
  // The row is keyed by name, so it stays (and keeps focus) when its own value is saved; a value changed from
  // elsewhere (undo, redo, a calculator) is taken into the field during render, React's pattern for derived state.
  const [shownRaw, setShownRaw] = useState(raw);
  if (raw !== shownRaw) {
    setShownRaw(raw);
    setText(raw);
    setProblem(null);
  }
  const save = () => {
    if (text === raw) return setProblem(null);
    const result = parameterSchema(parameters, name).safeParse({ name, value: text });
    if (!result.success) return setProblem(result.error.issues[0]?.message ?? "Not a value.");
    setProblem(null);
    store.getState().setParameter(name, text.trim());
  };
  return (
    <tr className="border-t border-rule align-top">
      <td className="py-1 pr-2 font-mono text-xs">{name}</td>
      <td className="py-1 pr-1">
        <input
          aria-label={`parameter ${name}`}
          className={inputClass}
          value={text}
          disabled={readOnly}
          aria-invalid={problem ? true : undefined}
          onChange={(e) => setText(e.target.value)}
          onBlur={save}
          onKeyDown={(e) => e.key === "Enter" && save()}
        />
        {problem && <p className="text-[11px] leading-snug text-caution">{problem}</p>}
      </td>
      <td className="py-1 pr-1 font-mono text-[11px] whitespace-nowrap text-trace">{shown && `= ${shown}`}</td>
      <td className="py-1">
        {!readOnly && (
          <button
            type="button"
            aria-label={`remove parameter ${name}`}
            className="px-1 text-xs text-ink-soft hover:text-caution"
            onClick={() => store.getState().setParameter(name, undefined)}
          >
            ×
          </button>
        )}
      </td>
    </tr>
  );
}

/** Each parameter's value in SI; a set that does not evaluate (a cycle, a bad expression) shows none. */
function shownValues(parameters: Record<string, number | string>): Record<string, string> {
  try {
    const values = evaluateParameters(parameters);
    return Object.fromEntries(Object.keys(parameters).map((name) => [name, formatSI(values[name])]));
  } catch {
    return {};
  }
}

export function ParametersTable() {
  const store = useBenchStore();
  const readOnly = useBench((s) => s.readOnly);
  const parameters = useBench((s) => s.document.circuit.parameters);
  // evaluated once for all rows (each row used to evaluate the whole set again)
  const shown = useMemo(() => shownValues(parameters), [parameters]);
  const form = useForm<{ name: string; value: string }>({
    resolver: zodResolver(parameterSchema(parameters)),
    defaultValues: { name: "", value: "" },
  });
  const add = form.handleSubmit(({ name, value }) => {
    store.getState().setParameter(name.trim(), value.trim());
    form.reset({ name: "", value: "" });
  });
  return (
    <section aria-label="Parameters">
      <h3 className="mb-1 text-xs font-semibold text-ink">Parameters</h3>
      <table className="w-full">
        <tbody>
          {Object.entries(parameters).map(([name, raw]) => (
            <ParameterRow key={name} name={name} raw={String(raw)} shown={shown[name] ?? ""} parameters={parameters} />
          ))}
        </tbody>
      </table>
      {Object.keys(parameters).length === 0 && <p className="text-xs text-ink-soft">No parameters yet.</p>}
      {!readOnly && (
        <form onSubmit={add} className="mt-2 flex items-start gap-1" noValidate>
          <div className="w-20">
            <input aria-label="new parameter name" placeholder="RB" className={inputClass} {...form.register("name")} />
          </div>
          <div className="flex-1">
            <input
              aria-label="new parameter value"
              placeholder="1G"
              className={inputClass}
              {...form.register("value")}
            />
          </div>
          <button type="submit" className="rounded border border-rule px-2 py-0.5 text-xs hover:bg-paper-deep">
            Add
          </button>
        </form>
      )}
      {(form.formState.errors.name || form.formState.errors.value) && (
        <p className="mt-1 text-[11px] text-caution" role="alert">
          {form.formState.errors.name?.message ?? form.formState.errors.value?.message}
        </p>
      )}
    </section>
  );
}
