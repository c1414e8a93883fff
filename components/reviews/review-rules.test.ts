/** The review rules of the issue: a viewer cannot decide; a designer cannot approve their own revision unless allowed. */
import { describe, expect, it } from "vitest";
import { canBeAskedToReview, decideRefusal, reviewersOfferedTo } from "./review-rules";

const base = { isRequestedReviewer: true, isAuthor: false, allowSelfApproval: false };

describe("review rules", () => {
  it("asks reviewers and owners, and designers only where designers may approve", () => {
    expect(canBeAskedToReview("reviewer", { allowSelfApproval: false })).toBe(true);
    expect(canBeAskedToReview("owner", { allowSelfApproval: false })).toBe(true);
    expect(canBeAskedToReview("designer", { allowSelfApproval: false })).toBe(false);
    expect(canBeAskedToReview("designer", { allowSelfApproval: true })).toBe(true);
    expect(canBeAskedToReview("viewer", { allowSelfApproval: true })).toBe(false);
  });

  it("offers the requester's colleagues who can review, never the requester nor a viewer", () => {
    // the rule: nobody reviews their own request; viewers only read
    const members = [
      { id: "owner-1", role: "owner" as const },
      { id: "rev-1", role: "reviewer" as const },
      { id: "des-1", role: "designer" as const },
      { id: "view-1", role: "viewer" as const },
    ];
    expect(reviewersOfferedTo(members, "owner-1", { allowSelfApproval: false }).map((m) => m.id)).toEqual(["rev-1"]);
    expect(reviewersOfferedTo(members, "des-1", { allowSelfApproval: true }).map((m) => m.id)).toEqual(["owner-1", "rev-1"]);
    expect(reviewersOfferedTo(members, "rev-1", { allowSelfApproval: true }).map((m) => m.id)).toEqual(["owner-1", "des-1"]);
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
