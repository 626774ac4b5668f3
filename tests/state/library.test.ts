/**
 * The library view's state: a design of several cells checked cell by cell in the library lane,
 * the table sorted and filtered by status, a cell opened onto the sheet without an undo step, and
 * the results checked again after an edit. Hand-checkable cells: a NAND2, the same NAND2 with a
 * pull-up missing (Y floats for A = 1, B = 0), and a buffer of two inverter instances.
 */
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { checkLibraryCell } from '../../src/core/analysis/libraryCheck.ts';
import { designOfCell } from '../../src/core/hierarchy/cellDesign.ts';
import type { Design } from '../../src/core/document/design.ts';
import { libraryTableRows, resultText, functionLines } from '../../src/core/view/libraryTable.ts';
import { followLibrary, openLibraryView, setLibraryView, sortLibraryBy } from '../../src/state/library.ts';
import { commitDoc, currentDesign, loadDesign, resetStore, store, undo } from '../../src/state/store.ts';
import { runJob } from '../../src/worker/runJob.ts';
import { openCellOnSheet } from '../../src/state/navigation.ts';
import { setJobRunnerFactory } from '../../src/worker/runner.ts';
import { design, nand2, nand2MissingPullUp } from '../cells.ts';
import { buffer, cell } from '../hierarchy/cells.ts';
import { inverter } from '../cells.ts';

const tide: Design = {
  ...designOfCell(design(nand2, { Y: '!(A & B)' })),
  name: 'tide',
  cells: [cell(nand2, [], { Y: '!(A & B)' }), cell(nand2MissingPullUp), cell(inverter), buffer],
};

describe('one row per cell', () => {
  it('passes the NAND2 against its expected function', () => {
    const row = checkLibraryCell(tide, 'nand2');
    expect(row).toMatchObject({ status: 'pass', transistors: 4, inputs: ['A', 'B'], outputs: ['Y'] });
    expect(functionLines(row)).toEqual([{ text: 'Y = !(A & B)', found: false }]);
  });

  it('fails the NAND2 with a missing pull-up and reads its function with the floating vector undecided', () => {
    const row = checkLibraryCell(tide, 'nand2_broken');
    expect(row.status).toBe('fail');
    expect(row.kinds.floating).toBeGreaterThan(0);
    // Y floats (Z) for A = 1, B = 0, so the found function says where it is driven.
    expect(row.found[0]?.expression).toMatch(/\? .* : Z$/);
    expect(resultText(row)).toMatch(/^fail · \d+ errors? \(.*floating/);
  });

  it('flattens a cell of instances and reads its function: two inverters compute Y = A', () => {
    const row = checkLibraryCell(tide, 'buf');
    expect(row).toMatchObject({ status: 'pass', transistors: 4, instances: 2 });
    expect(functionLines(row)).toEqual([{ text: 'Y = A', found: true }]);
  });

  it('sorts worst first by status and filters by it', () => {
    const rows = tide.cells.map((c) => checkLibraryCell(tide, c.name));
    const sorted = libraryTableRows(rows, { sort: 'status', direction: 'ascending', filter: 'all' });
    expect(sorted[0]?.cell).toBe('nand2_broken');
    const failing = libraryTableRows(rows, { sort: 'cell', direction: 'ascending', filter: 'failing' });
    expect(failing.map((r) => r.cell)).toEqual(['nand2_broken']);
  });
});

describe('the library view in the store', () => {
  beforeEach(() => {
    setJobRunnerFactory(() => ({ run: (job) => Promise.resolve(runJob(job)), cancel: () => {} }));
    resetStore();
    loadDesign(tide);
  });
  afterEach(() => vi.useRealTimers());

  it('checks every cell in the library lane when opened', async () => {
    openLibraryView();
    await vi.waitFor(() => expect(store.getState().simulation.library.status).toBe('done'));
    expect(store.getState().simulation.library.result?.rows.map((r) => r.cell)).toEqual([
      'nand2',
      'nand2_broken',
      'inv',
      'buf',
    ]);
    sortLibraryBy('transistors');
    expect(store.getState().simulation.libraryView?.sort).toBe('transistors');
    sortLibraryBy('transistors');
    expect(store.getState().simulation.libraryView?.direction).toBe('descending');
    setLibraryView({ filter: 'failing' });
    expect(store.getState().simulation.libraryView?.filter).toBe('failing');
  });

  it('opens a cell onto the sheet without an undo step, keeping every cell', () => {
    const past = store.getState().history.past.length;
    expect(openCellOnSheet('buf')).toBe(true);
    expect(store.getState().doc.name).toBe('buf');
    expect(store.getState().design.netlist.devices.map((d) => d.name)).toEqual([
      'X1.P1',
      'X1.N1',
      'X2.P1',
      'X2.N1',
    ]);
    expect(store.getState().history.past).toHaveLength(past);
    expect(currentDesign().cells.map((c) => c.name)).toEqual(['nand2', 'nand2_broken', 'inv', 'buf']);
    expect(openCellOnSheet('nowhere')).toBe(false);
  });

  it('keeps an edit made in one cell when another is opened, and undo goes back to it', () => {
    openCellOnSheet('inv');
    commitDoc((doc) => ({ ...doc, expectations: { Y: '!A' } }));
    openCellOnSheet('nand2');
    expect(currentDesign().cells.find((c) => c.name === 'inv')?.expectations).toEqual({ Y: '!A' });
    undo();
    expect(store.getState().doc.name).toBe('inv');
    expect(store.getState().doc.expectations).toEqual({});
  });

  it('renaming a pin or the open cell on the sheet renames it in every instance, in one undo step', () => {
    openCellOnSheet('inv');
    const renamePart = (from: string, to: string) =>
      commitDoc((doc) => ({
        ...doc,
        sheet: {
          ...doc.sheet,
          parts: doc.sheet.parts.map((p) => (p.kind === 'input' && p.name === from ? { ...p, name: to } : p)),
        },
      }));
    renamePart('A', 'IN');
    commitDoc((doc) => ({ ...doc, name: 'tide_inv' }));
    const buf = currentDesign().cells.find((c) => c.name === 'buf');
    expect(buf?.instances.map((i) => [i.cell, Object.keys(i.pins).sort()])).toEqual([
      ['tide_inv', ['IN', 'Y']],
      ['tide_inv', ['IN', 'Y']],
    ]);
    openCellOnSheet('buf');
    expect(store.getState().issues).toEqual([]);
    expect(store.getState().design.netlist.devices).toHaveLength(4);
    undo();
    undo();
    expect(currentDesign().cells.find((c) => c.name === 'buf')?.instances[0]?.cell).toBe('inv');
  });

  it('checks the library again after an edit while the view is open', async () => {
    const stop = followLibrary();
    openLibraryView();
    await vi.waitFor(() => expect(store.getState().simulation.library.status).toBe('done'));
    const before = store.getState().simulation.library.result;
    commitDoc((doc) => ({ ...doc, expectations: { Y: 'A & B' } }));
    await vi.waitFor(() => expect(store.getState().simulation.library.result).not.toBe(before));
    await vi.waitFor(() => expect(store.getState().simulation.library.status).toBe('done'));
    const row = store.getState().simulation.library.result?.rows.find((r) => r.cell === 'nand2');
    expect(row?.status).toBe('fail');
    expect(row?.kinds.mismatch).toBeGreaterThan(0);
    stop();
  });
});
