import { beforeEach, describe, expect, it } from 'vitest';
import {
  BLANK_DOCUMENT,
  beginGesture,
  cancelGesture,
  commitDoc,
  endGesture,
  previewDoc,
  redo,
  resetStore,
  setSelection,
  setViewport,
  store,
  undo,
} from '../../src/state/store.ts';
import { addPart } from '../../src/core/sheet/edits.ts';
import { HISTORY_LIMIT } from '../../src/state/history.ts';

const addNmos = (x: number) =>
  commitDoc((doc) => ({ ...doc, sheet: addPart(doc.sheet, { kind: 'nmos', at: { x, y: 0 } }) }));

describe('undo history', () => {
  beforeEach(() => resetStore(BLANK_DOCUMENT));

  it('keeps at least 100 steps (docs/semantics.md §8) and undoes them all in order', () => {
    for (let i = 0; i < 120; i++) addNmos(i * 4);
    for (let i = 119; i >= 0; i--) {
      expect(store.getState().doc.sheet.parts).toHaveLength(i + 1);
      expect(undo()).toBe(true);
    }
    expect(store.getState().doc.sheet.parts).toHaveLength(0);
    expect(undo()).toBe(false);
    for (let i = 0; i < 120; i++) redo();
    expect(store.getState().doc.sheet.parts).toHaveLength(120);
  });

  it('drops the oldest steps beyond its limit', () => {
    for (let i = 0; i < HISTORY_LIMIT + 5; i++) addNmos(i * 4);
    expect(store.getState().history.past).toHaveLength(HISTORY_LIMIT);
  });

  it('a new change after undo clears redo', () => {
    addNmos(0);
    addNmos(4);
    undo();
    addNmos(8);
    expect(redo()).toBe(false);
    expect(store.getState().doc.sheet.parts.map((p) => p.x)).toEqual([0, 8]);
  });

  it('a gesture of many previews is one step; cancelling it restores the start', () => {
    addNmos(0);
    const start = store.getState().doc;
    beginGesture();
    for (let x = 1; x <= 5; x++)
      previewDoc({ ...start, sheet: { ...start.sheet, parts: [{ ...start.sheet.parts[0]!, x }] } });
    endGesture();
    expect(store.getState().history.past).toHaveLength(2);
    undo();
    expect(store.getState().doc).toBe(start);
    redo();
    beginGesture();
    previewDoc(start);
    previewDoc({ ...start, name: 'renamed' });
    cancelGesture();
    expect(store.getState().doc.sheet.parts[0]!.x).toBe(5);
    expect(store.getState().history.past).toHaveLength(2);
  });

  it('never records selection or viewport changes, and redo survives them', () => {
    addNmos(0);
    undo();
    setSelection({ parts: ['p1'], wires: [] });
    setViewport({ x: 1, y: 2, scale: 30 });
    expect(store.getState().history.past).toHaveLength(0);
    expect(redo()).toBe(true);
  });

  it('bumps the revision on every document change, so stale results can be dropped', () => {
    const r0 = store.getState().revision;
    addNmos(0);
    undo();
    redo();
    expect(store.getState().revision).toBe(r0 + 3);
    setSelection({ parts: [], wires: [] });
    expect(store.getState().revision).toBe(r0 + 3);
  });

  it('re-derives the design once when a drag ends, not on every frame', () => {
    addNmos(0);
    const r = store.getState().revision;
    const start = store.getState().doc;
    beginGesture();
    for (let x = 1; x <= 3; x++)
      previewDoc({ ...start, sheet: { ...start.sheet, parts: [{ ...start.sheet.parts[0]!, x }] } });
    expect(store.getState().revision).toBe(r);
    expect(store.getState().doc.sheet.parts[0]!.x).toBe(3);
    endGesture();
    expect(store.getState().revision).toBe(r + 1);
    expect(store.getState().design.sheet?.parts[0]!.x).toBe(3);
  });
});
