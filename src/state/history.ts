/**
 * Undo history over document snapshots. Documents are immutable and share unchanged parts, so a
 * snapshot costs little more than a diff. A gesture (a drag) remembers where it started: ending it
 * records one step, cancelling it returns to the start. Selection and viewport are never recorded.
 */
import type { SheetDocument } from './document.ts';

/** Comfortably above the 100 steps a session must keep. */
export const HISTORY_LIMIT = 250;

export interface HistoryState {
  readonly past: readonly SheetDocument[];
  readonly future: readonly SheetDocument[];
  /** The document as it was when the running gesture began; null outside a gesture. */
  readonly gestureStart: SheetDocument | null;
}

export const EMPTY_HISTORY: HistoryState = { past: [], future: [], gestureStart: null };

/** Records `before` as an undo step; a new change clears redo. */
export function recordStep(h: HistoryState, before: SheetDocument): HistoryState {
  const past = [...h.past, before];
  return {
    past: past.length > HISTORY_LIMIT ? past.slice(past.length - HISTORY_LIMIT) : past,
    future: [],
    gestureStart: null,
  };
}

export function undoStep(
  h: HistoryState,
  current: SheetDocument,
): { history: HistoryState; doc: SheetDocument } | null {
  const doc = h.past[h.past.length - 1];
  if (!doc) return null;
  return { history: { past: h.past.slice(0, -1), future: [current, ...h.future], gestureStart: null }, doc };
}

export function redoStep(
  h: HistoryState,
  current: SheetDocument,
): { history: HistoryState; doc: SheetDocument } | null {
  const doc = h.future[0];
  if (!doc) return null;
  return { history: { past: [...h.past, current], future: h.future.slice(1), gestureStart: null }, doc };
}
