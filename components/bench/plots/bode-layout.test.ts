import { describe, expect, it } from "vitest";
import { anchorRange } from "../anchor-range";
import { BODE_LAYOUT, bodeLayoutFor } from "./traces";

const params = (query: string) => new URLSearchParams(query);

describe("a remark's frequency band on the magnitude plot", () => {
  it("reads the band from the bench's address and refuses a band that is not one", () => {
    expect(anchorRange(params("from=40&to=120"))).toEqual({ fromHz: 40, toHz: 120 });
    expect(anchorRange(params("from=120&to=40"))).toBeNull();
    expect(anchorRange(params("from=0&to=40"))).toBeNull();
    expect(anchorRange(params("from=abc&to=40"))).toBeNull();
    expect(anchorRange(params("part=J1"))).toBeNull();
  });

  it("zooms the log frequency axis in log10 units, as Plotly's layout.xaxis.range asks for a log axis", () => {
    // Plotly reference (layout.xaxis.range): "If the axis type is 'log', then you must take the log of your desired range."
    const layout = bodeLayoutFor({ fromHz: 40, toHz: 120 });
    const [lo, hi] = layout.xaxis.range ?? [];
    expect(10 ** lo).toBeCloseTo(40, 9);
    expect(10 ** hi).toBeCloseTo(120, 9);
    expect(hi - lo).toBeCloseTo(Math.log10(3), 12); // 120/40 = 3, a decade is 1
    expect(layout.xaxis.type).toBe("log");
    expect(layout.uirevision).not.toBe(BODE_LAYOUT.uirevision);
  });

  it("leaves the whole range when there is no band", () => {
    expect(bodeLayoutFor(null)).toBe(BODE_LAYOUT);
    expect(bodeLayoutFor(null).xaxis.range).toBeUndefined();
  });
});
