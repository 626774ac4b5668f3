/**
 * Design files of several cells (version 2) and the migration from version 1: old files open as a
 * design of one cell, and every problem of the hierarchy is refused naming the field and the cells.
 * Behaviour of our own format (docs/semantics.md §1, hierarchy); no published values apply.
 *
 * Sources: none apply beyond the format's own rules; the example latch's function is its truth table
 * (common practice, no source).
 */
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { designFileError } from './refusal.ts';
import type { DesignFileError } from '../../src/core/format/designFile.ts';
import { parseDesignFile, serializeDesign } from '../../src/core/format/designFile.ts';
import type { Cell, Design } from '../../src/core/document/design.ts';
import { DEFAULT_TECHNOLOGY } from '../../src/core/model/technology.ts';
import { inverter } from '../cells.ts';

function errorOf(text: string): DesignFileError {
  return designFileError(text, 'tide.railwise.json');
}

const inv: Cell = {
  name: 'inv',
  netlist: { ...inverter, name: 'inv' },
  instances: [],
  expectations: {},
  sequences: [],
};
const buffer: Cell = {
  name: 'buf',
  netlist: { name: 'buf', devices: [], rails: [], inputs: ['A'], outputs: ['Y'] },
  instances: [
    { name: 'X1', cell: 'inv', pins: { A: 'A', Y: 'mid' } },
    { name: 'X2', cell: 'inv', pins: { A: 'mid', Y: 'Y' } },
  ],
  expectations: { Y: 'A' },
  sequences: [],
};
const design: Design = {
  name: 'Tide buffers',
  technology: DEFAULT_TECHNOLOGY,
  cells: [inv, buffer],
  open: 'buf',
};

function withCells(cells: readonly Cell[], open = 'buf'): string {
  return serializeDesign({ ...design, cells, open });
}

describe('version 1 files', () => {
  it('open as a design of one cell, named as its netlist, under the design name', () => {
    const file = 'public/examples/beacon-sr-latch.railwise.json';
    const text = readFileSync(file, 'utf8');
    expect(text).toContain('"version": 1');
    const d = parseDesignFile(text, file);
    expect(d.name).toBe('Beacon SR latch');
    expect(d.cells.map((c) => c.name)).toEqual(['beacon_sr_latch']);
    expect(d.open).toBe('beacon_sr_latch');
    expect(d.cells[0]?.instances).toEqual([]);
    expect(d.cells[0]?.sequences.length).toBeGreaterThan(0);
  });

  it('name a bad field as the version 1 file spells it', () => {
    const old = JSON.parse(readFileSync('public/examples/lamp-inverter.railwise.json', 'utf8'));
    old.netlist.devices[0].w = -2;
    const e = errorOf(JSON.stringify(old));
    expect(e.field).toBe('netlist.devices[0].w');
  });
});

describe('version 2 files', () => {
  it('keep every cell and its instances through a save and a read', () => {
    expect(parseDesignFile(serializeDesign(design), 'x')).toEqual(design);
  });

  it('refuse two cells of one name, naming the second', () => {
    expect(errorOf(withCells([inv, inv, buffer])).field).toBe('cells[1].name');
  });

  it('refuse an instance of a cell the design does not have', () => {
    const stray = { ...buffer, instances: [{ name: 'X9', cell: 'nand9', pins: {} }] };
    const e = errorOf(withCells([inv, stray]));
    expect(e.field).toBe('cells[1].instances[0].cell');
    expect(e.message).toMatch(/X9 places nand9/);
  });

  it('refuse an open cell that does not exist', () => {
    expect(errorOf(withCells([inv, buffer], 'latch')).field).toBe('open');
  });

  it('refuse a cell that places itself through another, naming the loop', () => {
    const a: Cell = { ...inv, name: 'a', instances: [{ name: 'XB', cell: 'b', pins: {} }] };
    const b: Cell = { ...inv, name: 'b', instances: [{ name: 'XA', cell: 'a', pins: {} }] };
    const e = errorOf(withCells([a, b], 'a'));
    expect(e.field).toBe('cells[0].instances');
    expect(e.message).toMatch(/cell a instantiates itself \(a → b → a\)/);
  });
});
