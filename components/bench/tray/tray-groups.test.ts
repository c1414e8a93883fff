import { describe, expect, it } from "vitest";
import { PART_KINDS } from "@/sim/circuit/types";
import { TRAY_GROUPS } from "./tray-groups";

describe("tray", () => {
  it("offers every kind of the circuit contract exactly once, plus ground and net label", () => {
    const items = TRAY_GROUPS.flatMap((g) => g.items);
    expect(new Set(items).size).toBe(items.length);
    expect(items.filter((i) => i !== "ground" && i !== "label").sort()).toEqual([...PART_KINDS].sort());
    expect(items).toContain("ground");
    expect(items).toContain("label");
  });
});
