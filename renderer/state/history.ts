/**
 * Undo and redo over document states. Edits to the same field within `mergeWindowMs` merge into one
 * step, so typing "45" is one undo, not two. Loading another document starts a fresh history.
 */
import type { DocumentState } from "./scenario-state";

export interface History {
  readonly past: readonly DocumentState[];
  readonly present: DocumentState;
  readonly future: readonly DocumentState[];
  /** Key and time of the last edit, for merging keystrokes. */
  readonly lastKey: string | null;
  readonly lastAt: number;
}

export const HISTORY_LIMIT = 200;

export function historyStart(present: DocumentState): History {
  return { past: [], present, future: [], lastKey: null, lastAt: 0 };
}

/** Records an edit. `key` names what changed (e.g. "set-field:diffuser.portAngle"). */
export function historyPush(
  history: History,
  next: DocumentState,
  key: string,
  now: number,
  mergeWindowMs = 1000,
): History {
  if (next === history.present) return history;
  const merge = key === history.lastKey && now - history.lastAt <= mergeWindowMs && history.past.length > 0;
  const past = merge ? history.past : [...history.past, history.present].slice(-HISTORY_LIMIT);
  return { past, present: next, future: [], lastKey: key, lastAt: now };
}

/** Steps back; the document's location and saved state follow the step (undoing to the saved text is clean). */
export function historyUndo(history: History): History {
  const previous = history.past[history.past.length - 1];
  if (!previous) return history;
  return {
    past: history.past.slice(0, -1),
    present: { ...previous, path: history.present.path },
    future: [history.present, ...history.future],
    lastKey: null,
    lastAt: 0,
  };
}

export function historyRedo(history: History): History {
  const next = history.future[0];
  if (!next) return history;
  return {
    past: [...history.past, history.present],
    present: { ...next, path: history.present.path },
    future: history.future.slice(1),
    lastKey: null,
    lastAt: 0,
  };
}

/** Replaces the present without making an undo step (save marks clean, the path changes). */
export function historyReplace(history: History, present: DocumentState): History {
  return { ...history, present };
}
