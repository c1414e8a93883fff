import { describe, expect, it } from "vitest";
import { drawingBounds } from "./drawing-bounds";

describe("the whole drawing's box", () => {
  it("is null for an empty drawing", () => {
    expect(drawingBounds([], new Map())).toBeNull();
  });

  it("holds the items and a wire that loops outside them", () => {
    const items = [
      { x: 0, y: 0, width: 120, height: 40 },
      { x: 200, y: 100, width: 80, height: 100 },
    ];
    const loop = {
      points: [
        { x: 0, y: 20 },
        { x: -60, y: 20 },
        { x: -60, y: 260 },
        { x: 240, y: 260 },
      ],
      routed: true,
    };
    expect(drawingBounds(items, new Map([["w1", loop]]))).toEqual({ x: -60, y: 0, width: 340, height: 260 });
  });
});
