// Behaviour of our own file handling, not published values: no source applies.
import { beforeEach, describe, expect, it } from 'vitest';
import { designFromSpice, openText } from '../../src/app/files.ts';
import { isPrintable } from '../../src/core/text/printable.ts';
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

  it('keeps what the import ignored or folded with the design, as the command line reports it', () => {
    const text = [
      '* cell',
      '.subckt inv a y vdd gnd',
      'mp y a vdd vdd pmos w=2u l=0.25u m=2 ad=1p as=1p',
      'mn y a gnd gnd nmos w=1u l=0.25u',
      '.tran 1n 10n',
      '.ends',
    ].join('\n');
    expect(openText(text, 'inv.sp')).toBe(true);
    const notes = store.getState().doc.notes!.split('\n');
    expect(notes[0]).toBe('Imported from inv.sp:');
    expect(notes.some((n) => n.includes('.tran'))).toBe(true);
    expect(notes.some((n) => n.includes('ad, as'))).toBe(true);
    expect(notes.some((n) => n.startsWith('m=') && n.includes('mp'))).toBe(true);
    expect(store.getState().message?.text).toContain('3 notes');
    // m=2 folds two 2 µm devices into one of 4 µm (docs/semantics.md §6).
    expect(store.getState().design.netlist.devices[0]).toMatchObject({ name: 'mp', w: 4 });
    // The notes are saved with the design and go when dismissed, as one undo step.
    expect(store.getState().design.notes).toBe(store.getState().doc.notes);
  });

  it('an import with nothing to say keeps no notes', () => {
    expect(openText(INVERTER_CELL.join('\n'), 'inv.sp')).toBe(true);
    expect(store.getState().doc.notes).toBeUndefined();
  });

  it('refuses a binary file with one readable line, and shows no raw bytes', () => {
    const before = store.getState().doc;
    const bytes = Array.from({ length: 300 }, (_, i) => String.fromCharCode((i * 37 + 11) % 256)).join('');
    expect(openText(`\u0000${bytes}`, 'garbage.sp')).toBe(false);
    const text = store.getState().message!.text;
    expect(text).toContain('garbage.sp: not a text file');
    expect(isPrintable(text)).toBe(true);
    expect(store.getState().doc).toBe(before);
  });

  it('quotes a broken line as a short, printable excerpt', () => {
    expect(openText('{"format": "railwise-design", \u000b "x": 1', 'broken.railwise.json')).toBe(false);
    const text = store.getState().message!.text;
    expect(text).toContain('broken.railwise.json');
    expect(isPrintable(text)).toBe(true);
  });
});
