import { DESIGN_STATUS_LABELS, type DesignStatus } from "@/components/schemas/design";

const TONE: Record<DesignStatus, string> = {
  draft: "border-rule bg-paper-deep text-ink-soft",
  in_review: "border-brass/50 bg-brass-light/40 text-ink",
  approved: "border-trace/40 bg-trace-light/40 text-ink",
  rework: "border-caution/40 bg-caution-bg text-caution",
};

export function StatusBadge({ status }: { status: DesignStatus }) {
  return (
    <span className={`inline-block whitespace-nowrap rounded-full border px-2 py-0.5 text-xs font-medium ${TONE[status]}`}>
      {DESIGN_STATUS_LABELS[status]}
    </span>
  );
}
