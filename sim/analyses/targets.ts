/**
 * Design targets (the contract's "Targets" section): limits on figures that a revision must meet, each optionally for
 * one variant. `checkTargets` is pure: it reads the figures already computed for the base design (key "") and for
 * each variant (key = variant name) and says, per target, whether the figure lies within [min, max]. A figure that is
 * null, missing or not a number fails its target — a limit on a number that could not be computed is not met.
 */
import type { Target } from "../circuit/types";
import type { Figures, TargetCheck } from "../results";

export type { TargetCheck } from "../results";

/** Key of the base design (no variant applied) in the results-per-variant map. */
export const BASE_VARIANT = "";

/** Figures per variant: `""` is the design as drawn (or as run, with the headless command's `--variant`). */
export type FiguresByVariant = Record<string, Figures | undefined>;

/** The variant keys a set of targets needs figures for, base first. */
export function variantsNeeded(targets: readonly Target[]): string[] {
  const names = new Set<string>();
  for (const target of targets) names.add(target.variant ?? BASE_VARIANT);
  return [...names].sort((a, b) => (a === BASE_VARIANT ? -1 : b === BASE_VARIANT ? 1 : a.localeCompare(b)));
}

function numeric(value: unknown): number | null {
  return typeof value === "number" && Number.isFinite(value) ? value : null;
}

export function checkTarget(target: Target, figures: Figures | undefined): TargetCheck {
  const value = numeric(figures?.[target.figure]);
  const aboveMin = target.min === undefined || (value !== null && value >= target.min);
  const belowMax = target.max === undefined || (value !== null && value <= target.max);
  return {
    figure: target.figure,
    ...(target.variant !== undefined && { variant: target.variant }),
    value,
    ...(target.min !== undefined && { min: target.min }),
    ...(target.max !== undefined && { max: target.max }),
    pass: value !== null && aboveMin && belowMax,
  };
}

/** One check per target, in the file's order. */
export function checkTargets(file: { targets?: readonly Target[] }, results: FiguresByVariant): TargetCheck[] {
  return (file.targets ?? []).map((target) => checkTarget(target, results[target.variant ?? BASE_VARIANT]));
}

export function allPass(checks: readonly TargetCheck[]): boolean {
  return checks.every((check) => check.pass);
}
