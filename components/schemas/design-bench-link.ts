/**
 * A bench link's input: which revision (or the latest), the view it opens, whether it opens without signing in, and
 * an optional expiry. Shared by the bench-link form and the route handler.
 */
import { z } from "zod";

export const BENCH_PLOTS = ["response", "phase", "figures"] as const;
export type BenchPlot = (typeof BENCH_PLOTS)[number];

export const BENCH_PLOT_LABELS: Record<BenchPlot, string> = {
  response: "Magnitude",
  phase: "Phase",
  figures: "Figures only",
};

/** Lowest and highest frequency a view may ask for, in hertz (the engine's figure range). */
export const VIEW_MIN_HZ = 0.1;
export const VIEW_MAX_HZ = 1_000_000;

export const benchViewSchema = z
  .object({
    plot: z.enum(BENCH_PLOTS, { error: `plot must be one of ${BENCH_PLOTS.join(", ")}.` }).default("response"),
    /** A variant name of the circuit; omitted for the circuit as drawn. */
    variant: z.string().trim().max(120).optional(),
    /** A destination label (a console or recorder input preset, or a custom load) the person should look at. */
    destination: z.string().trim().max(120).optional(),
    fromHz: z.number({ error: "fromHz must be a frequency in Hz." }).min(VIEW_MIN_HZ).max(VIEW_MAX_HZ).optional(),
    toHz: z.number({ error: "toHz must be a frequency in Hz." }).min(VIEW_MIN_HZ).max(VIEW_MAX_HZ).optional(),
  })
  .refine((v) => v.fromHz === undefined || v.toHz === undefined || v.fromHz < v.toHz, {
    error: "The frequency range must start below where it ends.",
    path: ["toHz"],
  });
export type BenchView = z.output<typeof benchViewSchema>;

export const createBenchLinkSchema = z.object({
  /** Omitted or null: the link always opens the design's latest revision. */
  revisionId: z.uuid({ error: "revisionId must be a revision of this design." }).nullable().optional(),
  label: z.string().trim().max(120, { error: "Keep the label to 120 characters or fewer." }).default(""),
  isPublic: z.boolean().default(false),
  /** ISO time; must lie in the future. */
  expiresAt: z.iso
    .datetime({ offset: true, error: "expiresAt must be a date and time, such as 2026-07-01T12:00:00Z." })
    .nullable()
    .optional()
    .refine((v) => v == null || Date.parse(v) > Date.now(), { error: "The expiry must lie in the future." }),
  view: benchViewSchema.default({ plot: "response" }),
});
export type CreateBenchLinkInput = z.input<typeof createBenchLinkSchema>;
