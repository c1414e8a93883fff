/** A pinned result: the live curves and figures as they were when pinned, kept while the design is edited. */
import type { Figures } from "@/sim/results";
import type { PlotCurve } from "../plots/traces";

export interface PinnedResult {
  label: string;
  pinnedAt: string;
  curve: PlotCurve;
  figures: Figures;
}

export function pinCurve(curve: PlotCurve, figures: Figures, when: Date): PinnedResult {
  const time = when.toLocaleTimeString([], { hour: "2-digit", minute: "2-digit", second: "2-digit" });
  return {
    label: `Pinned ${time}`,
    pinnedAt: when.toISOString(),
    curve: { ...curve, id: `pinned:${when.getTime()}`, label: `Pinned ${time}`, style: "pinned" },
    figures,
  };
}
