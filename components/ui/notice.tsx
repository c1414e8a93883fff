import type { ReactNode } from "react";

/** A message above a form or a list: an error (caution colours, announced) or a plain note. */
export function Notice({ tone = "note", children }: { tone?: "error" | "note" | "done"; children: ReactNode }) {
  const style =
    tone === "error"
      ? "border-caution/40 bg-caution-bg text-caution"
      : tone === "done"
        ? "border-trace/40 bg-trace-light/30 text-trace"
        : "border-rule bg-paper-deep text-ink-soft";
  return (
    <div role={tone === "error" ? "alert" : "status"} className={`rounded-md border px-3 py-2 text-sm ${style}`}>
      {children}
    </div>
  );
}
