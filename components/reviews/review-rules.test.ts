/** The review rules of the issue: a viewer cannot decide; a designer cannot approve their own revision unless allowed. */
import { describe, expect, it } from "vitest";
import { canBeAskedToReview, decideRefusal } from "./review-rules";

const base = { isRequestedReviewer: true, isAuthor: false, allowSelfApproval: false };

describe("review rules", () => {
  it("asks reviewers and owners, and designers only where designers may approve", () => {
    expect(canBeAskedToReview("reviewer", { allowSelfApproval: false })).toBe(true);
    expect(canBeAskedToReview("owner", { allowSelfApproval: false })).toBe(true);
    expect(canBeAskedToReview("designer", { allowSelfApproval: false })).toBe(false);
    expect(canBeAskedToReview("designer", { allowSelfApproval: true })).toBe(true);
    expect(canBeAskedToReview("viewer", { allowSelfApproval: true })).toBe(false);
  });

  it("refuses a viewer either verdict, and lets reviewers and owners decide", () => {
    expect(decideRefusal("rework", { ...base, role: "viewer" })).toMatch(/Viewers read/);
    expect(decideRefusal("approve", { ...base, role: "reviewer" })).toBeNull();
    expect(decideRefusal("rework", { ...base, role: "owner", isRequestedReviewer: false })).toBeNull();
  });

  it("refuses self-approval unless the workspace allows it, but not asking for rework", () => {
    expect(decideRefusal("approve", { ...base, role: "owner", isAuthor: true })).toMatch(/own revision/);
    expect(decideRefusal("rework", { ...base, role: "owner", isAuthor: true })).toBeNull();
    expect(decideRefusal("approve", { ...base, role: "designer", isAuthor: true })).toMatch(/Designers decide only/);
    expect(decideRefusal("approve", { ...base, role: "designer", isAuthor: true, allowSelfApproval: true })).toBeNull();
    expect(decideRefusal("approve", { ...base, role: "designer", isRequestedReviewer: false, allowSelfApproval: true })).toMatch(/Designers/);
  });
});
