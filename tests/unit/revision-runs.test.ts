import { describe, expect, it } from "vitest";
import { runSavedRevision } from "@/app/_server/revision-runs";
import { runCircuit } from "@/sim";
import demo from "@/sim/examples/demo-microphone.json";

describe("runSavedRevision", () => {
  it("gives the engine's own result for a revision, and the same result again without solving twice", () => {
    const first = runSavedRevision("rev-a", demo);
    // the independent reference: the engine called directly on the same circuit
    expect(first.ok && first.document.figures).toEqual(runCircuit(demo).figures);
    const again = runSavedRevision("rev-a", structuredClone(demo));
    expect(again).toBe(first);
  });

  it("keeps another revision's run apart, even of an equal circuit", () => {
    const a = runSavedRevision("rev-b", demo);
    const b = runSavedRevision("rev-c", demo);
    expect(b).not.toBe(a);
  });
});
