// Our own persistence of the undo history (docs/semantics.md §8); no published source applies.
import { describe, expect, it } from 'vitest';
import { headlessEditor } from '../editor/headless.ts';
import { setSelection, undo, redo, resetStore } from '../../src/state/store.ts';
import {
  historyFor,
  MAX_STORED_STEPS,
  restoreSessionHistory,
  storedHistory,
  HISTORY_KEY,
} from '../../src/app/sessionHistory.ts';
import { applyDocPatch, docPatch } from '../../src/state/historyPatch.ts';
import type { SheetDocument } from '../../src/state/document.ts';

/**
 * A document as a reload gives it back: the same content, none of the same objects, and keys in
 * another order (the file reader lists them as its schema does).
 */
function reloaded(doc: SheetDocument): SheetDocument {
  const reversedKeys = (v: unknown): unknown =>
    Array.isArray(v)
      ? v.map(reversedKeys)
      : v !== null && typeof v === 'object'
        ? Object.fromEntries(
            Object.entries(v)
              .reverse()
              .map(([k, x]) => [k, reversedKeys(x)]),
          )
        : v;
  return reversedKeys(doc) as SheetDocument;
}

function drawSomething() {
  const ed = headlessEditor();
  ed.key('2');
  ed.click(0, -3);
  ed.key('1');
  ed.click(0, 3);
  ed.key('5');
  ed.click(0, -5);
  ed.drag({ x: 0, y: -1 }, { x: 0, y: 1 });
  setSelection({ parts: ['p1'], wires: [] });
  ed.key('ArrowLeft');
  ed.key('z', { ctrl: true }); // one step left to redo
  return ed;
}

describe('the undo history across a reload', () => {
  it('comes back whole: every undo and redo gives the documents of before the reload', () => {
    const ed = drawSomething();
    const { doc, history } = ed.state();
    const text = storedHistory(doc, history.past, history.future);
    const storage = new Map<string, string>();
    const fake = {
      getItem: (k: string) => storage.get(k) ?? null,
      setItem: (k: string, v: string) => void storage.set(k, v),
    } as Storage;
    fake.setItem(HISTORY_KEY, text);
    resetStore(reloaded(doc));
    expect(restoreSessionHistory(fake)).toBe(true);
    expect(ed.state().history.past).toEqual(history.past);
    expect(ed.state().history.future).toEqual(history.future);
    for (let i = history.past.length - 1; i >= 0; i--) {
      undo();
      expect(ed.state().doc).toEqual(history.past[i]);
    }
    redo();
    expect(ed.state().doc).toEqual(history.past[1] ?? doc);
  });

  it('is not used for another document', () => {
    const ed = drawSomething();
    const { doc, history } = ed.state();
    const text = storedHistory(doc, history.past, history.future);
    const other = { ...doc, name: 'other' };
    expect(historyFor(other, text)).toBeNull();
    // A field left undefined is the same document as one without it (as it reads back from JSON).
    const withUndefined = { ...doc, notes: undefined } as unknown as typeof doc;
    expect(historyFor(withUndefined, text)).not.toBeNull();
    expect(historyFor(doc, 'not json')).toBeNull();
  });

  it('tells documents apart by any value, wherever it sits', () => {
    const ed = drawSomething();
    const { doc, history } = ed.state();
    const text = storedHistory(doc, history.past, history.future);
    const [first, ...rest] = doc.sheet.parts;
    if (first === undefined) throw new Error('the drawing has parts');
    const moved = { ...doc, sheet: { ...doc.sheet, parts: [{ ...first, x: first.x + 1 }, ...rest] } };
    expect(historyFor(moved, text)).toBeNull();
    const swapped = {
      ...doc,
      sheet: { ...doc.sheet, parts: [{ ...first, x: first.y, y: first.x }, ...rest] },
    };
    if (first.x !== first.y) expect(historyFor(swapped, text)).toBeNull();
    const reordered = { ...doc, sheet: { ...doc.sheet, parts: [...rest, first] } };
    expect(historyFor(reordered, text)).toBeNull();
  });

  it('keeps the latest steps within its bound', () => {
    const ed = headlessEditor();
    for (let i = 0; i < MAX_STORED_STEPS + 20; i++) {
      ed.key('9');
      ed.click(3 * i, 0);
    }
    const { doc, history } = ed.state();
    const back = historyFor(doc, storedHistory(doc, history.past, history.future))!;
    expect(back.past).toHaveLength(MAX_STORED_STEPS);
    expect(back.past.at(-1)).toEqual(history.past.at(-1));
  });
});

describe('document patches', () => {
  it('turn one document into another, order and dropped notes included', () => {
    const ed = drawSomething();
    const before = ed.state().doc;
    const to: SheetDocument = {
      ...before,
      name: 'renamed',
      sheet: { parts: [...before.sheet.parts].reverse(), wires: [] },
    };
    expect(applyDocPatch(before, docPatch(before, to))).toEqual(to);
    const noted = { ...before, notes: 'a note' };
    expect(applyDocPatch(noted, docPatch(noted, before))).toEqual(before);
    expect(docPatch(before, before)).toEqual({});
  });
});
