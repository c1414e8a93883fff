/**
 * Mutated circuit files for the property tests of the parser and the solver (sim/fuzz.test.ts): each example in
 * sim/examples with a few random edits — parts dropped or duplicated, nets swapped, values replaced by zero,
 * negative, huge, tiny, NaN-ish, RKM or expression strings, unknown kinds and fields, wrong types, deep nesting and
 * long arrays. Sizes are bounded so one solve stays well under a second.
 */
import fc from "fast-check";
import { PART_KINDS } from "./circuit/types";

type Json = unknown;
export type CircuitFile = Record<string, Json> & { parts: Record<string, Json>[] };

/** Values a person (or a broken client) might type into a value field. */
export const strangeValue: fc.Arbitrary<Json> = fc.oneof(
  fc.constantFrom(0, -1, -1e-12, 1e300, -1e300, 1e-300, 5e-324, Number.MAX_VALUE, 1e15, 1e-15),
  fc.double(), // includes NaN and ±Infinity, which a JS caller (not JSON) can pass
  fc.constantFrom("NaN", "nan", "Infinity", "-Infinity", "inf", "1e999", "-1e999", "1e-999", "", " ", "0", "-0"),
  fc.constantFrom("4k7", "0R", "R0", "4R7", "1G0", "2n2", "47K3", "1M", "1m", "4µ7", "4u7", "k", "R", "4k7k", "1..2"),
  fc.constantFrom("1/0", "0/0", "sqrt(-1)", "log(0)", "2^2000", "VPOL*2", "RB/0", "-RB", "UNKNOWN*2", "(((1)))", "1+"),
  fc.constantFrom("10%", "100 V", "1 kΩ", "5 pF", "1 Hz", "12 V AC", "mains"),
  fc.string({ maxLength: 12 }),
  fc.constantFrom(null, true, false, [], {}, [1, 2], { value: 1 }),
);

/** A value nested `depth` levels in arrays and objects. */
function nested(depth: number): Json {
  let value: Json = 1;
  for (let i = 0; i < depth; i += 1) value = i % 2 ? [value] : { x: value };
  return value;
}

const anyNet = fc.oneof(fc.constantFrom("0", "", " ", "out", "g", "nowhere"), fc.string({ maxLength: 6 }));

export type Mutation =
  | { op: "drop"; at: number }
  | { op: "duplicate"; at: number }
  | { op: "swapNets"; at: number; other: number }
  | { op: "setNet"; at: number; pin: number; net: Json }
  | { op: "dropPin"; at: number; pin: number }
  | { op: "setValue"; at: number; key: number | string; value: Json }
  | { op: "setKind"; at: number; kind: Json }
  | { op: "setPartField"; at: number; field: string; value: Json }
  | { op: "setParameter"; key: number | string; value: Json }
  | { op: "setTop"; field: string; value: Json }
  | { op: "deep"; at: number; depth: number }
  | { op: "manyParts"; count: number }
  | { op: "hugeArray"; field: string; count: number };

const index = fc.nat({ max: 40 });

export const mutation: fc.Arbitrary<Mutation> = fc.oneof(
  fc.record({ op: fc.constant("drop" as const), at: index }),
  fc.record({ op: fc.constant("duplicate" as const), at: index }),
  fc.record({ op: fc.constant("swapNets" as const), at: index, other: index }),
  fc.record({
    op: fc.constant("setNet" as const),
    at: index,
    pin: fc.nat({ max: 3 }),
    net: fc.oneof(anyNet, strangeValue),
  }),
  fc.record({ op: fc.constant("dropPin" as const), at: index, pin: fc.nat({ max: 3 }) }),
  fc.record({
    op: fc.constant("setValue" as const),
    at: index,
    key: fc.oneof(fc.nat({ max: 6 }), fc.constantFrom("bogus", "__proto__", "constructor", "")),
    value: strangeValue,
  }),
  fc.record({
    op: fc.constant("setKind" as const),
    at: index,
    kind: fc.oneof(fc.constantFrom(...PART_KINDS), fc.constantFrom("Resistor", "wire", "", "toString"), strangeValue),
  }),
  fc.record({
    op: fc.constant("setPartField" as const),
    at: index,
    field: fc.constantFrom("id", "pins", "values", "tolerance", "role", "extra", "model", "type"),
    value: strangeValue,
  }),
  fc.record({
    op: fc.constant("setParameter" as const),
    key: fc.oneof(fc.nat({ max: 4 }), fc.constantFrom("NEW", "0BAD", "pi", "e", "sqrt", "")),
    value: strangeValue,
  }),
  fc.record({
    op: fc.constant("setTop" as const),
    field: fc.constantFrom(
      "format",
      "version",
      "parts",
      "output",
      "parameters",
      "variants",
      "analyses",
      "targets",
      "zzz",
    ),
    value: strangeValue,
  }),
  fc.record({ op: fc.constant("deep" as const), at: index, depth: fc.integer({ min: 10, max: 2000 }) }),
  fc.record({ op: fc.constant("manyParts" as const), count: fc.integer({ min: 50, max: 400 }) }),
  fc.record({
    op: fc.constant("hugeArray" as const),
    field: fc.constantFrom("parts", "variants", "targets", "analyses.sweep.values", "analyses.distortion.spl_db"),
    count: fc.integer({ min: 1000, max: 20_000 }),
  }),
);

