/**
 * The physical quantity of each value field: which unit words and symbols a value may carry, the mathjs unit an
 * expression's result is converted to (SI), and an example for messages. A unit may always be omitted: a plain
 * number is taken in the SI unit of the field.
 */

export type QuantityName =
  | "resistance"
  | "capacitance"
  | "inductance"
  | "voltage"
  | "current"
  | "frequency"
  | "temperature"
  | "length"
  | "conductance"
  | "pressure"
  | "per_pressure"
  | "per_voltage"
  | "perveance"
  | "voltage_noise_density"
  | "capacitance_per_length"
  | "resistance_per_length"
  | "angle"
  | "gain"
  | "dimensionless"
  | "count"
  | "any";

export interface Quantity {
  name: QuantityName;
  /** how a person calls it in a message: "a resistance" */
  described: string;
  /** the SI unit, spelled for people: "Ω" */
  symbol: string;
  /** unit words and symbols accepted after a number (a prefix may precede them unless `prefixable` is false) */
  units: readonly string[];
  prefixable: boolean;
  /** the mathjs unit an expression's result is converted to; null for a plain number */
  mathjsUnit: string | null;
  /** three ways of writing a typical value, for messages */
  examples: string;
}

const OHM_SPELLINGS = ["Ω", "Ω", "ohm", "ohms", "Ohm", "Ohms", "OHM"] as const;

export const QUANTITIES: Record<QuantityName, Quantity> = {
  resistance: {
    name: "resistance",
    described: "a resistance",
    symbol: "Ω",
    units: OHM_SPELLINGS,
    prefixable: true,
    mathjsUnit: "ohm",
    examples: "4k7, 4.7k or 4.7 kΩ",
  },
  capacitance: {
    name: "capacitance",
    described: "a capacitance",
    symbol: "F",
    units: ["F"],
    prefixable: true,
    mathjsUnit: "F",
    examples: "2n2, 2.2n or 2.2 nF",
  },
  inductance: {
    name: "inductance",
    described: "an inductance",
    symbol: "H",
    units: ["H"],
    prefixable: true,
    mathjsUnit: "H",
    examples: "10m, 10 mH or 0.01",
  },
  voltage: {
    name: "voltage",
    described: "a voltage",
    symbol: "V",
    units: ["V"],
    prefixable: true,
    mathjsUnit: "V",
    examples: "60, 60 V or 1.5m",
  },
  current: {
    name: "current",
    described: "a current",
    symbol: "A",
    units: ["A"],
    prefixable: true,
    mathjsUnit: "A",
    examples: "3m, 3 mA or 3e-3",
  },
  frequency: {
    name: "frequency",
    described: "a frequency",
    symbol: "Hz",
    units: ["Hz"],
    prefixable: true,
    mathjsUnit: "Hz",
    examples: "1k, 1 kHz or 1000",
  },
  temperature: {
    name: "temperature",
    described: "a temperature",
    symbol: "K",
    units: ["K"],
    prefixable: false,
    mathjsUnit: "K",
    examples: "298.15, 300 K or 310",
  },
  length: {
    name: "length",
    described: "a length",
    symbol: "m",
    units: ["m"],
    prefixable: true,
    mathjsUnit: "m",
    examples: "3, 3 m or 1.5 m",
  },
  conductance: {
    name: "conductance",
    described: "a transconductance",
    symbol: "S",
    units: ["S", "A/V", "mho"],
    prefixable: true,
    mathjsUnit: "S",
    examples: "2m, 2 mS or 2 mA/V",
  },
  pressure: {
    name: "pressure",
    described: "a sound pressure",
    symbol: "Pa",
    units: ["Pa"],
    prefixable: true,
    mathjsUnit: "Pa",
    examples: "1, 1 Pa or 200 mPa",
  },
  per_pressure: {
    name: "per_pressure",
    described: "a fraction per pascal",
    symbol: "1/Pa",
    units: ["1/Pa", "/Pa", "Pa^-1"],
    prefixable: false,
    mathjsUnit: "Pa^-1",
    examples: "2e-4, 0.2m or 2e-4 1/Pa",
  },
  per_voltage: {
    name: "per_voltage",
    described: "a value per volt",
    symbol: "1/V",
    units: ["1/V", "/V", "V^-1"],
    prefixable: false,
    mathjsUnit: "V^-1",
    examples: "0.02, 20m or 0.02 1/V",
  },
  perveance: {
    name: "perveance",
    described: "a perveance",
    symbol: "A/V^1.5",
    units: ["A/V^1.5", "A/V^(3/2)", "A/V^3/2", "A·V^-1.5"],
    prefixable: true,
    mathjsUnit: "A/V^1.5",
    examples: "1.5m, 1.5e-3 or 1.5 mA/V^1.5",
  },
  voltage_noise_density: {
    name: "voltage_noise_density",
    described: "a noise density",
    symbol: "V/√Hz",
    units: ["V/√Hz", "V/sqrt(Hz)", "V/rtHz", "V/Hz^0.5"],
    prefixable: true,
    mathjsUnit: "V/Hz^0.5",
    examples: "2n, 2e-9 or 2 nV/√Hz",
  },
  capacitance_per_length: {
    name: "capacitance_per_length",
    described: "a capacitance per metre",
    symbol: "F/m",
    units: ["F/m"],
    prefixable: true,
    mathjsUnit: "F/m",
    examples: "100p, 100e-12 or 100 pF/m",
  },
  resistance_per_length: {
    name: "resistance_per_length",
    described: "a resistance per metre",
    symbol: "Ω/m",
    units: OHM_SPELLINGS.map((ohm) => `${ohm}/m`),
    prefixable: true,
    mathjsUnit: "ohm/m",
    examples: "0.05, 50m or 50 mΩ/m",
  },
  angle: {
    name: "angle",
    described: "a phase in degrees",
    symbol: "°",
    units: ["°", "deg", "degrees"],
    prefixable: false,
    mathjsUnit: "deg",
    examples: "0, 90 or -45°",
  },
  gain: {
    name: "gain",
    described: "a voltage gain",
    symbol: "V/V",
    units: ["V/V"],
    prefixable: false,
    mathjsUnit: null,
    examples: "10, -2.5 or 10 V/V",
  },
  dimensionless: {
    name: "dimensionless",
    described: "a plain number",
    symbol: "",
    units: [],
    prefixable: false,
    mathjsUnit: null,
    examples: "100, 2.5 or 1k",
  },
  count: {
    name: "count",
    described: "a whole number",
    symbol: "",
    units: [],
    prefixable: false,
    mathjsUnit: null,
    examples: "10, 20 or 50",
  },
  any: {
    name: "any",
    described: "a value",
    symbol: "",
    units: [],
    prefixable: false,
    mathjsUnit: null,
    examples: "60, 1G or 4.7 kΩ",
  },
};

/** Every quantity that has unit words, for recognising a unit that belongs to another quantity. */
export const QUANTITIES_WITH_UNITS: readonly Quantity[] = Object.values(QUANTITIES).filter((q) => q.units.length > 0);
