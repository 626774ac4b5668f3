/**
 * Autosave to the browser's storage: the design file text is written shortly after every change
 * and when the page is hidden, so a reload or a crashed tab finds the design as it was.
 * A stored design that cannot be read is kept aside (never overwritten silently) and reported.
 */
import type { Design } from '../core/model/design.ts';
import { parseDesignFile, serializeDesign } from '../core/format/designFile.ts';
import { currentDesign, store } from '../state/store.ts';

export const AUTOSAVE_KEY = 'railwise.autosave.v1';
export const RESCUE_KEY = 'railwise.autosave.unreadable';
const DELAY_MS = 250;

export interface RestoreResult {
  readonly design: Design | null;
  readonly problem: string | null;
}

/** The autosaved design, if any. An unreadable one is moved to RESCUE_KEY and explained. */
export function restoreAutosave(storage: Storage = localStorage): RestoreResult {
  const text = storage.getItem(AUTOSAVE_KEY);
  if (text === null) return { design: null, problem: null };
  try {
    return { design: parseDesignFile(text, 'autosave'), problem: null };
  } catch (e) {
    const detail = e instanceof Error ? e.message : String(e);
    storage.setItem(RESCUE_KEY, text);
    return {
      design: null,
      problem: `The autosaved design could not be read (${detail}); its text is kept under "${RESCUE_KEY}" in this browser's storage.`,
    };
  }
}

/** Starts saving on every document change; returns a function that stops it. */
export function startAutosave(storage: Storage = localStorage): () => void {
  let timer: ReturnType<typeof setTimeout> | null = null;
  let savedRevision = store.getState().revision;
  const write = (): void => {
    timer = null;
    const { revision } = store.getState();
    if (revision === savedRevision) return;
    try {
      storage.setItem(AUTOSAVE_KEY, serializeDesign(currentDesign()));
      savedRevision = revision;
    } catch {
      // Storage full or blocked: keep editing; the next change tries again.
    }
  };
  const unsubscribe = store.subscribe((s, prev) => {
    if (s.revision !== prev.revision && timer === null) timer = setTimeout(write, DELAY_MS);
  });
  const flush = (): void => {
    if (timer !== null) clearTimeout(timer);
    write();
  };
  window.addEventListener('pagehide', flush);
  return () => {
    unsubscribe();
    window.removeEventListener('pagehide', flush);
    flush();
  };
}
