import type { DesignRow } from "./design-types";

/** The designs table's Targets column: whether the latest revision meets the design's targets. */
export function TargetsCell({ row }: { row: DesignRow }) {
  if (row.checksAllPass === undefined) return <span className="text-xs text-ink-soft">—</span>;
  if (row.checksAllPass === null) return <span className="whitespace-nowrap text-xs text-ink-soft">No targets</span>;
  return row.checksAllPass ? (
    <span className="whitespace-nowrap text-xs font-medium text-trace">Met</span>
  ) : (
    <span className="whitespace-nowrap text-xs font-medium text-caution">{row.checksMissed ?? 1} missed</span>
  );
}
