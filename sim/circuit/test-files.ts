/** Small circuit files for the tests of sim/circuit and sim/run (invented values). */

export type TestPart = {
  id: string;
  kind: string;
  pins: Record<string, string>;
  values?: Record<string, number | string>;
  [extra: string]: unknown;
};

/** A polarised capsule into an n-JFET source follower: the contract's bench example, grown a follower. */
export function followerFile(overrides: Record<string, unknown> = {}): Record<string, unknown> {
  return {
    format: "backplate/circuit",
    version: 1,
    title: "test follower",
    parameters: { VPOL: "60", RB: "1G" },
    parts: [
      { id: "V1", kind: "vsource", pins: { p: "pol", n: "0" }, values: { dc: "VPOL" } },
      {
        id: "R1",
        kind: "resistor",
        pins: { a: "pol", b: "dia" },
        values: { resistance: "RB" },
        tolerance: { resistance: "10%" },
      },
      {
        id: "MIC",
        kind: "capsule",
        pins: { diaphragm: "dia", backplate: "0" },
        values: { capacitance: "50p", strain_per_pa: "2e-4" },
      },
      { id: "C1", kind: "capacitor", pins: { a: "dia", b: "g" }, values: { capacitance: "1n" } },
      { id: "RG", kind: "resistor", pins: { a: "g", b: "0" }, values: { resistance: "RB" } },
      { id: "J1", kind: "jfet", pins: { d: "vdd", g: "g", s: "s" }, values: { idss: "4m", pinch_off: "-2" } },
      { id: "RS", kind: "resistor", pins: { a: "s", b: "0" }, values: { resistance: "1k" } },
      { id: "V2", kind: "vsource", pins: { p: "vdd", n: "0" }, values: { dc: 12 } },
    ],
    output: { plus: "s", minus: "0" },
    variants: [{ name: "hotter bias", parameters: { VPOL: "80" }, disable: [], enable: [] }],
    analyses: { op: {}, ac: { from: 1, to: 100000, points_per_decade: 20 } },
    ...overrides,
  };
}

/** The follower file with its parts changed by `edit`. */
export function withParts(edit: (parts: TestPart[]) => TestPart[], overrides: Record<string, unknown> = {}) {
  const file = followerFile(overrides);
  return { ...file, parts: edit(structuredClone(file.parts as TestPart[])) };
}
