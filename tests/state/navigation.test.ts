/**
 * Descending into instances (docs/semantics.md §1, hierarchy): the sheet shows the placed cell while
 * the top cell stays analysed, its nets named as the top cell names them; a path goes back up; a
 * hierarchical name takes the sheet to its cell; an edit inside reaches every instance.
 */
import { beforeEach, describe, expect, it } from 'vitest';
import { ascendTo, descendInto, goToName, openCellOnSheet, sheetPath } from '../../src/state/navigation.ts';
import {
  commitDoc,
  currentDesign,
  loadDesign,
  resetStore,
  setDesignFields,
  store,
  undo,
} from '../../src/state/store.ts';
import { flipFlopDesign } from '../hierarchy/cells.ts';
import { addCell, placeInstance } from '../../src/state/cells.ts';
import { pickFinding } from '../../src/panels/pick.ts';
import type { Finding } from '../../src/core/analysis/report.ts';
import { pinPositions } from '../../src/core/sheet/geometry.ts';
import { makeSheetPart } from '../../src/core/sheet/parts/index.ts';

const nets = () => new Set(Object.values(store.getState().geometry.wireNets));

describe('descending into an instance', () => {
  beforeEach(() => {
    resetStore();
    loadDesign(flipFlopDesign);
  });

  it('shows the placed cell, analyses the top one, and names the nets as the top cell does', () => {
    const devices = store.getState().design.netlist.devices.length;
    expect(descendInto('XS')).toBe(true);
    const s = store.getState();
    expect(s.doc.name).toBe('tg_d_latch');
    expect(s.design.name).toBe('dff');
    expect(s.design.netlist.devices).toHaveLength(devices);
    // The slave latch's D is wired to M and its CLK to CLK; its storage node is its own.
    expect(nets().has('M')).toBe(true);
    expect(nets().has('XS.n1')).toBe(true);
    expect(nets().has('D')).toBe(false);
    expect(s.geometry.deviceParts['XS.NT1']).toBeDefined();
    expect(sheetPath()).toEqual([
      { instance: null, cell: 'dff' },
      { instance: 'XS', cell: 'tg_d_latch' },
    ]);
  });

  it('goes back up the path, with no undo step either way', () => {
    const past = store.getState().history.past.length;
    descendInto('XM');
    expect(ascendTo(0)).toBe(true);
    expect(store.getState().doc.name).toBe('dff');
    expect(store.getState().doc.context).toBeUndefined();
    expect(sheetPath()).toHaveLength(1);
    expect(store.getState().history.past).toHaveLength(past);
  });

  it('takes the sheet to where a hierarchical name lives', () => {
    expect(goToName('XM.NT1')).toBe(true);
    expect(store.getState().doc.context).toEqual({ top: 'dff', instances: ['XM'] });
    expect(goToName('XM.NT1')).toBe(false); // already here
    expect(goToName('CLKN')).toBe(true); // back up to the top cell
    expect(store.getState().doc.name).toBe('dff');
    expect(goToName('XQ.nowhere')).toBe(false);
  });

  it('a click on a finding inside an instance descends to it and selects the device there', () => {
    const finding: Finding = {
      kind: 'floating',
      severity: 'warning',
      vector: 0,
      nets: ['XS.n1'],
      devices: ['XS.NT1'],
      path: null,
      message: 'for the test',
    };
    pickFinding(finding);
    expect(store.getState().doc.context).toEqual({ top: 'dff', instances: ['XS'] });
    expect(store.getState().doc.name).toBe('tg_d_latch');
    // Inside, the device is drawn under its own name and named as the top cell names it.
    const part = store.getState().geometry.deviceParts['XS.NT1'];
    expect(part).toBeDefined();
    expect(store.getState().selection.selected.parts).toContain(part);
  });

  it('an edit inside reaches every instance of the cell, and undo takes it back', () => {
    descendInto('XS');
    const widthOf = (name: string) => {
      const d = store.getState().design.netlist.devices.find((x) => x.name === name);
      return d !== undefined && 'w' in d ? d.w : null;
    };
    commitDoc((doc) => ({
      ...doc,
      sheet: {
        ...doc.sheet,
        parts: doc.sheet.parts.map((p) => (p.kind === 'nmos' && p.name === 'NT1' ? { ...p, w: 3 } : p)),
      },
    }));
    expect(widthOf('XS.NT1')).toBe(3);
    expect(widthOf('XM.NT1')).toBe(3);
    ascendTo(0);
    expect(widthOf('XM.NT1')).toBe(3);
    undo();
    expect(widthOf('XM.NT1')).toBe(0.5);
  });

  it('puts expected functions set while descended on the top cell, which is the one analysed', () => {
    descendInto('XS');
    setDesignFields({ expectations: { Q: 'D' } });
    expect(store.getState().design.expectations).toEqual({ Q: 'D' });
    expect(currentDesign().cells.find((c) => c.name === 'dff')?.expectations).toEqual({ Q: 'D' });
    expect(currentDesign().cells.find((c) => c.name === 'tg_d_latch')?.expectations).toEqual({});
  });

  it('opening a cell on its own leaves any instance it was seen in', () => {
    descendInto('XS');
    expect(openCellOnSheet('tg_d_latch')).toBe(true);
    expect(store.getState().doc.context).toBeUndefined();
    expect(store.getState().design.name).toBe('tg_d_latch');
  });
});

