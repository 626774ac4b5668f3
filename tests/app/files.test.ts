// Behaviour of our own file handling, not published values: no source applies.
import { beforeEach, describe, expect, it } from 'vitest';
import { designFromSpice, openText } from '../../src/app/files.ts';
import { documentFromDesign } from '../../src/state/document.ts';
import { currentDesign, resetStore, store } from '../../src/state/store.ts';
import { STARTERS } from '../../src/core/starters/index.ts';

const INVERTER_CELL = [
  '.subckt inv a y vdd gnd',
  'mp y a vdd vdd pmos w=2u l=0.25u',
  'mn y a gnd gnd nmos w=1u l=0.25u',
  '.ends',
];

describe('opening files', () => {
  beforeEach(() => {
    resetStore(documentFromDesign(STARTERS[0]!.design));
  });

  it('a design file with a bad field is refused with the field named; nothing changes', () => {
    const before = store.getState().doc;
    const text = JSON.stringify({
      format: 'railwise-design',
      version: 1,
      name: 'x',
      netlist: { name: 'x', devices: 'none' },
    });
    expect(openText(text, 'bad.railwise.json')).toBe(false);
    expect(store.getState().doc).toBe(before);
    expect(store.getState().message).toMatchObject({ kind: 'error' });
    expect(store.getState().message!.text).toMatch(/bad\.railwise\.json.*netlist/);
    expect(store.getState().history.past).toHaveLength(0);
  });

  it('a SPICE line it cannot read is refused with file and line', () => {
    const before = store.getState().doc;
    expect(openText(['* cell', ...INVERTER_CELL.slice(1, 3), 'L1 a b 1n'].join('\n'), 'cell.sp')).toBe(false);
    expect(store.getState().doc).toBe(before);
    expect(store.getState().message!.text).toContain('cell.sp:4');
  });

  it('a one-cell netlist opens at once, placed, as one undoable step', () => {
    expect(openText(INVERTER_CELL.join('\n'), 'inv.sp')).toBe(true);
    expect(store.getState().design.netlist.devices.map((d) => d.name)).toEqual(['mp', 'mn']);
    expect(store.getState().history.past).toHaveLength(1);
  });

  it('a library opens as one design of all its cells, the first on the sheet, with the library view', () => {
    const library = [...INVERTER_CELL, ...INVERTER_CELL.map((l) => l.replace('inv', 'inv_b'))].join('\n');
    expect(designFromSpice(library, 'lib.sp').design.cells.map((c) => c.name)).toEqual(['inv', 'inv_b']);
    expect(openText(library, 'lib.sp')).toBe(true);
    expect(currentDesign().cells.map((c) => c.name)).toEqual(['inv', 'inv_b']);
    expect(store.getState().doc.name).toBe('inv');
    expect(store.getState().simulation.libraryView).not.toBeNull();
    expect(store.getState().history.past).toHaveLength(1);
  });
});
