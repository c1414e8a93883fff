/**
 * What changed between two circuit files (a revision and its parent): parts added and removed, and for parts in
 * both their kind, pins, values, tolerances and on/off switch; parameters added, removed and changed; variants added
 * and removed; the output nets and title. Pure: it reads the files as written (values stay strings, so "4k7" → "10k"
 * reads as the person wrote it) and tolerates files that are not valid circuits, comparing what is there.
 */

export interface ValueChange {
  name: string;
  before: string | null;
  after: string | null;
}

export interface PartChange {
  id: string;
  kind: string;
  /** kind changed: "resistor → capacitor" */
  kindBefore?: string;
  values: ValueChange[];
  pins: ValueChange[];
  tolerance: ValueChange[];
  enabled?: { before: boolean; after: boolean };
}

export interface PartSummary {
  id: string;
  kind: string;
  values: Record<string, string>;
}

export interface CircuitDiff {
  partsAdded: PartSummary[];
  partsRemoved: PartSummary[];
  partsChanged: PartChange[];
  parameters: ValueChange[];
  variantsAdded: string[];
  variantsRemoved: string[];
  output?: { before: string; after: string };
  title?: { before: string; after: string };
  /** true when nothing above differs */
  same: boolean;
}

type Loose = Record<string, unknown>;

const isObject = (v: unknown): v is Loose => typeof v === "object" && v !== null && !Array.isArray(v);

/** A value as text: numbers and strings as written, anything else as JSON. */
function show(v: unknown): string {
  if (typeof v === "string") return v;
  if (typeof v === "number" || typeof v === "boolean") return String(v);
  return JSON.stringify(v);
}

function textRecord(v: unknown): Record<string, string> {
  if (!isObject(v)) return {};
  return Object.fromEntries(Object.entries(v).map(([k, x]) => [k, show(x)]));
}

/** Changes between two flat records, in the order of the names' first appearance (before, then new ones). */
export function diffRecords(before: Record<string, string>, after: Record<string, string>): ValueChange[] {
  const names = [...new Set([...Object.keys(before), ...Object.keys(after)])];
  const changes: ValueChange[] = [];
  for (const name of names) {
    const b = Object.hasOwn(before, name) ? before[name] : null;
    const a = Object.hasOwn(after, name) ? after[name] : null;
    if (b !== a) changes.push({ name, before: b, after: a });
  }
  return changes;
}

function partsById(file: unknown): Map<string, Loose> {
  const parts = isObject(file) && Array.isArray(file.parts) ? file.parts : [];
  const map = new Map<string, Loose>();
  for (const part of parts) {
    if (isObject(part) && typeof part.id === "string") map.set(part.id, part);
  }
  return map;
}

function summary(part: Loose): PartSummary {
  return { id: String(part.id), kind: show(part.kind ?? ""), values: textRecord(part.values) };
}

const enabledOf = (part: Loose) => part.enabled !== false;

function variantNames(file: unknown): string[] {
  const variants = isObject(file) && Array.isArray(file.variants) ? file.variants : [];
  return variants.filter(isObject).map((v) => show(v.name));
}

function outputText(file: unknown): string {
  const output = isObject(file) && isObject(file.output) ? file.output : {};
  return `${show(output.plus ?? "")} − ${show(output.minus ?? "")}`;
}

export function diffCircuits(before: unknown, after: unknown): CircuitDiff {
  const oldParts = partsById(before);
  const newParts = partsById(after);
  const partsAdded = [...newParts.values()].filter((p) => !oldParts.has(String(p.id))).map(summary);
  const partsRemoved = [...oldParts.values()].filter((p) => !newParts.has(String(p.id))).map(summary);
  const partsChanged: PartChange[] = [];
  for (const [id, next] of newParts) {
    const prev = oldParts.get(id);
    if (!prev) continue;
    const change: PartChange = {
      id,
      kind: show(next.kind ?? ""),
      values: diffRecords(textRecord(prev.values), textRecord(next.values)),
      pins: diffRecords(textRecord(prev.pins), textRecord(next.pins)),
      tolerance: diffRecords(textRecord(prev.tolerance), textRecord(next.tolerance)),
    };
    if (show(prev.kind ?? "") !== change.kind) change.kindBefore = show(prev.kind ?? "");
    if (enabledOf(prev) !== enabledOf(next)) change.enabled = { before: enabledOf(prev), after: enabledOf(next) };
    const changed =
      change.kindBefore !== undefined ||
      change.enabled !== undefined ||
      change.values.length + change.pins.length + change.tolerance.length > 0;
    if (changed) partsChanged.push(change);
  }
  const parameters = diffRecords(
    textRecord(isObject(before) ? before.parameters : undefined),
    textRecord(isObject(after) ? after.parameters : undefined),
  );
  const oldVariants = variantNames(before);
  const newVariants = variantNames(after);
  const diff: CircuitDiff = {
    partsAdded,
    partsRemoved,
    partsChanged,
    parameters,
    variantsAdded: newVariants.filter((n) => !oldVariants.includes(n)),
    variantsRemoved: oldVariants.filter((n) => !newVariants.includes(n)),
    same: false,
  };
  const [outBefore, outAfter] = [outputText(before), outputText(after)];
  if (outBefore !== outAfter) diff.output = { before: outBefore, after: outAfter };
  const titleOf = (f: unknown) => (isObject(f) ? show(f.title ?? "") : "");
  if (titleOf(before) !== titleOf(after)) diff.title = { before: titleOf(before), after: titleOf(after) };
  diff.same =
    partsAdded.length + partsRemoved.length + partsChanged.length + parameters.length === 0 &&
    diff.variantsAdded.length + diff.variantsRemoved.length === 0 &&
    !diff.output &&
    !diff.title;
  return diff;
}
