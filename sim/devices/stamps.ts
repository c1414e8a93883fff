/**
 * Reusable stamp patterns: a two-terminal conductance (or capacitance), a branch current's incidence, and a
 * voltage-controlled current. Each comes as a `declare…` that reserves handles and a `stamp…` that writes them.
 */
import type { PatternBuilder, EntryOptions } from "../mna/pattern";

export interface TwoTerminalHandles {
  aa: number;
  ab: number;
  ba: number;
  bb: number;
}

export function declareTwoTerminal(p: PatternBuilder, a: number, b: number, o?: EntryOptions): TwoTerminalHandles {
  return { aa: p.entry(a, a, o), ab: p.entry(a, b, o), ba: p.entry(b, a, o), bb: p.entry(b, b, o) };
}

/** y between a and b: +y on the diagonals, −y off them */
export function stampTwoTerminal(add: (h: number, v: number) => void, h: TwoTerminalHandles, y: number): void {
  add(h.aa, y);
  add(h.bb, y);
  add(h.ab, -y);
  add(h.ba, -y);
}

/** A branch current k flowing from net a through the element to net b, with the branch row's voltage terms. */
export interface BranchHandles {
  /** KCL rows: +1 at (a, k), −1 at (b, k) */
  ak: number;
  bk: number;
  /** branch row: +1 at (k, a), −1 at (k, b) — V(a) − V(b) … */
  ka: number;
  kb: number;
}

export function declareBranch(p: PatternBuilder, a: number, b: number, k: number): BranchHandles {
  return { ak: p.entry(a, k), bk: p.entry(b, k), ka: p.entry(k, a), kb: p.entry(k, b) };
}

export function stampBranchIncidence(add: (h: number, v: number) => void, h: BranchHandles): void {
  add(h.ak, 1);
  add(h.bk, -1);
  add(h.ka, 1);
  add(h.kb, -1);
}

/** A current g·(V(cp) − V(cn)) leaving net p and entering net n. */
export interface TransconductanceHandles {
  pcp: number;
  pcn: number;
  ncp: number;
  ncn: number;
}

export function declareTransconductance(
  pattern: PatternBuilder,
  p: number,
  n: number,
  cp: number,
  cn: number,
  o?: EntryOptions,
): TransconductanceHandles {
  return {
    pcp: pattern.entry(p, cp, o),
    pcn: pattern.entry(p, cn, o),
    ncp: pattern.entry(n, cp, o),
    ncn: pattern.entry(n, cn, o),
  };
}

export function stampTransconductance(
  add: (h: number, v: number) => void,
  h: TransconductanceHandles,
  g: number,
): void {
  add(h.pcp, g);
  add(h.pcn, -g);
  add(h.ncp, -g);
  add(h.ncn, g);
}

/** Voltage of unknown index i in x, ground (−1) being 0 V. */
export function voltageAt(x: Float64Array, i: number): number {
  return i < 0 ? 0 : x[i];
}
