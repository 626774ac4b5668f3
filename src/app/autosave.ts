/**
 * Autosave to the browser's storage: the design file text is written about a second after every
 * change and when the page is hidden, so a reload or a crashed tab finds the design as it was.
 * A stored design that cannot be read is kept aside (never overwritten silently) and reported.
 *
 * A design that cannot be opened must never be saved over the last good one, or every reload
 * fails again. So opening a design (the autosaved one at start-up, one from a shared link) leaves
 * a mark in storage (`beginOpening`) that is cleared only once the page has shown it and is still
 * answering (`openingDone`); while the mark stands nothing is written. A mark found at start-up
 * means the last opening never finished (the tab froze or crashed): the autosaved design is then
 * set aside and the designer is offered to open it anyway or discard it (`RecoveryOffer`).
 *
 * Saving never holds up the page: it runs when the page is idle (`afterPause`), and a long design
 * (a few thousand transistors) is stored gzip-compressed (`storedText.ts`), compressed and expanded
 * off the page's thread; a packed value is expanded before it is read (`autosavedText`).
 */
import { createStore } from 'zustand/vanilla';
import { useStore as useZustand } from 'zustand';
import type { Design } from '../core/document/design.ts';
import { parseDesignFile, serializeDesign } from '../core/format/designFile.ts';
import { currentDesign, store } from '../state/store.ts';
import { afterPause } from './idle.ts';
import { isPacked, PACK_ABOVE, packForStorage, unpackFromStorage } from './storedText.ts';

export const AUTOSAVE_KEY = 'railwise.autosave.v1';
export const RESCUE_KEY = 'railwise.autosave.unreadable';
/** The autosaved design whose opening never finished, set aside until the designer decides. */
export const SUSPECT_KEY = 'railwise.autosave.unopened';
/** Present while a design is being opened. */
export const OPENING_KEY = 'railwise.opening';
const DELAY_MS = 250;
/** A change is written this long after it, once the page is idle: after the check it started. */
export const SAVE_AFTER_MS = 1000;
/** At most this long after that, the page idle or not. */
const IDLE_WITHIN_MS = 1000;

export interface RestoreResult {
  readonly design: Design | null;
  readonly problem: string | null;
  /** The token of the opening mark left for this design, to clear once it is shown. */
  readonly opening?: number;
}

interface Opening {
  readonly what: 'autosave' | 'link';
  readonly name: string;
  readonly token: number;
}

/** Set when the page itself failed (a rendering fault): nothing is saved for the rest of the session. */
let failed = false;

function readOpening(storage: Storage): Opening | null {
  try {
    const value: unknown = JSON.parse(storage.getItem(OPENING_KEY) ?? 'null');
    return typeof value === 'object' && value !== null ? (value as Opening) : null;
  } catch {
    return null;
  }
}

/** Marks a design as being opened; returns the token that `openingDone` takes. */
export function beginOpening(what: Opening['what'], name: string, storage: Storage = localStorage): number {
  const token = Date.now() + Math.random();
  try {
    storage.setItem(OPENING_KEY, JSON.stringify({ what, name, token }));
  } catch {
    // Storage blocked: nothing can be saved anyway.
  }
  return token;
}

/** The design the token marked has been shown and the page still answers: saving may resume. */
export function openingDone(token?: number, storage: Storage = localStorage): void {
  if (failed) return;
  const opening = readOpening(storage);
  if (opening !== null && (token === undefined || opening.token === token)) storage.removeItem(OPENING_KEY);
}

/** The page failed to show its design: keep the mark and save nothing more this session. */
export function openingFailed(): void {
  failed = true;
}

/** Calls `done` once the page has drawn and stayed responsive a moment (a frozen page never gets there). */
export function whenShown(done: () => void): void {
  requestAnimationFrame(() => setTimeout(done, 1000));
}

/** A design set aside because its opening never finished: what the recovery offer shows. */
export interface Suspect {
  readonly name: string;
  readonly what: Opening['what'];
}

export const recovery = createStore<{ suspect: Suspect | null }>()(() => ({ suspect: null }));

export function useRecovery(): Suspect | null {
  return useZustand(recovery, (s) => s.suspect);
}

/** A stored value's design text (expanded when packed); null when it cannot be expanded. */
export async function storedDesignText(stored: string | null): Promise<string | null> {
  if (stored === null || !isPacked(stored)) return stored;
  try {
    return await unpackFromStorage(stored);
  } catch {
    return null;
  }
}

/** The autosaved design's text, expanded: what `restoreAutosave` reads. */
export function autosavedText(storage: Storage = localStorage): Promise<string | null> {
  return storedDesignText(storage.getItem(AUTOSAVE_KEY));
}

/**
 * The autosaved design, if any. An unreadable one is moved to RESCUE_KEY and explained. When the
 * last start did not finish opening it, it is moved to SUSPECT_KEY and offered instead of opened.
 * `readable` is its text as `autosavedText` expanded it (the stored text itself by default); the
 * copies set aside are of the value as stored.
 */
