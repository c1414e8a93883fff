"use client";
/** Run / progress bar / Cancel for one large-signal job, and its error or cancelled note. */
import type { Outcome } from "../solver/protocol";
import type { LongJobState } from "../solver/use-long-job";

export function JobControls<R>({
  job,
  label,
  runLabel,
  onRun,
  disabled,
  outdated,
}: {
  job: LongJobState<Outcome<R>>;
  label: string;
  runLabel: string;
  onRun: () => void;
  disabled?: string | null;
  outdated: boolean;
}) {
  const running = job.status === "running";
  const failed = job.result && !job.result.ok ? job.result.error.message : job.error;
  return (
    <div className="flex flex-wrap items-center gap-3 text-xs">
      {running ? (
        <span className="flex items-center gap-2" data-testid={`${label}-progress`}>
          <progress
            max={job.progress?.total ?? 1}
            value={job.progress?.done ?? 0}
            className="h-2 w-40"
            aria-label={`${label} progress`}
          />
          <span>{job.progress ? `${Math.round((100 * job.progress.done) / job.progress.total)} %` : "Starting…"}</span>
          <button type="button" onClick={job.cancel} className="rounded border border-rule px-2 py-0.5 underline">
            Cancel
          </button>
        </span>
      ) : (
        <button
          type="button"
          onClick={onRun}
          disabled={Boolean(disabled)}
          className="rounded bg-graphite px-2 py-1 text-paper disabled:opacity-50"
        >
          {runLabel}
        </button>
      )}
      {disabled && <span className="text-ink-soft">{disabled}</span>}
      {job.status === "cancelled" && (
        <span className="text-ink-soft" data-testid={`${label}-cancelled`}>
          Cancelled; nothing was changed. Run again when ready.
        </span>
      )}
      {!running && outdated && job.result?.ok && (
        <span className="rounded bg-brass-light px-1.5 py-0.5 text-ink">
          The design changed since this run; run again.
        </span>
      )}
      {failed && !running && (
        <span className="text-caution" role="alert">
          {failed}
        </span>
      )}
    </div>
  );
}
