import { describe, expect, it } from "vitest";
import { formatFigure } from "./checks-panel";

// SI prefixes (BIPM SI Brochure, 9th ed., table 7) for the linear figures; levels in dB as plain numbers.
describe("a figure as the review page prints it", () => {
  it("gives frequencies, impedances and linear sensitivity an SI prefix, four significant figures", () => {
    expect(formatFigure(14430, "high_corner_hz")).toBe("14.43 kHz");
    expect(formatFigure(8.256, "low_corner_hz")).toBe("8.256 Hz");
    expect(formatFigure(0.01188, "sensitivity_v_per_pa")).toBe("11.88 mV/Pa");
    expect(formatFigure(302.94, "output_impedance_1khz_ohm")).toBe("302.9 Ω");
  });
  it("prints levels in dB as they are, with a true minus sign", () => {
    expect(formatFigure(-38.5, "sensitivity_db_re_1v_per_pa")).toBe("−38.5 dB re 1 V/Pa");
    expect(formatFigure(9.034, "self_noise_dba_spl")).toBe("9.034 dB(A) SPL");
  });
  it("shows a dash for a figure the engine did not give", () => {
    expect(formatFigure(null, "high_corner_hz")).toBe("—");
  });
});
