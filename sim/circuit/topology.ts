/**
 * Structural checks before solving, so that a circuit the solver cannot answer fails with a message naming the
 * part or net and saying what to change, never with NaN: an output net no part touches, a source with both pins on
 * one net, a loop of zero-resistance branches (voltage sources, vcvs outputs, inductors and transformer windings
 * without series resistance, ideal cable conductors), and a net with no DC path to ground (the contract's `op` rules).
 */
import { SimError } from "../errors";
import { type ElaboratedCircuit, type ElaboratedPart, GROUND } from "./types";

interface Branch {
  part: ElaboratedPart;
  from: string;
  to: string;
}

/** Disjoint sets of nets. */
class NetSets {
  private readonly parent = new Map<string, string>();

  find(net: string): string {
    let root = net;
    while (this.parent.has(root) && this.parent.get(root) !== root) root = this.parent.get(root) as string;
    let node = net;
    while (node !== root) {
      const next = this.parent.get(node) as string;
      this.parent.set(node, root);
      node = next;
    }
    return root;
  }

  /** Joins the two sets; false when they were one already. */
  union(a: string, b: string): boolean {
    const ra = this.find(a);
    const rb = this.find(b);
    if (ra === rb) return false;
    this.parent.set(ra, rb);
    return true;
  }
}

const SOURCE_KINDS = new Set(["vsource", "isource", "vcvs", "vccs"]);

/** Branches that conduct direct current (the contract's `op` paragraph). */
function dcBranches(part: ElaboratedPart): Branch[] {
  const p = part.pins;
  const branch = (from: string, to: string): Branch => ({ part, from: p[from], to: p[to] });
  switch (part.kind) {
    case "resistor":
    case "inductor":
    case "cable":
      return [branch("a", "b")];
    case "vsource":
    case "vcvs":
      return [branch("p", "n")];
    case "load":
      return Number.isFinite(part.values.resistance as number) ? [branch("p", "n")] : [];
    case "transformer":
      return [branch("p1", "p2"), branch("s1", "s2")];
    case "jfet":
      return [branch("d", "s")];
    case "triode":
      return [branch("a", "k")];
    case "bjt":
      return [branch("c", "e"), branch("b", "e")];
    default:
      return [];
  }
}

/** Branches with no resistance at DC: fixed voltages or shorts, which may not form a loop. */
function zeroResistanceBranches(part: ElaboratedPart): Branch[] {
  const p = part.pins;
  const branch = (from: string, to: string): Branch => ({ part, from: p[from], to: p[to] });
  const v = part.values;
  switch (part.kind) {
    case "vsource":
    case "vcvs":
      return [branch("p", "n")];
    case "inductor":
      return v.series_resistance === 0 ? [branch("a", "b")] : [];
    case "cable":
      return v.resistance_per_m === 0 ? [branch("a", "b")] : [];
    case "transformer":
      return [
        ...(v.primary_resistance === 0 ? [branch("p1", "p2")] : []),
        ...(v.secondary_resistance === 0 ? [branch("s1", "s2")] : []),
      ];
    default:
      return [];
  }
}

function checkOutputNets(circuit: ElaboratedCircuit): void {
  const nets = new Set(circuit.nets);
  for (const side of ["plus", "minus"] as const) {
    const net = circuit.output[side];
    if (!nets.has(net)) {
      throw new SimError(
        "unknown_output_net",
        `output.${side}: no part touches net "${net}". Name a net that a part connects to (${circuit.nets.join(", ")}).`,
        { net, field: `output.${side}` },
      );
    }
  }
}

function checkShortedSources(circuit: ElaboratedCircuit): void {
  for (const part of circuit.parts) {
    if (SOURCE_KINDS.has(part.kind) && part.pins.p === part.pins.n) {
      throw new SimError(
        "shorted_source",
        `${part.id}: both its pins p and n are on net ${part.pins.p}, so the source is shorted. Connect p and n to different nets.`,
        { part: part.id, net: part.pins.p },
      );
    }
  }
}

/** Parts along the forest path from `start` to `goal` (breadth-first). */
function pathBetween(forest: Map<string, Branch[]>, start: string, goal: string): string[] {
  const cameBy = new Map<string, Branch | null>([[start, null]]);
  const queue = [start];
  while (queue.length > 0) {
    const net = queue.shift() as string;
    if (net === goal) break;
    for (const branch of forest.get(net) ?? []) {
      const next = branch.from === net ? branch.to : branch.from;
      if (!cameBy.has(next)) {
        cameBy.set(next, branch);
        queue.push(next);
      }
    }
  }
  const parts: string[] = [];
  for (let net = goal, step = cameBy.get(goal); step; step = cameBy.get(net)) {
    parts.unshift(step.part.id);
    net = step.from === net ? step.to : step.from;
  }
  return parts;
}

function checkSourceLoops(circuit: ElaboratedCircuit): void {
  const sets = new NetSets();
  const forest = new Map<string, Branch[]>();
  for (const part of circuit.parts) {
    for (const branch of zeroResistanceBranches(part)) {
      if (branch.from === branch.to) continue;
      if (sets.union(branch.from, branch.to)) {
        for (const net of [branch.from, branch.to]) forest.set(net, [...(forest.get(net) ?? []), branch]);
        continue;
      }
      const loop = [...pathBetween(forest, branch.from, branch.to), part.id];
      throw new SimError(
        "source_loop",
        `${part.id} closes a loop of voltage sources and zero-resistance branches (${loop.join(", ")}) between nets ${branch.from} and ${branch.to}; the current around it is not defined. Add resistance to the loop (a resistor, an inductor's series_resistance, a winding's resistance, a cable's resistance_per_m) or remove one of them.`,
        { part: part.id, net: branch.from },
      );
    }
  }
}

function checkDcPaths(circuit: ElaboratedCircuit): void {
  const sets = new NetSets();
  for (const part of circuit.parts) for (const b of dcBranches(part)) sets.union(b.from, b.to);
  const ground = sets.find(GROUND);
  const floating = circuit.nets.find((net) => sets.find(net) !== ground);
  if (floating === undefined) return;
  const group = new Set(circuit.nets.filter((net) => sets.find(net) === sets.find(floating)));
  const touching = circuit.parts
    .filter((part) => Object.values(part.pins).some((net) => group.has(net)))
    .map((p) => p.id);
  const others = [...group].filter((net) => net !== floating);
  const alsoNets = others.length > 0 ? ` (nor have ${others.join(", ")}, joined to it)` : "";
  throw new SimError(
    "no_dc_path",
    `Net ${floating} has no DC path to ground${alsoNets}: add a bias resistor from ${floating} to ground or to a supply. It meets only ${touching.join(", ") || "nothing"}, which pass no direct current to ground.`,
    { net: floating },
  );
}

/** Throws the first structural problem as a `SimError`; returns when the circuit can be solved. */
export function checkTopology(circuit: ElaboratedCircuit): void {
  checkOutputNets(circuit);
  checkShortedSources(circuit);
  checkSourceLoops(circuit);
  checkDcPaths(circuit);
}
