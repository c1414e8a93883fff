import { describe, expect, it } from "vitest";
import { KIND_SPECS } from "@/sim/circuit/kinds";
import { PART_KINDS } from "@/sim/circuit/types";
import { GRID } from "../document/layout";
import { pinOffset, rotatedPinOffset, rotatedSide, rotatedSize, SYMBOL_BOXES } from "./pin-layout";

describe("pin layout", () => {
  it("places every pin of every kind, on the grid, with no two pins at one point", () => {
    for (const kind of PART_KINDS) {
      const pins = KIND_SPECS[kind].pins;
      expect(Object.keys(SYMBOL_BOXES[kind].pins).sort()).toEqual([...pins].sort());
      const points = pins.map((pin) => pinOffset(kind, pin));
      expect(new Set(points.map((p) => `${p.x},${p.y}`)).size).toBe(pins.length);
      for (const p of points) {
        expect(p.x % GRID).toBe(0);
        expect(p.y % GRID).toBe(0);
      }
    }
  });

  it("rotating four quarter turns returns every pin home, and each turn keeps pins on the box edge", () => {
    for (const kind of PART_KINDS) {
      for (const pin of KIND_SPECS[kind].pins) {
        for (const r of [90, 180, 270]) {
          const { x, y } = rotatedPinOffset(kind, pin, r);
          const size = rotatedSize(kind, r);
          const onEdge = x === 0 || y === 0 || x === size.width || y === size.height;
          expect(onEdge).toBe(true);
        }
        expect(rotatedPinOffset(kind, pin, 360)).toEqual(pinOffset(kind, pin));
      }
    }
  });

  it("a resistor turned a quarter turn clockwise has pin a on top", () => {
    expect(rotatedPinOffset("resistor", "a", 90)).toEqual({ x: 20, y: 0 });
    expect(rotatedSide("left", 90)).toBe("top");
    expect(rotatedSide("top", 270)).toBe("left");
  });
});
