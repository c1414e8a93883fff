/**
 * "What moves this figure": for each headline figure, its normalised sensitivity to every value a designer wrote
 * on a part, found by re-solving the circuit with that one value nudged up and down by a relative step
 * (a central difference in ln value):
 *
 *   S = dF / d(ln v) ≈ (F(v·(1+h)) − F(v·(1−h))) / (ln(1+h) − ln(1−h))
 *
 * For a figure in dB, S is in dB per neper of the value (multiply by 0.01 for "dB per +1 %"). For a figure in
 * linear units (Hz, Ω, V/Pa) the elasticity E = S / F = d(ln F)/d(ln v) is also given: −1 means "1 % more value
 * gives 1 % less figure". Parts are ranked by |E| where it exists, else by |S|.
 *
 * Only numbers a designer wrote are nudged (not defaults, not counts such as a cable's segments, not phases): a
 * nudged value replaces the part's value with the elaborated number × (1 ± h), so expressions and parameters
 * resolve first, under the chosen variant.
 */
import { elaborate } from "../circuit/elaborate";
import { KIND_SPECS } from "../circuit/kinds";
import type { Figures } from "../results";
import { runCircuit } from "../run";

/** Default relative nudge: 1 % either way (small against component tolerances, large against round-off). */
export const DEFAULT_RELATIVE_STEP = 0.01;

/** Quantities that are not nudged: whole-number counts and phase angles have no meaningful "1 % more". */
const NOT_NUDGED_QUANTITIES = new Set(["count", "angle"]);

/** Figures in dB (their elasticity is not reported: a ratio of a logarithm means nothing). */
const DECIBEL_FIGURES = new Set(["gain_1khz_db", "sensitivity_db_re_1v_per_pa", "self_noise_dba_spl"]);

export interface ValueSensitivity {
  part: string;
  /** the value's name on the part (resistance, capacitance, idss, …) */
  field: string;
  /** the value as elaborated, SI */
  value: number;
  /** dF / d(ln value), in the figure's unit */
  sensitivity: number;
  /** d(ln F) / d(ln value), dimensionless; null for figures in dB or where F is zero */
  elasticity: number | null;
}

export interface FigureSensitivity {
  figure: string;
  /** the figure's value in the unnudged circuit */
  baseline: number;
  /** every nudged value, ranked: largest influence first */
  ranked: ValueSensitivity[];
}

export interface FigureSensitivityOptions {
  variant?: string;
  /** relative step h (0 < h < 0.5) */
  relativeStep?: number;
  /** called after each nudged value is solved: (done, total) */
  onProgress?: (done: number, total: number) => void;
}

interface NudgeTarget {
  partIndex: number;
  part: string;
  field: string;
  value: number;
}

type RawPart = { id?: unknown; values?: Record<string, unknown> };

/** The values to nudge: written on a part in the file, numeric, finite and non-zero once elaborated. */
function nudgeTargets(file: unknown, variant: string | undefined): NudgeTarget[] {
  const circuit = elaborate(file, { variant });
  const rawParts = ((file as { parts?: RawPart[] }).parts ?? []) as RawPart[];
  const targets: NudgeTarget[] = [];
  for (const part of circuit.parts) {
    const partIndex = rawParts.findIndex((p) => p.id === part.id);
    const written = rawParts[partIndex]?.values ?? {};
    const spec = KIND_SPECS[part.kind];
    for (const field of Object.keys(written)) {
      const valueSpec = spec.values[field];
      if (valueSpec?.type !== "number" || NOT_NUDGED_QUANTITIES.has(valueSpec.quantity)) continue;
      const value = part.values[field];
      if (typeof value !== "number" || !Number.isFinite(value) || value === 0) continue;
      targets.push({ partIndex, part: part.id, field, value });
    }
  }
  return targets;
}

function withValue(file: unknown, target: NudgeTarget, value: number): unknown {
  const copy = structuredClone(file) as { parts: RawPart[] };
  const part = copy.parts[target.partIndex];
  part.values = { ...part.values, [target.field]: value };
  return copy;
}

function numericFigures(figures: Figures): Record<string, number> {
  const out: Record<string, number> = {};
  for (const [name, value] of Object.entries(figures)) {
    if (typeof value === "number" && Number.isFinite(value)) out[name] = value;
  }
  return out;
}

/** Only the figures matter here: drop the plotted analyses, keep noise (self-noise needs it). */
function figuresOnly(file: unknown): unknown {
  const f = file as { analyses?: Record<string, unknown> };
  const analyses = f.analyses ?? {};
  return { ...f, analyses: analyses.noise ? { noise: analyses.noise } : {} };
}

function rankKey(s: ValueSensitivity): number {
  return Math.abs(s.elasticity ?? s.sensitivity);
}

export function figureSensitivities(file: unknown, options: FigureSensitivityOptions = {}): FigureSensitivity[] {
  const h = options.relativeStep ?? DEFAULT_RELATIVE_STEP;
  if (!(h > 0 && h < 0.5)) throw new RangeError(`The relative step must be between 0 and 0.5; got ${h}.`);
  const base = figuresOnly(file);
  const baseline = numericFigures(runCircuit(base, { variant: options.variant }).figures);
  const targets = nudgeTargets(base, options.variant);
  const lnSpan = Math.log(1 + h) - Math.log(1 - h);
  const perFigure = new Map<string, ValueSensitivity[]>(Object.keys(baseline).map((name) => [name, []]));
  targets.forEach((target, index) => {
    const up = numericFigures(
      runCircuit(withValue(base, target, target.value * (1 + h)), { variant: options.variant }).figures,
    );
    const down = numericFigures(
      runCircuit(withValue(base, target, target.value * (1 - h)), { variant: options.variant }).figures,
    );
    for (const [figure, list] of perFigure) {
      if (!(figure in up) || !(figure in down)) continue;
      const sensitivity = (up[figure] - down[figure]) / lnSpan;
      const f0 = baseline[figure];
      const elasticity = DECIBEL_FIGURES.has(figure) || f0 === 0 ? null : sensitivity / f0;
      list.push({ part: target.part, field: target.field, value: target.value, sensitivity, elasticity });
    }
    options.onProgress?.(index + 1, targets.length);
  });
  return [...perFigure].map(([figure, ranked]) => ({
    figure,
    baseline: baseline[figure],
    ranked: ranked.sort((a, b) => rankKey(b) - rankKey(a)),
  }));
}
