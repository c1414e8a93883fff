/** Attaching a sign-off report to a review: which review, and optionally which destinations the plots show. */
import { z } from "zod";

export const attachReportSchema = z.object({
  reviewId: z.uuid({ error: "Choose the review to attach the report to." }),
  destinations: z.array(z.string().max(80)).max(8, "Choose at most 8 destinations.").optional(),
});
export type AttachReportInput = z.infer<typeof attachReportSchema>;
