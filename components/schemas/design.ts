/**
 * Inputs of designs and revisions: one schema each, shared by the form that sends it, the route handler that reads
 * it and the query functions below them. Circuit files themselves are validated by the engine (sim/) on the server;
 * here a circuit is only "a JSON object", so the form and the API give the same first message for non-objects.
 */
import { z } from "zod";

export const DESIGN_STATUSES = ["draft", "in_review", "approved", "rework"] as const;
export type DesignStatus = (typeof DESIGN_STATUSES)[number];

export const DESIGN_STATUS_LABELS: Record<DesignStatus, string> = {
  draft: "Draft",
  in_review: "In review",
  approved: "Approved",
  rework: "Rework",
};

/** Largest circuit file accepted, in bytes of its JSON text (the 1 MB). */
export const MAX_CIRCUIT_BYTES = 1_000_000;

export const designTitleSchema = z
  .string({ error: "Give the design a title." })
  .trim()
  .min(1, { error: "Give the design a title." })
  .max(120, { error: "Keep the title to 120 characters or fewer." });

export const revisionMessageSchema = z
  .string({ error: "Say what changed in this revision." })
  .trim()
  .min(1, { error: "Say what changed in this revision." })
  .max(500, { error: "Keep the message to 500 characters or fewer." });

/** A circuit file as parsed JSON: an object; the engine checks the rest. */
export const circuitObjectSchema = z.record(z.string(), z.unknown(), {
  error: "The circuit file must be a JSON object (a backplate/circuit file).",
});

export const createDesignSchema = z.object({
  title: designTitleSchema,
  description: z.string().trim().max(2000, { error: "Keep the description to 2000 characters or fewer." }).default(""),
  /** Omitted: start from the empty starting circuit. */
  circuit: circuitObjectSchema.optional(),
  /** The drawing of `circuit` (a starting point's); omitted: the bench lays the circuit out when it opens. */
  layout: z.record(z.string(), z.unknown()).optional(),
  message: z.string().trim().max(500).optional(),
});
export type CreateDesignInput = z.input<typeof createDesignSchema>;

/** The import's query string: `?title=` (omitted: the file's own title, else "Imported circuit"). */
export const importDesignQuerySchema = z.object({ title: designTitleSchema.optional() });

export const renameDesignSchema = z.object({ title: designTitleSchema });
export type RenameDesignInput = z.input<typeof renameDesignSchema>;

export const saveRevisionSchema = z.object({
  /** The revision this save started from; null only for a design with no revision yet. */
  parentRevisionId: z.uuid({ error: "parentRevisionId must be the id of the revision you started from." }).nullable(),
  circuit: circuitObjectSchema,
  message: revisionMessageSchema,
  layout: z.record(z.string(), z.unknown()).optional(),
});
export type SaveRevisionInput = z.input<typeof saveRevisionSchema>;

export const restoreRevisionSchema = z.object({
  parentRevisionId: z.uuid({ error: "parentRevisionId must be the id of the current head revision." }),
  message: z.string().trim().max(500).optional(),
});
export type RestoreRevisionInput = z.input<typeof restoreRevisionSchema>;

export const forkDesignSchema = z.object({
  targetWorkspaceId: z.uuid({ error: "Choose the workspace to fork into." }),
  /** Omitted: the design's latest revision. */
  revisionId: z.uuid().optional(),
  title: designTitleSchema.optional(),
});
export type ForkDesignInput = z.input<typeof forkDesignSchema>;

export const DESIGN_SORTS = ["updated", "title", "created", "status"] as const;
export type DesignSort = (typeof DESIGN_SORTS)[number];

/** Query string of the designs list: every field arrives as text. */
export const listDesignsQuerySchema = z.object({
  q: z.string().trim().max(200).default(""),
  sort: z.enum(DESIGN_SORTS, { error: `sort must be one of ${DESIGN_SORTS.join(", ")}.` }).default("updated"),
  dir: z.enum(["asc", "desc"], { error: 'dir must be "asc" or "desc".' }).default("desc"),
  status: z.enum(DESIGN_STATUSES, { error: `status must be one of ${DESIGN_STATUSES.join(", ")}.` }).optional(),
  author: z.uuid({ error: "author must be a person's id." }).optional(),
  page: z.coerce.number({ error: "page must be a whole number from 1." }).int().min(1).default(1),
  pageSize: z.coerce.number({ error: "pageSize must be 1–100." }).int().min(1).max(100).default(20),
  /** "deleted" lists the soft-deleted designs (to restore them). */
  show: z.enum(["active", "deleted"]).default("active"),
});
export type ListDesignsQuery = z.output<typeof listDesignsQuerySchema>;
