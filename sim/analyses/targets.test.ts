/**
 * checkTargets against the contract's "Targets" section (docs: /work/shared/spec/circuit-format.md): a figure within
 * [min, max] passes, either bound may be absent, a null figure fails, a variant's target reads that variant's figures.
 * The figures here are made up by hand; the rule under test is the contract's, not a computed result.
 */
import { describe, expect, it } from "vitest";
import { allPass, BASE_VARIANT, checkTarget, checkTargets, variantsNeeded } from "./targets";

describe("checkTargets (contract: Targets)", () => {
  const results = {
    [BASE_VARIANT]: {
      self_noise_dba_spl: 11.2,
      low_corner_hz: 24.5,
      sensitivity_db_re_1v_per_pa: null,
      polarity: "inverting" as const,
    },
    pad: { sensitivity_db_re_1v_per_pa: -38.1, low_corner_hz: 18 },
  };

  it("checks the contract's example targets in file order, with value, limits and variant echoed", () => {
    const checks = checkTargets(
      {
        targets: [
          { figure: "self_noise_dba_spl", max: 12 },
          { figure: "sensitivity_db_re_1v_per_pa", min: -36, variant: "pad" },
          { figure: "low_corner_hz", max: 20 },
        ],
      },
      results,
    );
    expect(checks).toEqual([
      { figure: "self_noise_dba_spl", value: 11.2, max: 12, pass: true },
      { figure: "sensitivity_db_re_1v_per_pa", variant: "pad", value: -38.1, min: -36, pass: false },
      { figure: "low_corner_hz", value: 24.5, max: 20, pass: false },
    ]);
    expect(allPass(checks)).toBe(false);
  });

  it("treats both limits as inclusive", () => {
    expect(checkTarget({ figure: "low_corner_hz", min: 24.5, max: 24.5 }, results[BASE_VARIANT]).pass).toBe(true);
    expect(checkTarget({ figure: "low_corner_hz", min: 24.6 }, results[BASE_VARIANT]).pass).toBe(false);
  });

  it("fails a null, missing or non-numeric figure, even with no limits", () => {
    expect(checkTarget({ figure: "sensitivity_db_re_1v_per_pa", min: -50 }, results[BASE_VARIANT])).toEqual({
      figure: "sensitivity_db_re_1v_per_pa",
      value: null,
      min: -50,
      pass: false,
    });
    expect(checkTarget({ figure: "max_spl_db", min: 120 }, results[BASE_VARIANT]).pass).toBe(false);
    expect(checkTarget({ figure: "polarity" }, results[BASE_VARIANT]).pass).toBe(false);
    expect(checkTarget({ figure: "low_corner_hz", max: 100, variant: "absent" }, undefined).pass).toBe(false);
  });

  it("passes with no targets and lists the variants a set of targets needs, base first", () => {
    expect(checkTargets({}, results)).toEqual([]);
    expect(allPass([])).toBe(true);
    expect(
      variantsNeeded([
        { figure: "a", variant: "pad" },
        { figure: "b" },
        { figure: "c", variant: "hot" },
        { figure: "d", variant: "pad" },
      ]),
    ).toEqual([BASE_VARIANT, "hot", "pad"]);
  });
});
