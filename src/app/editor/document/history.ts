/**
 * Undo history of a document with marks, after tldraw's history manager: a drag sets a mark at its
 * start, shows its moves without recording them, and records one entry at its end; Escape returns to
 * the mark. Pure functions over plain data, so a store can keep the whole history in one signal.
 */
export interface History<T> {
  readonly past: readonly T[];
  readonly present: T;
  readonly future: readonly T[];
  /** The document when the gesture in progress began; undefined when none is. */
  readonly mark?: T;
}

/** Enough steps for a day's work on one panel without holding every drag's copies for ever. */
export const HISTORY_LIMIT = 200;

export function startHistory<T>(present: T): History<T> {
  return { past: [], present, future: [] };
}

/** Records a finished change as one step; redo is lost, as in every editor. */
export function record<T>(history: History<T>, next: T): History<T> {
  if (next === history.present) return history;
  return { past: [...history.past, history.present].slice(-HISTORY_LIMIT), present: next, future: [] };
}

/** Starts a gesture: remembers where it began. */
export function setMark<T>(history: History<T>): History<T> {
  return { ...history, mark: history.present };
}

/** Shows a gesture's current state without recording it. */
export function preview<T>(history: History<T>, next: T): History<T> {
  return { ...history, present: next };
}

/** Ends a gesture: the whole of it becomes one step (none if nothing changed). */
export function commitMark<T>(history: History<T>): History<T> {
  const { mark, present } = history;
  if (mark === undefined) return history;
  if (mark === present) return { past: history.past, present, future: history.future };
  return { past: [...history.past, mark].slice(-HISTORY_LIMIT), present, future: [] };
}

/** Cancels a gesture: back to where it began, nothing recorded. */
export function bailToMark<T>(history: History<T>): History<T> {
  if (history.mark === undefined) return history;
  return { past: history.past, present: history.mark, future: history.future };
}

export function undo<T>(history: History<T>): History<T> {
  const settled = commitMark(history);
  if (settled.past.length === 0) return settled;
  return { past: settled.past.slice(0, -1), present: settled.past[settled.past.length - 1], future: [settled.present, ...settled.future] };
}

export function redo<T>(history: History<T>): History<T> {
  if (history.future.length === 0 || history.mark !== undefined) return history;
  return { past: [...history.past, history.present], present: history.future[0], future: history.future.slice(1) };
}
