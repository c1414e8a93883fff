/**
 * Nets from the drawing. Every pin, ground symbol and net label is a handle; wires join handles; a net is a
 * connected set of handles (union–find). A set holding a ground symbol is net "0"; one holding a net label takes the
 * label's name; any other set keeps the name most of its pins had before the edit (so editing a wire never renames
 * the rest of the circuit), or, when new, a name made from its first pin ("R2_b").
 */
import { GROUND } from "@/sim/circuit/types";
import type { BenchCircuit } from "./circuit";
import { type BenchLayout, type Endpoint, endpointKey } from "./layout";

class UnionFind {
  private parent = new Map<string, string>();
  add(key: string) {
    if (!this.parent.has(key)) this.parent.set(key, key);
  }
  has(key: string) {
    return this.parent.has(key);
  }
  find(key: string): string {
    let root = key;
    while (this.parent.get(root) !== root) root = this.parent.get(root) as string;
    let node = key;
    while (node !== root) {
      const next = this.parent.get(node) as string;
      this.parent.set(node, root);
      node = next;
    }
    return root;
  }
  union(a: string, b: string) {
    const ra = this.find(a);
    const rb = this.find(b);
    if (ra !== rb) this.parent.set(rb, ra);
  }
}

export interface HandleGroup {
  /** the pins, in part order then pin order */
  pins: { part: string; pin: string }[];
  grounds: string[];
  labels: string[];
}

/** The connected sets of handles of the drawing, in order of their first pin (then grounds, then labels). */
export function handleGroups(circuit: BenchCircuit, layout: BenchLayout): HandleGroup[] {
  const uf = new UnionFind();
  const order: { key: string; endpoint: Endpoint }[] = [];
  const add = (endpoint: Endpoint) => {
    const key = endpointKey(endpoint);
    if (uf.has(key)) return;
    uf.add(key);
    order.push({ key, endpoint });
  };
  for (const part of circuit.parts) for (const pin of Object.keys(part.pins)) add({ kind: "pin", part: part.id, pin });
  for (const id of Object.keys(layout.grounds)) add({ kind: "ground", id });
  for (const id of Object.keys(layout.netLabels)) add({ kind: "label", id });
  for (const wire of layout.wires) {
    const a = endpointKey(wire.from);
    const b = endpointKey(wire.to);
    // a wire to something that no longer exists joins nothing
    if (uf.has(a) && uf.has(b)) uf.union(a, b);
  }
  const groups = new Map<string, HandleGroup>();
  for (const { key, endpoint } of order) {
    const root = uf.find(key);
    let group = groups.get(root);
    if (!group) {
      group = { pins: [], grounds: [], labels: [] };
      groups.set(root, group);
    }
    if (endpoint.kind === "pin") group.pins.push({ part: endpoint.part, pin: endpoint.pin });
    else if (endpoint.kind === "ground") group.grounds.push(endpoint.id);
    else group.labels.push(endpoint.id);
  }
  return [...groups.values()];
}

/** A net name made from a pin, unique among `taken`. */
function pinNetName(part: string, pin: string, taken: Set<string>): string {
  const base = `${part}_${pin}`;
  let name = base;
  for (let n = 2; taken.has(name); n++) name = `${base}_${n}`;
  return name;
}

function mostCommon(names: string[], exclude: Set<string>): string | undefined {
  const counts = new Map<string, number>();
  for (const name of names) if (!exclude.has(name)) counts.set(name, (counts.get(name) ?? 0) + 1);
  let best: string | undefined;
  let bestCount = 0;
  for (const [name, count] of counts) {
    if (count > bestCount) {
      best = name;
      bestCount = count;
    }
  }
  return best;
}

/**
 * The circuit with every pin's net recomputed from the drawing, the output and the net labels following their nets.
 * The input is not changed. `circuit`'s current pin nets are the naming hints.
 */
