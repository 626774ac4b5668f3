/**
 * The undo history kept across a reload within the same browser session (docs/semantics.md §8): the
 * steps are stored as patches (state/historyPatch.ts) in sessionStorage, written as the design is
 * (about a second after a change, once the page is idle, and as the page goes away), at most
 * MAX_STORED_STEPS of them and MAX_STORED_CHARS of text (the oldest go first). They are tied to the
 * document they lead back from by a fingerprint, so after a reload they are used only if the design
 * restored is that very document.
 */
import type { SheetDocument } from '../state/document.ts';
import { applyDocPatch, docPatch, type DocPatch } from '../state/historyPatch.ts';
import { restoreHistory, store } from '../state/store.ts';
import { afterPause } from './idle.ts';
import { SAVE_AFTER_MS } from './autosave.ts';

export const HISTORY_KEY = 'railwise.history.v1';
export const MAX_STORED_STEPS = 100;
export const MAX_STORED_CHARS = 2_000_000;

interface StoredHistory {
  readonly head: string;
  /** back[i] turns the document after step i back into step i (the last one starts from head). */
  readonly back: readonly DocPatch[];
  /** ahead[j] turns the document before redo step j into it (the first one starts from head). */
  readonly ahead: readonly DocPatch[];
}

/** One FNV-1a step. */
const mixCode = (h: number, code: number): number => Math.imul(h ^ code, 0x01000193);

function mixText(h: number, text: string): number {
  for (let i = 0; i < text.length; i++) h = mixCode(h, text.charCodeAt(i));
  return mixCode(h, 0x1f); // a separator, so "ab","c" and "a","bc" differ
}

const numberBits = new Float64Array(1);
const numberWords = new Uint32Array(numberBits.buffer);
const FNV_START = 0x811c9dc5;

/**
 * The hash of a plain value: arrays in order; an object as the sum of its entries' hashes (each
 * key mixed with its value), so key order never matters and nothing is sorted; a key whose value is
 * undefined is left out, as JSON leaves it out; each kind behind a tag of its own. Loops rather
 * than callbacks and numbers by their bits: a large sheet has tens of thousands of values, and a
 * reload reads them all once.
 */
function hashValue(v: unknown): number {
  switch (typeof v) {
    case 'number':
      numberBits[0] = v;
      return mixCode(mixCode(mixCode(FNV_START, 0x23), numberWords[0]!), numberWords[1]!);
    case 'string':
      return mixText(mixCode(FNV_START, 0x22), v);
    case 'boolean':
      return mixCode(FNV_START, v ? 0x74 : 0x66);
    case 'object': {
      if (v === null) return mixCode(FNV_START, 0x6e);
      if (Array.isArray(v)) {
        let h = mixCode(FNV_START, 0x5b);
        for (const x of v as unknown[]) h = mixCode(h, hashValue(x));
        return h;
      }
      let sum = 0;
      const record = v as Record<string, unknown>;
      for (const key of Object.keys(record)) {
        const value = record[key];
        if (value !== undefined) sum = (sum + mixCode(mixText(FNV_START, key), hashValue(value))) | 0;
      }
      return mixCode(mixCode(FNV_START, 0x7b), sum);
    }
    default:
      return mixText(mixCode(FNV_START, 0x3f), `${typeof v}:${String(v)}`);
  }
}

/**
 * A hash of the document's content: enough to tell whether a design restored from the autosave
 * (whose objects list their keys in another order) is the document the stored steps lead from.
 */
export function fingerprint(doc: SheetDocument): string {
  return (hashValue(doc) >>> 0).toString(16);
}

/** Patches between neighbouring documents, remembered per pair: each step is compared once. */
const patches = new WeakMap<SheetDocument, WeakMap<SheetDocument, DocPatch>>();

function patchBetween(from: SheetDocument, to: SheetDocument): DocPatch {
  let byTarget = patches.get(from);
  if (byTarget === undefined) patches.set(from, (byTarget = new WeakMap()));
  let patch = byTarget.get(to);
  if (patch === undefined) byTarget.set(to, (patch = docPatch(from, to)));
  return patch;
}

/** The stored form of a history, cut to the bounds (oldest steps dropped first). */
export function storedHistory(
  head: SheetDocument,
  past: readonly SheetDocument[],
  future: readonly SheetDocument[],
): string {
  const kept = past.slice(-MAX_STORED_STEPS);
  const back = kept.map((doc, i) => patchBetween(kept[i + 1] ?? head, doc));
  const ahead = future
    .slice(0, MAX_STORED_STEPS)
    .map((doc, j) => patchBetween(j === 0 ? head : future[j - 1]!, doc));
  let text = JSON.stringify({ head: fingerprint(head), back, ahead } satisfies StoredHistory);
  while (text.length > MAX_STORED_CHARS && back.length > 0) {
    back.shift();
    text = JSON.stringify({ head: fingerprint(head), back, ahead } satisfies StoredHistory);
  }
  return text;
}

/** The past and future documents a stored history holds for `head`, or null if it belongs elsewhere. */
export function historyFor(
  head: SheetDocument,
  text: string | null,
): { past: SheetDocument[]; future: SheetDocument[] } | null {
  if (text === null) return null;
  let stored: StoredHistory;
  try {
    stored = JSON.parse(text) as StoredHistory;
  } catch {
    return null;
  }
  if (stored.head !== fingerprint(head) || !Array.isArray(stored.back) || !Array.isArray(stored.ahead))
    return null;
  const past: SheetDocument[] = [];
  let doc = head;
  for (let i = stored.back.length - 1; i >= 0; i--) past.unshift((doc = applyDocPatch(doc, stored.back[i]!)));
  const future: SheetDocument[] = [];
  doc = head;
  for (const patch of stored.ahead) future.push((doc = applyDocPatch(doc, patch)));
  return { past, future };
}

/** After the design is restored: its undo history too, if the session kept one for it. */
export function restoreSessionHistory(storage: Storage = sessionStorage): boolean {
  const found = historyFor(store.getState().doc, storage.getItem(HISTORY_KEY));
  if (found !== null) restoreHistory(found.past, found.future);
  return found !== null;
}

/** Keeps the stored history up to date, written as the autosave is; returns the stop function. */
export function startSessionHistory(storage: Storage = sessionStorage): () => void {
  let cancel: (() => void) | null = null;
  const write = (): void => {
    cancel = null;
    const { doc, history } = store.getState();
    if (history.gestureStart !== null) return;
    try {
      storage.setItem(HISTORY_KEY, storedHistory(doc, history.past, history.future));
    } catch {
      // Storage full or blocked: the history lives on in the page, as before.
    }
  };
  const unsubscribe = store.subscribe((s, prev) => {
    if (s.history !== prev.history && cancel === null) cancel = afterPause(write, SAVE_AFTER_MS);
  });
  // A reload right after an edit: the step is kept as the page goes, as the autosave keeps the design.
  const flush = (): void => {
    if (cancel === null) return;
    cancel();
    write();
  };
  window.addEventListener('pagehide', flush);
  return () => {
    unsubscribe();
    window.removeEventListener('pagehide', flush);
    cancel?.();
  };
}
