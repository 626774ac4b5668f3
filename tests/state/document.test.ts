import { describe, expect, it } from 'vitest';
import { deriveDesign, documentFromDesign } from '../../src/state/document.ts';
import { designOfDocument } from '../../src/state/documentCells.ts';
import { cellDesign } from '../../src/core/hierarchy/cellDesign.ts';
import { parseDesignFile, serializeDesign } from '../../src/core/format/designFile.ts';
import { STARTERS } from '../../src/core/starters/index.ts';
import { resetStore, selectDevices, selectNets, store } from '../../src/state/store.ts';
import { AUTOSAVE_KEY, RESCUE_KEY, openingDone, restoreAutosave } from '../../src/app/autosave.ts';
import { memoryStorage } from '../memoryStorage.ts';

describe('the document and its derived design', () => {
  const nand2 = STARTERS.find((s) => s.id === 'nand2')!.design;

  it('places a netlist-only design and derives the same netlist back', () => {
    const doc = documentFromDesign(nand2);
    expect(doc.sheet.parts.length).toBeGreaterThan(4);
    expect(deriveDesign(doc).design.netlist).toEqual(nand2.netlist);
  });

  it('survives saving to a design file and reading it back, drawing included', () => {
    const doc = documentFromDesign(nand2);
    const { design, openCell } = deriveDesign(doc);
    const again = parseDesignFile(serializeDesign(designOfDocument(doc, openCell)), 'nand2.railwise.json');
    expect(cellDesign(again).sheet).toEqual(design.sheet);
    expect(deriveDesign(documentFromDesign(again)).design.netlist).toEqual(design.netlist);
  });

  it('restores an autosaved design, and keeps an unreadable one aside with a reason', () => {
    const storage = memoryStorage();
    expect(restoreAutosave(storage)).toEqual({ design: null, problem: null });
    const doc = documentFromDesign(nand2);
    const { design, openCell } = deriveDesign(doc);
    storage.setItem(AUTOSAVE_KEY, serializeDesign(designOfDocument(doc, openCell)));
    const restored = restoreAutosave(storage);
    expect(restored.design?.cells[0]?.sheet).toEqual(design.sheet);
    openingDone(restored.opening, storage); // the page showed it: the next start is a fresh one
    storage.setItem(AUTOSAVE_KEY, '{"format": "railwise-design", "version": 1, "name": 3');
    const bad = restoreAutosave(storage);
    expect(bad.design).toBeNull();
    expect(bad.problem).toMatch(/autosave/);
    expect(storage.getItem(RESCUE_KEY)).toContain('"name": 3');
  });

  it('selects devices and nets by name for the panels', () => {
    resetStore(documentFromDesign(nand2));
    const { geometry } = store.getState();
    selectDevices(['NA']);
    expect(store.getState().selection.selected.parts).toEqual([geometry.deviceParts['NA']]);
    selectNets(['Y']);
    const wires = store.getState().selection.selected.wires;
    expect(wires.length).toBeGreaterThan(0);
    expect(wires.every((w) => geometry.wireNets[w] === 'Y')).toBe(true);
  });
});