export function syncNets(circuit: BenchCircuit, layout: BenchLayout): { circuit: BenchCircuit; layout: BenchLayout } {
  const groups = handleGroups(circuit, layout);
  const oldNet = new Map<string, string>();
  for (const part of circuit.parts)
    for (const [pin, net] of Object.entries(part.pins)) oldNet.set(`${part.id}.${pin}`, net);

  const names: (string | undefined)[] = groups.map(() => undefined);
  const taken = new Set<string>([GROUND]);
  // forced names first: ground, then labels
  groups.forEach((group, i) => {
    if (group.grounds.length > 0) names[i] = GROUND;
  });
  groups.forEach((group, i) => {
    if (names[i] !== undefined || group.labels.length === 0) return;
    const wanted = group.labels.map((id) => layout.netLabels[id].net).find((name) => !taken.has(name));
    if (wanted !== undefined) {
      names[i] = wanted;
      taken.add(wanted);
    }
  });
  // then the old names, most common first, never "0" without a ground symbol
  groups.forEach((group, i) => {
    if (names[i] !== undefined) return;
    const hints = group.pins.map((p) => oldNet.get(`${p.part}.${p.pin}`) ?? "");
    const hint = mostCommon(
      hints.filter((h) => h !== ""),
      taken,
    );
    if (hint !== undefined) {
      names[i] = hint;
      taken.add(hint);
    }
  });
  groups.forEach((group, i) => {
    if (names[i] !== undefined) return;
    const first = group.pins[0];
    const name = first
      ? pinNetName(first.part, first.pin, taken)
      : pinNetName("label", group.labels[0] ?? "net", taken);
    names[i] = name;
    taken.add(name);
  });

  const newNet = new Map<string, string>();
  const labelNet = new Map<string, string>();
  groups.forEach((group, i) => {
    const name = names[i] as string;
    for (const p of group.pins) newNet.set(`${p.part}.${p.pin}`, name);
    for (const id of group.labels) labelNet.set(id, name);
  });
  // where each old net went: the new net of its first pin
  const renamed = new Map<string, string>();
  for (const [key, net] of oldNet) if (!renamed.has(net)) renamed.set(net, newNet.get(key) as string);
  const follow = (net: string) => {
    if (net === GROUND) return GROUND;
    if (taken.has(net)) return net;
    return renamed.get(net) ?? net;
  };

  const parts = circuit.parts.map((part) => ({
    ...part,
    pins: Object.fromEntries(Object.keys(part.pins).map((pin) => [pin, newNet.get(`${part.id}.${pin}`) as string])),
  }));
  const netLabels = Object.fromEntries(
    Object.entries(layout.netLabels).map(([id, label]) => [id, { ...label, net: labelNet.get(id) ?? label.net }]),
  );
  return {
    circuit: { ...circuit, parts, output: { plus: follow(circuit.output.plus), minus: follow(circuit.output.minus) } },
    layout: { ...layout, netLabels },
  };
}

/** Every net of the circuit: "0" first, then in order of first use. */
export function netNames(circuit: BenchCircuit): string[] {
  const names = new Set<string>([GROUND]);
  for (const part of circuit.parts) for (const net of Object.values(part.pins)) names.add(net);
  return [...names];
}

/**
 * The circuit's nets as a partition of its pins, for comparing two circuits: each net → sorted "PART.pin" keys,
 * the ground set marked. Two circuits connect the same pins the same way iff their canonical partitions are equal.
 */
export function canonicalPartition(circuit: BenchCircuit): { ground: string[]; others: string[][] } {
  const byNet = new Map<string, string[]>();
  for (const part of circuit.parts) {
    for (const [pin, net] of Object.entries(part.pins)) {
      const list = byNet.get(net) ?? [];
      list.push(`${part.id}.${pin}`);
      byNet.set(net, list);
    }
  }
  const ground = (byNet.get(GROUND) ?? []).sort();
  byNet.delete(GROUND);
  const others = [...byNet.values()].map((keys) => keys.sort()).sort((a, b) => a[0].localeCompare(b[0]));
  return { ground, others };
}
