/**
 * The contract's table of part kinds: each kind's pins, and each value's quantity, default and range. Defaults are
 * SI numbers; `Infinity` where the contract says "infinite". A value with neither `required` nor a default (a
 * capsule's `resonance`, a JFET's `en`, a triode's `req`) is left out of the elaborated part when not given.
 */
import type { PartKind } from "./types";
import type { QuantityName } from "./quantities";

export interface NumericRange {
  /** lower bound; `minExclusive` makes it strict */
  min?: number;
  minExclusive?: boolean;
  max?: number;
  /** ±Infinity is accepted (only where the contract allows "infinite") */
  allowInfinite?: boolean;
  integer?: boolean;
}

export interface NumericValueSpec {
  type: "number";
  quantity: QuantityName;
  required?: boolean;
  default?: number;
  range: NumericRange;
}

export interface ChoiceValueSpec {
  type: "choice";
  choices: readonly string[];
  default: string;
}

export type ValueSpec = NumericValueSpec | ChoiceValueSpec;

export interface KindSpec {
  kind: PartKind;
  /** for messages: "a resistor" */
  described: string;
  pins: readonly string[];
  values: Readonly<Record<string, ValueSpec>>;
  /** `role` ("input" | "supply") is allowed */
  takesRole?: boolean;
  /** at least one of these values must be given (a load: resistance or capacitance) */
  atLeastOneOf?: readonly string[];
}

/** More pi-sections than this add unknowns without changing an audio-band answer. */
export const MAX_CABLE_SEGMENTS = 1000;

const POSITIVE: NumericRange = { min: 0, minExclusive: true };
const NON_NEGATIVE: NumericRange = { min: 0 };
const ANY_FINITE: NumericRange = {};

function num(quantity: QuantityName, range: NumericRange, dflt?: number): NumericValueSpec {
  return dflt === undefined ? { type: "number", quantity, range } : { type: "number", quantity, range, default: dflt };
}
function required(quantity: QuantityName, range: NumericRange): NumericValueSpec {
  return { type: "number", quantity, range, required: true };
}

const sourceValues = (quantity: QuantityName) => ({
  dc: num(quantity, ANY_FINITE, 0),
  ac: num(quantity, ANY_FINITE, 0),
  ac_phase: num("angle", ANY_FINITE, 0),
});

export const KIND_SPECS: Readonly<Record<PartKind, KindSpec>> = {
  resistor: {
    kind: "resistor",
    described: "a resistor",
    pins: ["a", "b"],
    values: { resistance: required("resistance", POSITIVE) },
  },
  capacitor: {
    kind: "capacitor",
    described: "a capacitor",
    pins: ["a", "b"],
    values: { capacitance: required("capacitance", POSITIVE) },
  },
  inductor: {
    kind: "inductor",
    described: "an inductor",
    pins: ["a", "b"],
    values: { inductance: required("inductance", POSITIVE), series_resistance: num("resistance", NON_NEGATIVE, 0) },
  },
  vsource: {
    kind: "vsource",
    described: "a voltage source",
    pins: ["p", "n"],
    values: sourceValues("voltage"),
    takesRole: true,
  },
  isource: {
    kind: "isource",
    described: "a current source",
    pins: ["p", "n"],
    values: sourceValues("current"),
    takesRole: true,
  },
  vcvs: {
    kind: "vcvs",
    described: "a voltage-controlled voltage source",
    pins: ["p", "n", "cp", "cn"],
    values: { gain: required("gain", ANY_FINITE) },
  },
  vccs: {
    kind: "vccs",
    described: "a voltage-controlled current source",
    pins: ["p", "n", "cp", "cn"],
    values: { transconductance: required("conductance", ANY_FINITE) },
  },
  capsule: {
    kind: "capsule",
    described: "a capsule",
    pins: ["diaphragm", "backplate"],
    values: {
      capacitance: required("capacitance", POSITIVE),
      strain_per_pa: required("per_pressure", POSITIVE),
      electret_voltage: num("voltage", ANY_FINITE, 0),
      resonance: num("frequency", POSITIVE),
      q: num("dimensionless", POSITIVE, 0.7),
    },
  },
  jfet: {
    kind: "jfet",
    described: "a JFET",
    pins: ["d", "g", "s"],
    values: {
      type: { type: "choice", choices: ["n", "p"], default: "n" },
      idss: required("current", POSITIVE),
      // the sign must match the type; checked in elaborate.ts
      pinch_off: required("voltage", ANY_FINITE),
      lambda: num("per_voltage", NON_NEGATIVE, 0),
      cgs: num("capacitance", NON_NEGATIVE, 0),
      cgd: num("capacitance", NON_NEGATIVE, 0),
      en: num("voltage_noise_density", NON_NEGATIVE),
      fc: num("frequency", NON_NEGATIVE, 0),
      igss: num("current", NON_NEGATIVE, 0),
    },
  },
  triode: {
    kind: "triode",
    described: "a triode",
    pins: ["a", "g", "k"],
    values: {
      mu: required("dimensionless", POSITIVE),
      k: required("perveance", POSITIVE),
      cgk: num("capacitance", NON_NEGATIVE, 0),
      cga: num("capacitance", NON_NEGATIVE, 0),
      cak: num("capacitance", NON_NEGATIVE, 0),
      req: num("resistance", POSITIVE),
    },
  },
  bjt: {
    kind: "bjt",
    described: "a bipolar transistor",
    pins: ["c", "b", "e"],
    values: {
      type: { type: "choice", choices: ["npn", "pnp"], default: "npn" },
      is: num("current", POSITIVE, 1e-14),
      beta: num("dimensionless", POSITIVE, 100),
      beta_r: num("dimensionless", POSITIVE, 1),
      vaf: num("voltage", { ...POSITIVE, allowInfinite: true }, Infinity),
      rbb: num("resistance", NON_NEGATIVE, 0),
      cpi: num("capacitance", NON_NEGATIVE, 0),
      cmu: num("capacitance", NON_NEGATIVE, 0),
    },
  },
  transformer: {
    kind: "transformer",
    described: "a transformer",
    pins: ["p1", "p2", "s1", "s2"],
    values: {
      ratio: required("dimensionless", POSITIVE),
      primary_inductance: required("inductance", POSITIVE),
      leakage_inductance: num("inductance", NON_NEGATIVE, 0),
      primary_resistance: num("resistance", NON_NEGATIVE, 0),
      secondary_resistance: num("resistance", NON_NEGATIVE, 0),
      secondary_capacitance: num("capacitance", NON_NEGATIVE, 0),
    },
  },
  cable: {
    kind: "cable",
    described: "a cable",
    pins: ["a", "b", "ref"],
    values: {
      length: required("length", POSITIVE),
      capacitance_per_m: num("capacitance_per_length", NON_NEGATIVE, 100e-12),
      resistance_per_m: num("resistance_per_length", NON_NEGATIVE, 0.05),
      segments: num("count", { min: 1, max: MAX_CABLE_SEGMENTS, integer: true }, 10),
    },
  },
  load: {
    kind: "load",
    described: "a load",
    pins: ["p", "n"],
    values: {
      resistance: num("resistance", { ...POSITIVE, allowInfinite: true }, Infinity),
      capacitance: num("capacitance", NON_NEGATIVE, 0),
    },
    atLeastOneOf: ["resistance", "capacitance"],
  },
};

export function isPartKind(kind: string): kind is PartKind {
  return Object.hasOwn(KIND_SPECS, kind);
}