function record(value: Json): Record<string, Json> | undefined {
  return value !== null && typeof value === "object" && !Array.isArray(value)
    ? (value as Record<string, Json>)
    : undefined;
}

function pick<T>(items: T[], at: number): T | undefined {
  return items.length ? items[at % items.length] : undefined;
}

function pickKey(object: Record<string, Json>, key: number | string): string {
  if (typeof key === "string") return key;
  return pick(Object.keys(object), key) ?? "resistance";
}

function setPath(file: CircuitFile, path: string, value: Json): void {
  const keys = path.split(".");
  let at: Record<string, Json> = file;
  for (const key of keys.slice(0, -1)) {
    const next = record(at[key]) ?? {};
    at[key] = next;
    at = next;
  }
  at[keys[keys.length - 1]] = value;
}

/** Applies one edit in place. Edits aimed at a part that is no longer there do nothing. */
export function applyMutation(file: CircuitFile, m: Mutation): void {
  const parts = Array.isArray(file.parts) ? file.parts : [];
  const part = record(pick(parts, "at" in m ? m.at : 0));
  switch (m.op) {
    case "drop":
      if (parts.length) parts.splice(m.at % parts.length, 1);
      return;
    case "duplicate":
      if (part) parts.push(structuredClone(part));
      return;
    case "swapNets": {
      const a = record(part?.pins);
      const b = record(record(pick(parts, m.other))?.pins);
      if (!a || !b) return;
      const [ka, kb] = [Object.keys(a)[0], Object.keys(b)[0]];
      if (ka && kb) [a[ka], b[kb]] = [b[kb], a[ka]];
      return;
    }
    case "setNet": {
      const pins = record(part?.pins);
      if (pins) pins[pickKey(pins, m.pin)] = m.net;
      return;
    }
    case "dropPin": {
      const pins = record(part?.pins);
      if (pins) delete pins[pickKey(pins, m.pin)];
      return;
    }
    case "setValue": {
      if (!part) return;
      const values = record(part.values) ?? {};
      part.values = values;
      values[pickKey(values, m.key)] = m.value;
      return;
    }
    case "setKind":
      if (part) part.kind = m.kind;
      return;
    case "setPartField":
      if (part) part[m.field] = m.value;
      return;
    case "setParameter": {
      const parameters = record(file.parameters) ?? {};
      file.parameters = parameters;
      parameters[pickKey(parameters, m.key)] = m.value;
      return;
    }
    case "setTop":
      file[m.field] = m.value;
      return;
    case "deep":
      if (part) part.values = { ...record(part.values), resistance: nested(m.depth) };
      return;
    case "manyParts":
      // a ladder of resistors from the first net of the file to ground: many nets, one solve
      for (let i = 0; i < m.count; i += 1) {
        parts.push({
          id: `RX${i}`,
          kind: "resistor",
          pins: { a: `x${i}`, b: i ? `x${i - 1}` : "0" },
          values: { resistance: "1k" },
        });
      }
      return;
    case "hugeArray":
      setPath(
        file,
        m.field,
        Array.from({ length: m.count }, (_, i) => (m.field === "parts" ? { id: `P${i}` } : i)),
      );
      return;
  }
}

export type Example = { name: string; file: CircuitFile };

/** One of `examples` (parsed circuit files) with one to four edits applied to a copy. */
export const mutatedFile = (examples: Example[]): fc.Arbitrary<Example & { mutations: Mutation[] }> =>
  fc
    .record({
      example: fc.constantFrom(...examples),
      mutations: fc.array(mutation, { minLength: 1, maxLength: 4 }),
    })
    .map(({ example, mutations }) => {
      const file = structuredClone(example.file);
      for (const m of mutations) applyMutation(file, m);
      return { name: example.name, mutations, file };
    });

/** Any JSON-ish value at all, for the parser's outermost checks. */
export const anyDocument: fc.Arbitrary<Json> = fc.oneof(fc.jsonValue({ maxDepth: 4 }), fc.anything({ maxDepth: 3 }));
