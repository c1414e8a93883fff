"use client";
/** One labelled calculator input with its message under it when it does not read. */
export function CalculatorField({
  label,
  value,
  onChange,
  problem,
}: {
  label: string;
  value: string;
  onChange: (v: string) => void;
  problem?: string;
}) {
  return (
    <label className="block text-xs">
      <span className="text-ink-soft">{label}</span>
      <input
        value={value}
        onChange={(e) => onChange(e.target.value)}
        aria-invalid={problem !== undefined}
        className={`mt-0.5 block w-full rounded border bg-paper px-1.5 py-0.5 font-mono text-sm ${problem ? "border-caution" : "border-rule"}`}
      />
      {problem && <span className="mt-0.5 block text-caution">{problem}</span>}
    </label>
  );
}
