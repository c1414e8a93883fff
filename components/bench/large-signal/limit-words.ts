/**
 * max_spl_db in words: the level, and what limits it ("J1 leaves its region: cut-off"). The engine names the
 * boundary in the contract's words (sim/devices/device.ts RegionMargin) and, where that word would mislead, in the
 * device's own (a JFET out of drain headroom: "saturation", detail "ohmic (triode) region …"): the detail is shown.
 */
import type { Figures } from "@/sim/results";
import { formatFixed } from "../results/format";

export interface MaxSplWords {
  value: string;
  /** why it is missing, or what limits it */
  note: string | null;
}

export function limitedByWords(limit: unknown): string | null {
  if (limit === null || typeof limit !== "object") return null;
  const { part, reason, detail } = limit as { part?: unknown; reason?: unknown; detail?: unknown };
  if (typeof part !== "string" || typeof reason !== "string") return null;
  return `${part} leaves its region: ${typeof detail === "string" ? `out of headroom, ${detail}` : reason}`;
}

export function maxSplWords(figures: Figures): MaxSplWords {
  const half = figures.max_spl_db as number | null | undefined;
  const one = figures.max_spl_1pct_db as number | null | undefined;
  if (half == null) return { value: "—", note: "THD stays below 0.5 % up to 160 dB SPL" };
  const value = `${formatFixed(half, 1, "dB SPL")} (0.5 % THD)${one == null ? "" : ` · ${formatFixed(one, 1, "dB SPL")} (1 %)`}`;
  return { value, note: limitedByWords(figures.max_spl_limited_by) };
}
