/**
 * Where each kind's pins sit on its symbol, before rotation: the side of the box and the position along that side
 * (0…1). Shared by the canvas (React Flow handles) and the automatic layout, so wires drawn by either meet the pins.
 * Sizes are canvas units and multiples of the grid, so pins land on grid points.
 */
import type { PartKind } from "@/sim/circuit/types";

export type Side = "left" | "right" | "top" | "bottom";

export interface PinPlace {
  side: Side;
  /** 0…1 along the side, from top (left/right sides) or from the left (top/bottom sides) */
  at: number;
}

export interface SymbolBox {
  width: number;
  height: number;
  pins: Record<string, PinPlace>;
}

const twoTerminal = (a: string, b: string): SymbolBox => ({
  width: 120,
  height: 40,
  pins: { [a]: { side: "left", at: 0.5 }, [b]: { side: "right", at: 0.5 } },
});

const upright = (p: string, n: string): SymbolBox => ({
  width: 80,
  height: 100,
  pins: { [p]: { side: "top", at: 0.5 }, [n]: { side: "bottom", at: 0.5 } },
});

export const SYMBOL_BOXES: Record<PartKind, SymbolBox> = {
  resistor: twoTerminal("a", "b"),
  capacitor: twoTerminal("a", "b"),
  inductor: twoTerminal("a", "b"),
  load: upright("p", "n"),
  capsule: upright("diaphragm", "backplate"),
  vsource: upright("p", "n"),
  isource: upright("p", "n"),
  vcvs: {
    width: 120,
    height: 100,
    pins: {
      cp: { side: "left", at: 0.2 },
      cn: { side: "left", at: 0.8 },
      p: { side: "right", at: 0.2 },
      n: { side: "right", at: 0.8 },
    },
  },
  vccs: {
    width: 120,
    height: 100,
    pins: {
      cp: { side: "left", at: 0.2 },
      cn: { side: "left", at: 0.8 },
      p: { side: "right", at: 0.2 },
      n: { side: "right", at: 0.8 },
    },
  },
  jfet: {
    width: 100,
    height: 100,
    pins: { g: { side: "left", at: 0.6 }, d: { side: "top", at: 0.6 }, s: { side: "bottom", at: 0.6 } },
  },
  bjt: {
    width: 100,
    height: 100,
    pins: { b: { side: "left", at: 0.6 }, c: { side: "top", at: 0.6 }, e: { side: "bottom", at: 0.6 } },
  },
  triode: {
    width: 100,
    height: 120,
    pins: { g: { side: "left", at: 0.5 }, a: { side: "top", at: 0.4 }, k: { side: "bottom", at: 0.6 } },
  },
  transformer: {
    width: 120,
    height: 100,
    pins: {
      p1: { side: "left", at: 0.2 },
      p2: { side: "left", at: 0.8 },
      s1: { side: "right", at: 0.2 },
      s2: { side: "right", at: 0.8 },
    },
  },
  cable: {
    width: 160,
    height: 40,
    pins: { a: { side: "left", at: 0.5 }, b: { side: "right", at: 0.5 }, ref: { side: "bottom", at: 0.5 } },
  },
};

/** A pin's offset from the box's top-left corner, rotation 0. */
export function pinOffset(kind: PartKind, pin: string): { x: number; y: number } {
  const box = SYMBOL_BOXES[kind];
  const place = box.pins[pin] ?? { side: "left", at: 0.5 };
  switch (place.side) {
    case "left":
      return { x: 0, y: box.height * place.at };
    case "right":
      return { x: box.width, y: box.height * place.at };
    case "top":
      return { x: box.width * place.at, y: 0 };
    case "bottom":
      return { x: box.width * place.at, y: box.height };
  }
}

const SIDES_CLOCKWISE: Side[] = ["top", "right", "bottom", "left"];

/** The side a pin faces after rotating the symbol clockwise by `rotation` degrees. */
export function rotatedSide(side: Side, rotation: number): Side {
  const steps = Math.round((((rotation % 360) + 360) % 360) / 90);
  return SIDES_CLOCKWISE[(SIDES_CLOCKWISE.indexOf(side) + steps) % 4];
}

/** The box's size after rotation. */
export function rotatedSize(kind: PartKind, rotation: number): { width: number; height: number } {
  const box = SYMBOL_BOXES[kind];
  return rotation % 180 === 0 ? { width: box.width, height: box.height } : { width: box.height, height: box.width };
}

/** A pin's offset from the rotated box's top-left corner (the symbol turns clockwise about its centre). */
export function rotatedPinOffset(kind: PartKind, pin: string, rotation: number): { x: number; y: number } {
  const box = SYMBOL_BOXES[kind];
  const { x, y } = pinOffset(kind, pin);
  switch ((((rotation % 360) + 360) % 360) as 0 | 90 | 180 | 270) {
    case 90:
      return { x: box.height - y, y: x };
    case 180:
      return { x: box.width - x, y: box.height - y };
    case 270:
      return { x: y, y: box.width - x };
    default:
      return { x, y };
  }
}
