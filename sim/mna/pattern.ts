/**
 * The set of matrix positions a circuit can write, declared once per circuit before any numbers exist.
 *
 * Devices ask for an entry handle for every (row, column) they stamp; a handle is a small integer that a compiled
 * system (sparse-structure.ts) maps to a storage position, so stamping at run time is one indexed add with no
 * look-ups. Rows and columns are unknown indices (layout.ts); a negative index is ground, whose row and column
 * are not in the system: such entries get the shared `DISCARDED_HANDLE`, and whatever is written there is ignored.
 */

/** Handle of every entry that touches ground; compiled systems map it to a scratch slot nobody reads. */
export const DISCARDED_HANDLE = 0;

export interface EntryOptions {
  /**
   * Only written by the small-signal (AC) analysis: a capacitance, say. The DC system leaves it out, so it
   * neither costs fill nor misleads pivot selection where it is always zero.
   */
  acOnly?: boolean;
  /**
   * The value may be exactly zero for some operating points or parameter values (a nonlinear device's
   * conductance in cut-off, a branch's series resistance of 0 Ω, the temporary gmin). Pivot selection prefers not
   * to rely on weak entries.
   */
  weak?: boolean;
}

export interface PatternEntry {
  row: number;
  col: number;
  acOnly: boolean;
  weak: boolean;
}

export class PatternBuilder {
  readonly size: number;
  /** index = handle; entry 0 is the discarded ground entry */
  readonly entries: PatternEntry[] = [{ row: -1, col: -1, acOnly: false, weak: true }];
  private readonly byKey = new Map<number, number>();

  constructor(size: number) {
    this.size = size;
  }

  /** Handle for position (row, col). Asking twice for the same position returns the same handle. */
  entry(row: number, col: number, options: EntryOptions = {}): number {
    if (row < 0 || col < 0) return DISCARDED_HANDLE;
    const key = row * this.size + col;
    const acOnly = options.acOnly ?? false;
    const weak = options.weak ?? false;
    const existing = this.byKey.get(key);
    if (existing !== undefined) {
      const e = this.entries[existing];
      // A position used by both analyses is in the DC system; one strong use makes it strong.
      e.acOnly = e.acOnly && acOnly;
      e.weak = e.weak && weak;
      return existing;
    }
    const handle = this.entries.length;
    this.entries.push({ row, col, acOnly, weak });
    this.byKey.set(key, handle);
    return handle;
  }
}