export function restoreAutosave(
  storage: Storage = localStorage,
  readable: string | null = storage.getItem(AUTOSAVE_KEY),
): RestoreResult {
  const unfinished = readOpening(storage);
  storage.removeItem(OPENING_KEY);
  const text = storage.getItem(AUTOSAVE_KEY);
  if (unfinished !== null && unfinished.what === 'autosave' && text !== null) {
    storage.setItem(SUSPECT_KEY, text);
    storage.removeItem(AUTOSAVE_KEY);
    recovery.setState({ suspect: { name: unfinished.name, what: 'autosave' } });
    return { design: null, problem: null };
  }
  const linkNote =
    unfinished?.what === 'link'
      ? `The shared link "${unfinished.name}" did not finish opening last time; it was not saved. `
      : '';
  if (text === null) return { design: null, problem: linkNote === '' ? null : linkNote.trim() };
  try {
    if (readable === null) throw new Error('its compressed text is damaged');
    const design = parseDesignFile(readable, 'autosave');
    const opening = beginOpening('autosave', design.name, storage);
    return { design, problem: linkNote === '' ? null : `${linkNote}Your own design is shown.`, opening };
  } catch (e) {
    const detail = e instanceof Error ? e.message : String(e);
    storage.setItem(RESCUE_KEY, text);
    return {
      design: null,
      problem: `${linkNote}The autosaved design could not be read (${detail}); its text is kept under "${RESCUE_KEY}" in this browser's storage.`,
    };
  }
}

/** An autosaved design that was read but could not be shown: kept under RESCUE_KEY, mark cleared. */
export function keepAside(storage: Storage = localStorage): void {
  const text = storage.getItem(AUTOSAVE_KEY);
  if (text !== null) storage.setItem(RESCUE_KEY, text);
  storage.removeItem(OPENING_KEY);
}

/** The set-aside design, read again for "open it anyway"; null when it is gone or unreadable. */
export async function suspectDesign(storage: Storage = localStorage): Promise<Design | null> {
  const text = await storedDesignText(storage.getItem(SUSPECT_KEY));
  if (text === null) return null;
  try {
    return parseDesignFile(text, 'autosave');
  } catch {
    return null;
  }
}

/** Ends the offer. A discarded design's text is kept under RESCUE_KEY, so nothing is lost. */
export function settleSuspect(outcome: 'opened' | 'discarded', storage: Storage = localStorage): void {
  const text = storage.getItem(SUSPECT_KEY);
  if (text !== null && outcome === 'discarded') storage.setItem(RESCUE_KEY, text);
  storage.removeItem(SUSPECT_KEY);
  recovery.setState({ suspect: null });
}

/** The text the autosave keeps of a design: the design file without whitespace. */
export function autosaveText(design: Design): string {
  return serializeDesign(design, 'compact');
}

/** Stores a design's text; false when the storage refused it (full or blocked). */
function keepText(storage: Storage, text: string): boolean {
  try {
    storage.setItem(AUTOSAVE_KEY, text);
    return true;
  } catch {
    return false;
  }
}

/** Starts saving on every document change; returns a function that stops it. */
export function startAutosave(storage: Storage = localStorage): () => void {
  let cancel: (() => void) | null = null;
  let savedRevision = store.getState().revision;
  /** `now`: the page is going away, so a long text is stored as it is rather than packed later. */
  const write = (now = false): void => {
    cancel = null;
    const { revision } = store.getState();
    if (revision === savedRevision || failed) return;
    // A design still being opened is not written yet: try again shortly.
    if (readOpening(storage) !== null && !now) return void (cancel = later(DELAY_MS));
    // Every cell of the design, the open one as edited.
    const text = autosaveText(currentDesign());
    if (text.length <= PACK_ABOVE || now) {
      // Storage full or blocked: keep editing; the next change tries again.
      if (keepText(storage, text)) savedRevision = revision;
      return;
    }
    void packForStorage(text).then((packed) => {
      if (!failed && revision > savedRevision && keepText(storage, packed)) savedRevision = revision;
    });
  };
  const later = (ms: number): (() => void) => afterPause(() => write(), ms, IDLE_WITHIN_MS);
  const unsubscribe = store.subscribe((s, prev) => {
    if (s.revision !== prev.revision && cancel === null) cancel = later(SAVE_AFTER_MS);
  });
  const flush = (): void => {
    cancel?.();
    write(true);
  };
  // A page that can still run this is not frozen: whatever it was opening, it opened.
  const hide = (): void => {
    openingDone(undefined, storage);
    flush();
  };
  window.addEventListener('pagehide', hide);
  return () => {
    unsubscribe();
    window.removeEventListener('pagehide', hide);
    flush();
  };
}
