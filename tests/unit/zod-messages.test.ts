/**
 * How a refused input is worded for an API caller (app/_server/respond.ts): the message starts with the field to
 * fix, also when the schema is a union (whose own issue names no field) or the body as a whole is wrong. The
 * expected words are the schemas' own (components/schemas), so the check is that the right one is picked.
 */
import { describe, expect, it } from "vitest";
import { z } from "zod";
import { toAppError } from "@/app/_server/respond";
import { circuitObjectSchema } from "@/components/schemas/design";
import { createRemarkSchema, createReviewSchema, markReadSchema } from "@/components/schemas/review";

const refusal = (schema: z.ZodType, input: unknown) => {
  const parsed = schema.safeParse(input);
  if (parsed.success) throw new Error("expected the schema to refuse the input");
  const error = toAppError(parsed.error);
  return { status: error.status, message: error.message, fields: error.fields ?? {} };
};
const ID = "00000000-0000-4000-8000-000000000000";

describe("messages of refused input", () => {
  it("names the field of a union's closest branch", () => {
    expect(refusal(createRemarkSchema, { body: 5, anchor: { type: "part", part: "J1" } })).toMatchObject({ status: 422, message: "body: Write the remark." });
    expect(refusal(markReadSchema, { ids: "all" }).message).toMatch(/^ids: /);
  });

  it("prefers the schema's own words over zod's default among equally close branches", () => {
    const { message, fields } = refusal(createReviewSchema, { revisionId: ID, reviewerIds: [ID], dueAt: 5 });
    expect(message).toBe("dueAt: Give the due date as a day, such as 2026-12-24.");
    expect(fields).toEqual({ dueAt: "Give the due date as a day, such as 2026-12-24." });
  });

  it("says when the body as a whole is of the wrong kind", () => {
    expect(refusal(circuitObjectSchema, [1, 2]).message).toBe("The request body: The circuit file must be a JSON object (a backplate/circuit file).");
    expect(refusal(z.object({ a: z.string() }), "text").fields).toHaveProperty("_");
  });
});
