import { describe, expect, it } from 'vitest';
import type { SweepColumns } from '../../src/core/analysis/report.ts';
import { arrangeRows, kindCounts, rowOfVector, vectorRows } from '../../src/core/view/vectorTable.ts';
import { formatCurrent, formatPower } from '../../src/core/view/format.ts';
import { nandMissingPullUp, pseudoNmosInverter } from './fixtures.ts';
import { leading } from '../helpers.ts';

const inverter = pseudoNmosInverter.sweep as SweepColumns;
const nand = nandMissingPullUp.sweep as SweepColumns;

describe('vector table rows', () => {
  it('carries the current and power of the vector that draws current', () => {
    const rows = vectorRows(inverter);
    expect(rows).toHaveLength(2);
    const [high, low] = leading(rows, 2);
    expect(high.kinds).toEqual([]);
    expect(low.kinds).toEqual(['static-current']);
    // 42.3 µA and 106 µW: square-law pseudo-NMOS load, derived in fixtures.ts.
    expect(formatCurrent(low.supplyCurrent)).toBe('42.3 µA');
    expect(formatPower(low.staticPower)).toBe('106 µW');
    expect(low.warnings).toBe(1);
    expect(low.errors).toBe(0);
  });

  it('lists flags most serious first and marks the mismatched output', () => {
    const row = vectorRows(nand)[2]!;
    expect(row.kinds).toEqual(['mismatch', 'floating']);
    expect(row.mismatched).toEqual(['Y']);
    expect(row.errors).toBe(2);
    expect(row.inputs).toEqual({ A: '1', B: '0' });
  });

  it('finds the row of a vector from its truth-table position, none for an X input', () => {
    expect(rowOfVector(nand, { A: '1', B: '0' })).toBe(2);
    expect(rowOfVector(nand, { A: 'X', B: '0' })).toBeNull();
    expect(rowOfVector(nand, { A: '1' })).toBeNull();
  });
});

describe('arranging rows', () => {
  const order = (o: Int32Array): number[] => Array.from(o);

  it('filters to problem vectors', () => {
    expect(order(arrangeRows(nand, { filter: 'problems' }))).toEqual([2]);
    expect(order(arrangeRows(nand, { filter: 'floating' }))).toEqual([2]);
    expect(order(arrangeRows(nand, { filter: 'contention' }))).toEqual([]);
    expect(order(arrangeRows(nand))).toEqual([0, 1, 2, 3]);
    expect(order(arrangeRows(nand, { direction: 'descending' }))).toEqual([3, 2, 1, 0]);
  });

  it('sorts by current, descending, ties in vector order', () => {
    expect(order(arrangeRows(inverter, { sort: 'supplyCurrent', direction: 'descending' }))).toEqual([1, 0]);
    expect(order(arrangeRows(nand, { sort: 'supplyCurrent', direction: 'descending' }))).toEqual([
      0, 1, 2, 3,
    ]);
  });

  it('sorts by an output column with problem levels last', () => {
    const rows = vectorRows(nand);
    expect(order(arrangeRows(nand, { sort: 'output:Y' })).map((i) => rows[i]!.outputs.Y)).toEqual([
      '0',
      '1',
      '1',
      'Z',
    ]);
  });

  it('sorts by severity', () => {
    expect(arrangeRows(nand, { sort: 'severity', direction: 'descending' })[0]).toBe(2);
  });

  it('counts rows per finding kind', () => {
    expect(Object.fromEntries(kindCounts(nand))).toEqual({ mismatch: 1, floating: 1 });
  });
});