describe('adding to the hierarchy', () => {
  beforeEach(() => {
    resetStore();
    loadDesign(flipFlopDesign);
  });

  it('a new cell joins the design and opens; a cell placed in it is a symbol wired as any part', () => {
    const name = addCell();
    expect(store.getState().doc.name).toBe(name);
    expect(currentDesign().cells.map((c) => c.name)).toEqual(['tg_d_latch', 'dff', name]);
    const x = placeInstance('dff');
    expect(x).toEqual({ name: 'X1', cell: 'dff', pins: {} });
    // The symbol: inputs D and CLK on the left, the output Q on the right; rails not drawn.
    const symbol = store.getState().doc.sheet.parts.find((p) => p.kind === 'instance')!;
    const leads = pinPositions(symbol).map((p) => [p.pin, p.x - symbol.x, p.y - symbol.y]);
    expect(leads).toEqual([
      ['D', 0, 0],
      ['CLK', 0, 2],
      ['Q', 8, 0],
    ]);
    expect(store.getState().design.netlist.devices.some((d) => d.name === 'X1.XM.NT1')).toBe(true);
    // Pins on its leads wire it, as for any part.
    commitDoc((doc) => ({
      ...doc,
      sheet: {
        ...doc.sheet,
        parts: [
          ...doc.sheet.parts,
          ...leads.map(([pin, dx, dy], k) =>
            makeSheetPart(pin === 'Q' ? 'output' : 'input', {
              id: `pin${k}`,
              name: pin === 'D' ? 'data' : String(pin),
              x: symbol.x + Number(dx),
              y: symbol.y + Number(dy),
              rotation: pin === 'Q' ? 0 : 2,
              mirror: false,
            }),
          ),
        ],
      },
    }));
    expect(store.getState().openCell.instances).toEqual([
      { name: 'X1', cell: 'dff', pins: { D: 'data', CLK: 'CLK', Q: 'Q' } },
    ]);
    expect(store.getState().design.netlist.inputs).toEqual(['data', 'CLK']);
    expect(descendInto('X1')).toBe(true);
    expect(descendInto('XS')).toBe(true);
    expect(sheetPath().map((p) => p.cell)).toEqual([name, 'dff', 'tg_d_latch']);
    expect(ascendTo(0)).toBe(true);
    undo();
    undo();
    expect(store.getState().openCell.instances).toEqual([]);
  });

  it('refuses a placement that would make a cell place itself, naming the loop', () => {
    openCellOnSheet('tg_d_latch');
    expect(placeInstance('dff')).toBeNull();
    expect(store.getState().message?.text).toMatch(/tg_d_latch → dff → tg_d_latch|instantiates itself/);
    expect(placeInstance('tg_d_latch')).toBeNull();
  });
});

describe('cell names stay unique', () => {
  it('renaming the open cell to the name of another cell is refused, and nothing changes', () => {
    resetStore();
    loadDesign(flipFlopDesign);
    const before = store.getState().doc;
    commitDoc((doc) => ({ ...doc, name: 'tg_d_latch' }));
    expect(store.getState().doc).toBe(before);
    expect(store.getState().message?.text).toMatch(/already|Another cell/);
  });
});
