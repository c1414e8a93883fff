import { describe, expect, it } from "vitest";
import demo from "@/sim/examples/demo-microphone.json";
import { autoLayout } from "../document/auto-layout";
import { normaliseCircuit } from "../document/circuit";
import type { BenchDocument } from "../document/document";
import { moveItem, setValue } from "../store/edits";
import { EMPTY_SELECTION } from "../store/selection";
import { routeWires } from "../wiring/orthogonal-router";
import { toFlowNodes } from "./flow-model";
import { sceneKey, wireScene } from "./wire-scene";

function demoDocument(): BenchDocument {
  const circuit = normaliseCircuit(structuredClone(demo));
  return { circuit, layout: autoLayout(circuit) };
}

const sceneOf = (document: BenchDocument) =>
  wireScene(document, toFlowNodes(document, EMPTY_SELECTION, null, document.circuit.parameters));

describe("the wire scene of a bench document", () => {
  it("keeps its key through a value edit and a selection, and changes it when a part moves", () => {
    const document = demoDocument();
    const key = sceneKey(sceneOf(document));
    // a value whose text stays about as long ("1 GΩ" → "2.2 GΩ"): nothing a route depends on has changed
    const edited = setValue(document, "RG", "resistance", "2G2");
    expect(edited).not.toBe(document);
    expect(sceneKey(sceneOf(edited))).toBe(key);
    const selected = wireScene(
      document,
      toFlowNodes(document, { ...EMPTY_SELECTION, parts: ["RG"] }, null, document.circuit.parameters),
    );
    expect(sceneKey(selected)).toBe(key);
    const placement = document.layout.parts.RG;
    const moved = moveItem(document, { kind: "part", id: "RG" }, { x: placement.x + 40, y: placement.y });
    expect(sceneKey(sceneOf(moved))).not.toBe(key);
  });

  it("puts each wire's ends on the pins the canvas draws, facing the way the pins face", () => {
    const document = demoDocument();
    const scene = sceneOf(document);
    expect(scene.wires).toHaveLength(document.layout.wires.length);
    const byId = new Map(document.layout.wires.map((w) => [w.id, w]));
    for (const wire of scene.wires) {
      const drawn = byId.get(wire.id);
      if (drawn?.to.kind === "ground") {
        // the ground symbol's pin is the top centre of its 40 × 40 box (ground-node.tsx) and faces up
        const g = document.layout.grounds[drawn.to.id];
        expect(wire.to).toEqual({ point: { x: g.x + 20, y: g.y }, side: "top", owner: `g:${drawn.to.id}` });
      }
    }
    // a resistor's pin "a" is the left middle of its 120 × 40 box (pin-layout.ts) at rotation 0
    const rg = document.layout.parts.RG;
    const end = scene.wires.flatMap((w) => [w.from, w.to]).find((e) => e.owner === "p:RG" && e.side === "left");
    expect(end?.point).toEqual({ x: rg.x, y: rg.y + 20 });
  });

  it("routes every wire of the demo circuit clear of every other item", () => {
    const scene = sceneOf(demoDocument());
    const routes = routeWires(scene.obstacles, scene.wires, undefined, scene.freePins);
    for (const wire of scene.wires) {
      const route = routes.get(wire.id);
      expect(route?.routed, wire.id).toBe(true);
      const points = route?.points ?? [];
      for (const o of scene.obstacles) {
        if (o.id === wire.from.owner || o.id === wire.to.owner) continue;
        for (let i = 1; i < points.length; i++) {
          const [a, b] = [points[i - 1], points[i]];
          // axis-parallel segment against a box: plain interval overlap of the open box
          const hits =
            Math.max(a.x, b.x) > o.x &&
            Math.min(a.x, b.x) < o.x + o.width &&
            Math.max(a.y, b.y) > o.y &&
            Math.min(a.y, b.y) < o.y + o.height;
          expect(hits, `${wire.id} through ${o.id}`).toBe(false);
        }
      }
    }
  });

  it("lists the pins no wire reaches, and only those, as free", () => {
    const document = demoDocument();
    // the demo is wired throughout: no free pin
    expect(sceneOf(document).freePins).toEqual([]);
    // a resistor dropped beside it, unwired: its two pins, the left and right middle of its 120 × 40 box
    const circuit = {
      ...document.circuit,
      parts: [...document.circuit.parts, { ...document.circuit.parts.find((p) => p.id === "RG")!, id: "RX" }],
    };
    const layout = { ...document.layout, parts: { ...document.layout.parts, RX: { x: 2000, y: 2000, rotation: 0 as const } } };
    const free = sceneOf({ circuit, layout }).freePins;
    expect(free).toEqual([
      { x: 2000, y: 2020 },
      { x: 2120, y: 2020 },
    ]);
  });
});
