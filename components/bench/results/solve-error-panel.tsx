"use client";
/** The engine's error, said as what to fix, with a link to the part or net at fault. */
import type { BenchSolveError } from "../solver/protocol";

export function SolveErrorPanel({
  error,
  onSelectPart,
}: {
  error: BenchSolveError;
  onSelectPart?: (id: string) => void;
}) {
  return (
    <div
      role="alert"
      data-testid="solve-error"
      className="rounded border border-caution bg-caution-bg px-3 py-2 text-sm text-ink"
    >
      <p className="font-semibold text-caution">The circuit does not solve yet</p>
      <p className="mt-1">{error.message}</p>
      <p className="mt-1 text-xs text-ink-soft">
        {error.part ? `Fix part ${error.part}${error.field ? ` (${error.field})` : ""}. ` : ""}
        {error.net ? `Look at net “${error.net}”. ` : ""}
        The last result that solved stays below, marked out of date.
      </p>
      {error.part && onSelectPart && (
        <button
          type="button"
          onClick={() => onSelectPart(error.part as string)}
          className="mt-1 text-xs font-medium text-caution underline"
        >
          Select {error.part}
        </button>
      )}
    </div>
  );
}
