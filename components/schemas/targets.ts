/**
 * The targets editor's input: the contract's `targets` list (figure, min and/or max, optional variant). The engine's
 * parser checks the same fields when the revision is saved; this schema gives the form its field messages first.
 */
import { z } from "zod";

/** Figures a target can hold, with their units (the contract's "Figures"; max_spl_db once distortion runs). */
export const TARGET_FIGURES = {
  sensitivity_db_re_1v_per_pa: "dB re 1 V/Pa",
  sensitivity_v_per_pa: "V/Pa",
  self_noise_dba_spl: "dB(A) SPL",
  low_corner_hz: "Hz",
  high_corner_hz: "Hz",
  output_impedance_1khz_ohm: "Ω",
  gain_1khz_db: "dB",
  max_spl_db: "dB SPL",
} as const;
export type TargetFigure = keyof typeof TARGET_FIGURES;

export const TARGET_FIGURE_LABELS: Record<TargetFigure, string> = {
  sensitivity_db_re_1v_per_pa: "Sensitivity",
  sensitivity_v_per_pa: "Sensitivity (linear)",
  self_noise_dba_spl: "Self-noise",
  low_corner_hz: "Low corner",
  high_corner_hz: "High corner",
  output_impedance_1khz_ohm: "Output impedance at 1 kHz",
  gain_1khz_db: "Gain at 1 kHz",
  max_spl_db: "Max SPL",
};

const limit = z.number({ error: "A limit is a number." }).refine(Number.isFinite, { error: "A limit is a finite number." });

export const targetSchema = z
  .object({
    figure: z.enum(Object.keys(TARGET_FIGURES) as [TargetFigure, ...TargetFigure[]], { error: "Choose a figure." }),
    min: limit.optional(),
    max: limit.optional(),
    variant: z.string().trim().min(1).max(80).optional(),
  })
  .refine((t) => t.min !== undefined || t.max !== undefined, { error: "Give a minimum, a maximum or both.", path: ["min"] })
  .refine((t) => t.min === undefined || t.max === undefined || t.min <= t.max, {
    error: "The minimum must not be above the maximum.",
    path: ["max"],
  });
export type TargetInput = z.output<typeof targetSchema>;

export const targetsSchema = z.object({ targets: z.array(targetSchema).max(40, { error: "At most 40 targets." }) });
