/** Outdated remarks: a remark's part compared between two circuits (the demo microphone example as the base). */
import { describe, expect, it } from "vitest";
import demo from "@/sim/examples/demo-microphone.json";
import { anchorKey, anchorLabel, anchorQuery, isRemarkOutdated } from "./remark-outdated";

type Part = { id: string; values: Record<string, unknown>; pins: Record<string, string> };
const clone = () => structuredClone(demo) as unknown as { parts: Part[] };

describe("isRemarkOutdated", () => {
  const before = clone();
  const partId = before.parts[0].id;
  const otherId = before.parts[1].id;
  const after = clone();
  const [valueName] = Object.keys(after.parts[0].values);
  after.parts[0].values[valueName] = "123k";
  const net = Object.values(before.parts[0].pins)[0];

  it("marks a remark on a changed part outdated, and one on an unchanged part current", () => {
    expect(isRemarkOutdated({ type: "part", part: partId }, before, after)).toBe(true);
    const unchangedIds = before.parts.filter((p) => !Object.values(p.pins).includes(net) && p.id !== partId).map((p) => p.id);
    expect(isRemarkOutdated({ type: "part", part: otherId }, before, after)).toBe(false);
    for (const id of unchangedIds) expect(isRemarkOutdated({ type: "part", part: id }, before, after)).toBe(false);
  });

  it("marks a removed part outdated, a net whose part changed outdated, and frequency/figure remarks current", () => {
    const removed = clone();
    removed.parts = removed.parts.filter((p) => p.id !== otherId);
    expect(isRemarkOutdated({ type: "part", part: otherId }, before, removed)).toBe(true);
    expect(isRemarkOutdated({ type: "net", net }, before, after)).toBe(true);
    expect(isRemarkOutdated({ type: "net", net }, before, clone())).toBe(false);
    expect(isRemarkOutdated({ type: "frequency", fromHz: 20, toHz: 200 }, before, after)).toBe(false);
    expect(isRemarkOutdated({ type: "figure", figure: "low_corner_hz" }, before, after)).toBe(false);
  });

  it("labels anchors and builds the bench's query for each", () => {
    expect(anchorLabel({ type: "frequency", fromHz: 20, toHz: 2000 })).toBe("20 Hz – 2 kHz");
    expect(anchorQuery({ type: "frequency", fromHz: 20, toHz: 200 })).toBe("?from=20&to=200");
    expect(anchorQuery({ type: "part", part: "J1" })).toBe("?part=J1");
    expect(anchorQuery({ type: "net", net: "out" })).toBe("?net=out");
    expect(anchorQuery({ type: "figure", figure: "low_corner_hz" })).toBe("?figure=low_corner_hz");
    expect(anchorKey({ type: "part", part: "J1" })).toBe("part:J1");
    expect(anchorKey({ type: "frequency", fromHz: 20, toHz: 200 })).toBe("frequency:20-200");
  });
});
