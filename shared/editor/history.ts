/**
 * Undo and redo over immutable values. Edits that share a `group` key one after another (typing in one
 * field) collapse into a single step, so one undo takes back the whole word, not one letter.
 */
export interface History<T> {
  past: readonly T[];
  present: T;
  future: readonly T[];
  /** Group of the last edit; null after undo, redo or a reset. */
  group: string | null;
}

export const HISTORY_LIMIT = 200;

export function startHistory<T>(present: T): History<T> {
  return { past: [], present, future: [], group: null };
}

export function record<T>(history: History<T>, next: T, group: string | null = null): History<T> {
  if (next === history.present) return history;
  if (group !== null && group === history.group) return { ...history, present: next, future: [] };
  const past = [...history.past, history.present];
  return { past: past.length > HISTORY_LIMIT ? past.slice(past.length - HISTORY_LIMIT) : past, present: next, future: [], group };
}

export function undo<T>(history: History<T>): History<T> {
  if (history.past.length === 0) return history;
  return {
    past: history.past.slice(0, -1),
    present: history.past[history.past.length - 1],
    future: [history.present, ...history.future],
    group: null,
  };
}

export function redo<T>(history: History<T>): History<T> {
  if (history.future.length === 0) return history;
  return { past: [...history.past, history.present], present: history.future[0], future: history.future.slice(1), group: null };
}
