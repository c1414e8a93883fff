/**
 * Inputs of reviews, remarks, decisions and notification preferences: one schema each, shared by the forms, the route
 * handlers and the query functions in db/. Pure zod.
 */
import { z } from "zod";

const id = (what: string) => z.uuid({ error: `That is not a valid ${what} id.` });

/** Keeps a message to a size a mail and a page show whole. */
const text = (what: string, max: number) =>
  z
    .string({ error: `Write the ${what}.` })
    .trim()
    .min(1, { error: `Write the ${what}.` })
    .max(max, { error: `Keep the ${what} to ${max} characters or fewer.` });

export const createReviewSchema = z.object({
  revisionId: id("revision"),
  reviewerIds: z
    .array(id("reviewer"), { error: "Pick at least one reviewer." })
    .min(1, { error: "Pick at least one reviewer." })
    .max(20, { error: "Pick at most 20 reviewers." }),
  /** A day (YYYY-MM-DD) or a full ISO time; empty means no due date. */
  dueAt: z
    .union([z.literal(""), z.iso.date({ error: "Give the due date as a day, such as 2026-12-24." }), z.iso.datetime({ offset: true })])
    .optional(),
  message: z.string().trim().max(2000, { error: "Keep the message to 2000 characters or fewer." }).default(""),
});
export type CreateReviewInput = z.input<typeof createReviewSchema>;

export const ANCHOR_TYPES = ["part", "net", "frequency", "figure"] as const;
export type AnchorType = (typeof ANCHOR_TYPES)[number];

const anchorName = (what: string) =>
  z
    .string({ error: `Name the ${what}.` })
    .trim()
    .min(1, { error: `Name the ${what}.` })
    .max(80, { error: `A ${what} name is at most 80 characters.` });

const hz = z.number({ error: "Give the frequency in Hz as a number." }).positive({ error: "A frequency is above 0 Hz." }).max(1e7, {
  error: "Keep frequencies at or below 10 MHz.",
});

/** What a remark is about (db/schema.ts `remarks.anchor`). */
export const anchorSchema = z.discriminatedUnion(
  "type",
  [
    z.object({ type: z.literal("part"), part: anchorName("part") }),
    z.object({ type: z.literal("net"), net: anchorName("net") }),
    z
      .object({ type: z.literal("frequency"), fromHz: hz, toHz: hz })
      .refine((a) => a.fromHz < a.toHz, { error: "The range's start must be below its end (from < to).", path: ["toHz"] }),
    z.object({ type: z.literal("figure"), figure: anchorName("figure") }),
  ],
  { error: "Say what the remark is about: a part, a net, a frequency range or a figure." },
);
export type RemarkAnchor = z.output<typeof anchorSchema>;

/** A new remark (with its anchor) or a reply (with parentId; it shares its thread's anchor). */
export const createRemarkSchema = z.union([
  z.object({ body: text("remark", 4000), anchor: anchorSchema }),
  z.object({ body: text("reply", 4000), parentId: id("remark") }),
]);
export type CreateRemarkInput = z.input<typeof createRemarkSchema>;

export const resolveRemarkSchema = z.object({ resolved: z.boolean({ error: "resolved must be true or false." }) });

export const VERDICTS = ["approve", "rework"] as const;
export type Verdict = (typeof VERDICTS)[number];

export const decisionSchema = z.object({
  verdict: z.enum(VERDICTS, { error: 'Choose "approve" or "rework".' }),
  reason: text("reason", 2000),
});
export type DecisionInput = z.input<typeof decisionSchema>;

/** The kinds of notification; each can have its e-mail copy turned off on the account page. */
export const NOTIFICATION_KINDS = [
  "review.requested",
  "remark.created",
  "remark.replied",
  "remark.resolved",
  "decision.made",
  "revision.created",
] as const;
export type NotificationKind = (typeof NOTIFICATION_KINDS)[number];

export const NOTIFICATION_KIND_LABELS: Record<NotificationKind, string> = {
  "review.requested": "A review is requested of you",
  "remark.created": "A remark on a review you are in",
  "remark.replied": "A reply in a thread you are in",
  "remark.resolved": "A remark resolved or reopened",
  "decision.made": "A reviewer decides",
  "revision.created": "A new revision of a design under review",
};

export const notificationPreferencesSchema = z.object({
  emailEnabled: z.boolean({ error: "emailEnabled must be true or false." }),
  email: z.partialRecord(z.enum(NOTIFICATION_KINDS, { error: "Unknown notification kind." }), z.boolean()).default({}),
});
export type NotificationPreferencesInput = z.input<typeof notificationPreferencesSchema>;

export const markReadSchema = z.union([
  z.object({ ids: z.array(id("notification")).min(1, { error: "Name at least one notification." }).max(200) }),
  z.object({ all: z.literal(true) }),
]);
