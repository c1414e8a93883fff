/** The bench store: edits, undo/redo, read-only, copy/paste, renames. */
import { describe, expect, it } from "vitest";
import { runCircuit } from "@/sim/run";
import { openDocument } from "../document/document";
import { emptyLayout } from "../document/layout";
import { canonicalPartition } from "../document/nets";
import { createBenchStore } from "./bench-store";

const empty = () =>
  openDocument(
    { format: "backplate/circuit", version: 1, parts: [], output: { plus: "0", minus: "0" } },
    emptyLayout(),
  );

const pin = (part: string, p: string) => ({ kind: "pin" as const, part, pin: p });

/** A divider drawn part by part: V1 → R1 → out → R2 → ground. */
function drawDivider() {
  const store = createBenchStore(empty());
  const s = store.getState();
  const v = s.addPart("vsource", { x: 0, y: 0 }) as string;
  const r1 = store.getState().addPart("resistor", { x: 200, y: 0 }) as string;
  const r2 = store.getState().addPart("resistor", { x: 400, y: 0 }) as string;
  const g = store.getState().addGround({ x: 0, y: 200 }) as string;
  const st = store.getState();
  st.connect(pin(v, "p"), pin(r1, "a"));
  st.connect(pin(r1, "b"), pin(r2, "a"));
  st.connect(pin(v, "n"), { kind: "ground", id: g });
  st.connect(pin(r2, "b"), { kind: "ground", id: g });
  return { store, v, r1, r2, g };
}

