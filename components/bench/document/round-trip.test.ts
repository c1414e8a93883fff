/**
 * Graph ⇄ circuit: every example circuit, drawn automatically and read back from the drawing alone, has the same
 * parts and the same partition of pins into nets (and the same net names, kept as hints).
 */
import { readdirSync, readFileSync } from "node:fs";
import path from "node:path";
import { describe, expect, it } from "vitest";
import { elaborate } from "@/sim/circuit/elaborate";
import { autoLayout } from "./auto-layout";
import { normaliseCircuit } from "./circuit";
import { openDocument, toExportFile } from "./document";
import { canonicalPartition, handleGroups, syncNets } from "./nets";

const examplesDir = path.resolve(import.meta.dirname, "../../../sim/examples");
const examples = readdirSync(examplesDir).filter((f) => f.endsWith(".json"));

function load(file: string) {
  return JSON.parse(readFileSync(path.join(examplesDir, file), "utf8"));
}

describe("graph ⇄ circuit round trip", () => {
  it("has examples to check", () => {
    expect(examples.length).toBeGreaterThanOrEqual(4);
  });

  for (const file of examples) {
    it(`${file}: the drawing alone gives back the same nets`, () => {
      const circuit = normaliseCircuit(load(file));
      const layout = autoLayout(circuit);
      // forget every net name: the pins' nets must come from the wires and ground symbols only
      const scrambled = {
        ...circuit,
        parts: circuit.parts.map((p) => ({
          ...p,
          pins: Object.fromEntries(Object.keys(p.pins).map((pin) => [pin, `x_${p.id}_${pin}`])),
        })),
      };
      const fromDrawing = syncNets(scrambled, layout).circuit;
      expect(fromDrawing.parts.map((p) => [p.id, p.kind, p.values])).toEqual(
        circuit.parts.map((p) => [p.id, p.kind, p.values]),
      );
      expect(canonicalPartition(fromDrawing)).toEqual(canonicalPartition(circuit));
    });

    it(`${file}: with the names as hints the circuit comes back unchanged and still elaborates`, () => {
      const original = load(file);
      const document = openDocument(original);
      const circuit = normaliseCircuit(original);
      expect(document.circuit.parts.map((p) => p.pins)).toEqual(circuit.parts.map((p) => p.pins));
      expect(document.circuit.output).toEqual(circuit.output);
      // the exported file, layout included, is accepted by the engine and means the same circuit
      expect(elaborate(toExportFile(document))).toEqual(elaborate(original));
    });

    it(`${file}: every part has a placement and no two parts overlap`, () => {
      const document = openDocument(load(file));
      const spots = new Set(Object.values(document.layout.parts).map((p) => `${p.x},${p.y}`));
      expect(spots.size).toBe(document.circuit.parts.length);
    });
  }
});

describe("nets from the drawing", () => {
  const circuit = normaliseCircuit(load("demo-microphone.json"));

  it("a ground symbol makes net 0 even when the hints say otherwise", () => {
    const layout = autoLayout(circuit);
    const renamed = {
      ...circuit,
      parts: circuit.parts.map((p) => ({ ...p, pins: Object.fromEntries(Object.keys(p.pins).map((k) => [k, "zz"])) })),
    };
    const result = syncNets(renamed, layout).circuit;
    expect(result.parts.find((p) => p.id === "RSRC")?.pins.b).toBe("0");
  });

  it("a net label names its net", () => {
    const layout = autoLayout(circuit);
    const withLabel = {
      ...layout,
      netLabels: { n1: { x: 0, y: 0, net: "gate_node" } },
      wires: [
        ...layout.wires,
        { id: "wl", from: { kind: "pin" as const, part: "J1", pin: "g" }, to: { kind: "label" as const, id: "n1" } },
      ],
    };
    const result = syncNets(circuit, withLabel).circuit;
    expect(result.parts.find((p) => p.id === "J1")?.pins.g).toBe("gate_node");
    expect(result.parts.find((p) => p.id === "RG")?.pins.a).toBe("gate_node");
  });

  it("removing a wire splits a net and names the new piece after its first pin; the output follows", () => {
    const layout = autoLayout(circuit);
    // the cable's far end: the output net "far" joins W1.b and DESK.p
    const wire = layout.wires.find(
      (w) => w.from.kind === "pin" && w.to.kind === "pin" && [w.from.part, w.to.part].sort().join() === "DESK,W1",
    );
    expect(wire).toBeDefined();
    const cut = syncNets(circuit, { ...layout, wires: layout.wires.filter((w) => w !== wire) }).circuit;
    const nets = [cut.parts.find((p) => p.id === "W1")?.pins.b, cut.parts.find((p) => p.id === "DESK")?.pins.p];
    expect(new Set(nets).size).toBe(2);
    expect(nets).toContain("far");
    expect(cut.output.plus).toBe("far");
  });

  it("a part with no wires has each pin on a net of its own", () => {
    const groups = handleGroups(normaliseCircuit({ ...load("bench-rc-divider.json") }), {
      version: 1,
      parts: {},
      grounds: {},
      netLabels: {},
      wires: [],
      notes: [],
    });
    expect(groups.every((g) => g.pins.length === 1)).toBe(true);
  });
});

describe("opening stored layouts", () => {
  it("keeps placements and redraws wires when the stored wires no longer match the circuit", () => {
    const original = load("electret-jfet.json");
    const first = openDocument(original);
    const moved = { ...first.layout, parts: { ...first.layout.parts }, wires: [] };
    const someId = first.circuit.parts[0].id;
    moved.parts[someId] = { x: 1000, y: 1000, rotation: 90 };
    const reopened = openDocument(original, moved);
    expect(reopened.layout.parts[someId]).toEqual({ x: 1000, y: 1000, rotation: 90 });
    expect(canonicalPartition(reopened.circuit)).toEqual(canonicalPartition(normaliseCircuit(original)));
    expect(reopened.layout.wires.length).toBeGreaterThan(0);
  });

  it("ignores a malformed layout and draws one", () => {
    const document = openDocument(load("electret-jfet.json"), { parts: "nonsense" });
    expect(Object.keys(document.layout.parts).length).toBe(document.circuit.parts.length);
  });
});
