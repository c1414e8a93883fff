import { describe, expect, it } from "vitest";
import demo from "@/sim/examples/demo-microphone.json";
import { readCircuitText } from "./read-circuit-file";

describe("readCircuitText", () => {
  it("accepts a circuit file's text", () => {
    expect(readCircuitText(JSON.stringify(demo))).toEqual({ ok: true, circuit: demo });
  });
  it("says what is wrong with empty, malformed, non-object and oversized text", () => {
    expect(readCircuitText("  ")).toMatchObject({ ok: false, message: /Paste a circuit file/ });
    expect(readCircuitText("{ parts: [")).toMatchObject({ ok: false, message: /not valid JSON/ });
    expect(readCircuitText("[1, 2]")).toMatchObject({ ok: false, message: /JSON object/ });
    expect(readCircuitText(JSON.stringify({ notes: "x".repeat(1_000_001) }))).toMatchObject({ ok: false, message: /limited to 1 MB/ });
  });
});