describe("bench store", () => {
  it("gives new parts the next free designators and defaults", () => {
    const { store, v, r1, r2 } = drawDivider();
    expect([v, r1, r2]).toEqual(["V1", "R1", "R2"]);
    expect(store.getState().document.circuit.parts.find((p) => p.id === "R1")?.values.resistance).toBe("10k");
  });

  it("wires make nets the engine solves: a 12 V supply over two equal resistors gives 6 V (Ohm's law)", () => {
    const { store, r1 } = drawDivider();
    const st = store.getState();
    const mid = st.document.circuit.parts.find((p) => p.id === r1)?.pins.b as string;
    st.setOutput(mid, "0");
    const out = runCircuit(store.getState().document.circuit);
    expect(out.op?.nets[mid]).toBeCloseTo(6, 9);
  });

  it("undo and redo walk the history; the dirty flag follows edits", () => {
    const { store } = drawDivider();
    expect(store.getState().dirty).toBe(true);
    const before = store.getState().document;
    store.getState().setValue("R1", "resistance", "4k7");
    expect(store.getState().document.circuit.parts[1].values.resistance).toBe("4k7");
    store.getState().undo();
    expect(store.getState().document).toBe(before);
    store.getState().redo();
    expect(store.getState().document.circuit.parts[1].values.resistance).toBe("4k7");
  });

  it("bounds the undo stack", () => {
    const store = createBenchStore(empty(), { limit: 5 });
    for (let i = 0; i < 12; i++) store.getState().addPart("resistor", { x: i * 200, y: 0 });
    expect(store.getState().history.past.length).toBe(5);
    for (let i = 0; i < 10; i++) store.getState().undo();
    expect(store.getState().document.circuit.parts.length).toBe(7);
  });

  it("deleting a part removes its wires and splits its nets", () => {
    const { store } = drawDivider();
    store.getState().select({ parts: ["R1"] });
    store.getState().deleteSelection();
    const doc = store.getState().document;
    expect(doc.circuit.parts.map((p) => p.id)).toEqual(["V1", "R2"]);
    expect(doc.layout.wires.some((w) => w.from.kind === "pin" && w.from.part === "R1")).toBe(false);
    const v1 = doc.circuit.parts[0].pins;
    const r2 = doc.circuit.parts[1].pins;
    expect(v1.p).not.toBe(r2.a);
  });

  it("a moved part snaps to the grid; a drag is one undo step", () => {
    const { store } = drawDivider();
    store.getState().checkpoint();
    store.getState().movePart({ kind: "part", id: "R1" }, { x: 213, y: 9 }, { record: false });
    store.getState().movePart({ kind: "part", id: "R1" }, { x: 251, y: 47 }, { record: false });
    expect(store.getState().document.layout.parts.R1).toMatchObject({ x: 260, y: 40 });
    store.getState().undo();
    expect(store.getState().document.layout.parts.R1).toMatchObject({ x: 200, y: 0 });
  });

  it("rotates the selection a quarter turn", () => {
    const { store } = drawDivider();
    store.getState().select({ parts: ["R1"] });
    store.getState().rotatePart();
    store.getState().rotatePart();
    expect(store.getState().document.layout.parts.R1.rotation).toBe(180);
  });

  it("refuses an id in use and renames a part everywhere else", () => {
    const { store } = drawDivider();
    expect(store.getState().renamePart("R1", "R2")).toMatchObject({ ok: false });
    expect(store.getState().renamePart("R1", "RTOP")).toMatchObject({ ok: true });
    const doc = store.getState().document;
    expect(doc.layout.parts.RTOP).toBeDefined();
    expect(doc.layout.wires.some((w) => w.to.kind === "pin" && w.to.part === "RTOP")).toBe(true);
  });

  it("names a net, refuses a name in use and never renames ground", () => {
    const { store } = drawDivider();
    const mid = store.getState().document.circuit.parts[1].pins.b;
    expect(store.getState().setNetName(mid, "tap")).toMatchObject({ ok: true });
    expect(store.getState().document.circuit.parts[2].pins.a).toBe("tap");
    const top = store.getState().document.circuit.parts[0].pins.p;
    expect(store.getState().setNetName(top, "tap")).toMatchObject({ ok: false });
    expect(store.getState().setNetName("0", "gnd")).toMatchObject({ ok: false });
    // a later wire edit keeps the name
    store.getState().disconnect([store.getState().document.layout.wires[0].id]);
    expect(store.getState().document.circuit.parts[2].pins.a).toBe("tap");
  });

  it("copy and paste duplicate parts with new designators and the wires between them", () => {
    const { store } = drawDivider();
    store.getState().select({ parts: ["R1", "R2"] });
    store.getState().copy();
    store.getState().paste();
    const doc = store.getState().document;
    expect(doc.circuit.parts.map((p) => p.id)).toEqual(["V1", "R1", "R2", "R3", "R4"]);
    const r3 = doc.circuit.parts[3].pins;
    const r4 = doc.circuit.parts[4].pins;
    expect(r3.b).toBe(r4.a);
    expect(r4.b).toBe("0");
    expect(r3.b).not.toBe(doc.circuit.parts[1].pins.b);
    expect(store.getState().selection.parts).toEqual(["R3", "R4"]);
  });

  it("does nothing in read-only mode", () => {
    const doc = openDocument({
      format: "backplate/circuit",
      version: 1,
      parts: [{ id: "R1", kind: "resistor", pins: { a: "x", b: "0" }, values: { resistance: "1k" } }],
      output: { plus: "x", minus: "0" },
    });
    const store = createBenchStore(doc, { readOnly: true });
    expect(store.getState().addPart("resistor", { x: 0, y: 0 })).toBeNull();
    store.getState().setValue("R1", "resistance", "2k");
    store.getState().select({ parts: ["R1"] });
    store.getState().deleteSelection();
    expect(store.getState().document).toBe(doc);
    expect(store.getState().renamePart("R1", "R9")).toMatchObject({ ok: false });
  });

  it("loading a document resets history and keeps the partition of its circuit", () => {
    const { store } = drawDivider();
    const other = openDocument({
      format: "backplate/circuit",
      version: 1,
      parts: [{ id: "R1", kind: "resistor", pins: { a: "x", b: "0" }, values: { resistance: "1k" } }],
      output: { plus: "x", minus: "0" },
    });
    store.getState().loadDocument(other);
    expect(store.getState().history.past).toEqual([]);
    expect(store.getState().dirty).toBe(false);
    expect(canonicalPartition(store.getState().document.circuit)).toEqual({ ground: ["R1.b"], others: [["R1.a"]] });
  });
});

describe("replacing the document", () => {
  it("is one undoable step", () => {
    const { store } = drawDivider();
    const before = store.getState().document;
    store.getState().replaceDocument(empty());
    expect(store.getState().document.circuit.parts).toEqual([]);
    store.getState().undo();
    expect(store.getState().document).toBe(before);
  });
});

describe("no-op edits", () => {
  it("setting a value to what it already is records no undo step (a blur after Enter)", () => {
    const { store } = drawDivider();
    store.getState().setValue("R1", "resistance", "4k7");
    const steps = store.getState().history.past.length;
    store.getState().setValue("R1", "resistance", "4k7");
    expect(store.getState().history.past.length).toBe(steps);
  });
});
