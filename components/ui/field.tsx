import type { InputHTMLAttributes, ReactNode } from "react";

/** A labelled input with its hint and its error message beside it (read by screen readers through aria-describedby). */
export function Field({
  id,
  label,
  error,
  hint,
  ...input
}: { id: string; label: ReactNode; error?: string; hint?: ReactNode } & InputHTMLAttributes<HTMLInputElement>) {
  const described = [hint ? `${id}-hint` : null, error ? `${id}-error` : null].filter(Boolean).join(" ") || undefined;
  return (
    <div className="flex flex-col gap-1">
      <label htmlFor={id} className="text-sm font-medium text-ink">
        {label}
      </label>
      <input
        id={id}
        aria-invalid={error ? true : undefined}
        aria-describedby={described}
        className="rounded-md border border-rule bg-white/70 px-3 py-2 text-ink shadow-inner outline-none focus:border-brass aria-[invalid]:border-caution"
        {...input}
      />
      {hint ? (
        <p id={`${id}-hint`} className="text-xs text-ink-soft">
          {hint}
        </p>
      ) : null}
      {error ? (
        <p id={`${id}-error`} className="text-sm text-caution">
          {error}
        </p>
      ) : null}
    </div>
  );
}
