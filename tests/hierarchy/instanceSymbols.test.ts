/**
 * Instances on the sheet (docs/semantics.md §1, hierarchy; §6 for the drawing carried in SPICE): a
 * symbol generated from the placed cell's pins, wired as any part, drawn for instances a file left
 * undrawn, following a renamed pin, and kept through SPICE export and import. Our own rules: no
 * published source applies.
 */
import { describe, expect, it } from 'vitest';
import { drawInstances, symbolPins } from '../../src/core/hierarchy/instanceParts.ts';
import { renamePin } from '../../src/core/hierarchy/edits.ts';
import { cellsByName } from '../../src/core/hierarchy/cellDesign.ts';
import { pinPositions } from '../../src/core/sheet/geometry.ts';
import { sheetToNetlist } from '../../src/core/sheet/toNetlist.ts';
import { paintLayout } from '../../src/core/view/overlayPaint.ts';
import { instancePins } from '../../src/core/sheet/parts/instance.ts';
import { EMPTY_SHEET } from '../../src/core/sheet/edits.ts';
import { copyItems, pasteClip } from '../../src/core/sheet/clipboard.ts';
import type { SheetPart } from '../../src/core/sheet/types.ts';
import { parseDesignFile, serializeDesign } from '../../src/core/format/designFile.ts';
import { exportSpiceDesign } from '../../src/core/netlist-io/spiceDesignExport.ts';
import { currentDesign, loadDesign, resetStore, store } from '../../src/state/store.ts';
import { designOfSpice } from '../netlist-io/designCarried.ts';
import { bufferDesign, flipFlopDesign } from './cells.ts';

const symbolsOf = (parts: readonly SheetPart[]) => parts.filter((p) => p.kind === 'instance');

describe('an instance symbol', () => {
  it('shows inputs on the left and outputs on the right; rails only when wired elsewhere', () => {
    const latch = flipFlopDesign.cells[0]!.netlist;
    expect(symbolPins(latch)).toEqual({ inputs: latch.inputs, outputs: latch.outputs });
    const rail = latch.rails[0]!.net;
    expect(symbolPins(latch, { [rail]: rail }).inputs).not.toContain(rail);
    expect(symbolPins(latch, { [rail]: 'VDDL' }).inputs).toContain(rail);
  });

  it('is drawn for every instance a cell places, each wired pin given a label of its net', () => {
    const cells = cellsByName(flipFlopDesign);
    const dff = cells.get('dff')!;
    const sheet = drawInstances(EMPTY_SHEET, dff.instances, cells);
    expect(symbolsOf(sheet.parts).map((p) => p.name)).toEqual(dff.instances.map((i) => i.name));
    const derived = sheetToNetlist(sheet, 'dff');
    // The drawing connects each instance exactly as the cell's instances say (rails join by name).
    for (const drawn of derived.instances) {
      const wanted = dff.instances.find((i) => i.name === drawn.name)!;
      const rails = new Set(cells.get(wanted.cell)!.netlist.rails.map((r) => r.net));
      const signal = Object.entries(wanted.pins).filter(([pin]) => !rails.has(pin));
      expect(drawn.pins).toEqual(Object.fromEntries(signal));
    }
    // Every symbol sits clear of the others: no pin of one touches another.
    const leads = symbolsOf(sheet.parts).flatMap((p) => pinPositions(p).map((q) => `${q.x},${q.y}`));
    expect(new Set(leads).size).toBe(leads.length);
  });

  it('shows the level of each pin: a lead and a level mark on the net the pin is wired to', () => {
    resetStore();
    loadDesign(bufferDesign);
    const { doc, geometry } = store.getState();
    const layout = paintLayout(doc.sheet, geometry);
    const marked = new Set(
      layout.marks.map((m) => `${Math.round(m.x - 0.2)},${Math.round(m.y - 0.25)}:${layout.nets[m.net]}`),
    );
    for (const symbol of symbolsOf(doc.sheet.parts))
      for (const lead of pinPositions(symbol)) {
        const net = geometry.pinNets.get(`${symbol.id}.${lead.pin}`)!;
        expect(marked.has(`${lead.x},${lead.y}:${net}`)).toBe(true);
      }
    // The first inverter's output and the second's input are one net, mid.
    const [x1, x2] = store.getState().openCell.instances;
    expect(x1!.pins['Y']).toBe(x2!.pins['A']);
  });

  it('pasted, is a new instance of the same cell under the next free name', () => {
    resetStore();
    loadDesign(bufferDesign);
    const { sheet } = store.getState().doc;
    const first = symbolsOf(sheet.parts)[0]!;
    const pasted = pasteClip(sheet, copyItems(sheet, { parts: [first.id], wires: [] }), 0, 30).sheet;
    const names = symbolsOf(pasted.parts).map((p) => p.name);
    expect(new Set(names).size).toBe(names.length);
    expect(sheetToNetlist(pasted).instances.map((i) => i.cell)).toEqual(['inv', 'inv', 'inv']);
  });

  it('follows a renamed pin of its cell on every sheet that draws it', () => {
    resetStore();
    loadDesign(bufferDesign);
    const drawn = currentDesign();
    const renamed = renamePin(drawn, 'inv', 'A', 'IN');
    const buf = renamed.cells.find((c) => c.name === 'buf')!;
    for (const symbol of symbolsOf(buf.sheet!.parts))
      expect(instancePins(symbol as Parameters<typeof instancePins>[0]).inputs).toEqual(['IN']);
    // The wiring stays: the lead that was A is IN, on the same net.
    const before = sheetToNetlist(drawn.cells.find((c) => c.name === 'buf')!.sheet!).instances;
    const after = sheetToNetlist(buf.sheet!).instances;
    expect(after.map((i) => i.pins['IN'])).toEqual(before.map((i) => i.pins['A']));
  });

  it('is saved in the design file and read back as drawn', () => {
    resetStore();
    loadDesign(bufferDesign);
    const design = currentDesign();
    const back = parseDesignFile(serializeDesign(design), 'buffer.railwise.json');
    expect(back.cells.find((c) => c.name === 'buf')!.sheet).toEqual(
      design.cells.find((c) => c.name === 'buf')!.sheet,
    );
  });

  it('reads back from the SPICE export as drawn, and the cell computes the same', () => {
    resetStore();
    loadDesign(flipFlopDesign);
    const design = currentDesign();
    const text = exportSpiceDesign(design);
    expect(text).toMatch(/\* railwise: sheet-part \S+ instance /);
    const back = designOfSpice(text);
    if ('failure' in back) throw new Error(back.failure);
    const dff = (d: typeof design) => d.cells.find((c) => c.name === 'dff')!;
    expect(dff(back).sheet).toEqual(dff(design).sheet);
    expect(sheetToNetlist(dff(back).sheet!).instances).toEqual(sheetToNetlist(dff(design).sheet!).instances);
    loadDesign(back);
    expect(store.getState().design.netlist).toEqual(
      (resetStore(), loadDesign(design), store.getState().design.netlist),
    );
  });
});
