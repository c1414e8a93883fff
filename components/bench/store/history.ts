/**
 * Undo and redo as two bounded stacks of whole documents. Documents are immutable values, so a snapshot is a
 * reference, not a copy; the bound keeps a long session's memory flat.
 */

/** How many steps back undo reaches. */
export const HISTORY_LIMIT = 100;

export interface History<T> {
  past: T[];
  future: T[];
}

/** `current` becomes undoable; redo is no longer possible. */
export function record<T>(history: History<T>, current: T, limit = HISTORY_LIMIT): History<T> {
  const past = [...history.past, current];
  return { past: past.length > limit ? past.slice(past.length - limit) : past, future: [] };
}

export function undo<T>(history: History<T>, current: T): { history: History<T>; value: T } | null {
  if (history.past.length === 0) return null;
  const value = history.past[history.past.length - 1];
  return { history: { past: history.past.slice(0, -1), future: [current, ...history.future] }, value };
}

export function redo<T>(history: History<T>, current: T): { history: History<T>; value: T } | null {
  if (history.future.length === 0) return null;
  const [value, ...future] = history.future;
  return { history: { past: [...history.past, current], future }, value };
}
