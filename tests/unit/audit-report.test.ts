/**
 * Reading `npm audit --json` (npm 7+ report, "auditReportVersion": 2 — from memory of npm's format, the shape npm
 * documents under `npm audit --json`): each vulnerable package's `via` holds advisory objects (with severity and a
 * GitHub advisory URL) or names of other vulnerable packages it depends on.
 */
import { describe, expect, it } from "vitest";
// @ts-expect-error plain ES module script without types
import { blockingAdvisories } from "../../scripts/audit.mjs";

const report = {
  auditReportVersion: 2,
  vulnerabilities: {
    "left-pad-ish": {
      name: "left-pad-ish",
      severity: "high",
      via: [{ source: 1001, name: "left-pad-ish", title: "Prototype pollution", url: "https://github.com/advisories/GHSA-aaaa-bbbb-cccc", severity: "high" }],
    },
    wrapper: { name: "wrapper", severity: "high", via: ["left-pad-ish"] },
    "slow-regex": {
      name: "slow-regex",
      severity: "moderate",
      via: [{ source: 1002, name: "slow-regex", title: "ReDoS", url: "https://github.com/advisories/GHSA-dddd-eeee-ffff", severity: "moderate" }],
    },
    "big-hole": {
      name: "big-hole",
      severity: "critical",
      via: [{ source: 1003, name: "big-hole", title: "Remote code execution", url: "https://github.com/advisories/GHSA-gggg-hhhh-iiii", severity: "critical" }],
    },
  },
};

describe("blocking advisories", () => {
  it("keeps high and critical advisories once each, by GHSA id, and ignores moderate ones and package references", () => {
    const found = blockingAdvisories(report).map((a: { id: string; package: string; severity: string }) => [a.id, a.package, a.severity]);
    expect(found).toEqual([
      ["GHSA-aaaa-bbbb-cccc", "left-pad-ish", "high"],
      ["GHSA-gggg-hhhh-iiii", "big-hole", "critical"],
    ]);
  });

  it("finds nothing in a clean report", () => {
    expect(blockingAdvisories({ auditReportVersion: 2, vulnerabilities: {} })).toEqual([]);
  });
});
