import { describe, expect, it } from 'vitest';
import { arrangeRows, kindCounts, vectorRows } from '../../src/core/view/vectorTable.ts';
import { formatCurrent, formatPower } from '../../src/core/view/format.ts';
import { nandMissingPullUp, pseudoNmosInverter } from './fixtures.ts';
import { leading } from '../helpers.ts';

describe('vector table rows', () => {
  it('carries the current and power of the vector that draws current', () => {
    const rows = vectorRows(pseudoNmosInverter);
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
    const row = vectorRows(nandMissingPullUp)[2]!;
    expect(row.kinds).toEqual(['mismatch', 'floating']);
    expect(row.mismatched).toEqual(['Y']);
    expect(row.errors).toBe(2);
  });

  it('reads sequence steps when there are no sweep vectors', () => {
    const { vectors, ...rest } = nandMissingPullUp;
    expect(vectorRows({ ...rest, steps: vectors ?? [] })).toHaveLength(4);
  });
});

describe('arranging rows', () => {
  const rows = vectorRows(nandMissingPullUp);

  it('filters to problem vectors', () => {
    expect(arrangeRows(rows, { filter: 'problems' }).map((r) => r.index)).toEqual([2]);
    expect(arrangeRows(rows, { filter: 'floating' }).map((r) => r.index)).toEqual([2]);
    expect(arrangeRows(rows, { filter: 'contention' })).toEqual([]);
    expect(arrangeRows(rows).map((r) => r.index)).toEqual([0, 1, 2, 3]);
  });

  it('sorts by current, descending, ties in vector order', () => {
    const inv = vectorRows(pseudoNmosInverter);
    expect(arrangeRows(inv, { sort: 'supplyCurrent', direction: 'descending' }).map((r) => r.index)).toEqual([
      1, 0,
    ]);
    expect(arrangeRows(rows, { sort: 'supplyCurrent', direction: 'descending' }).map((r) => r.index)).toEqual(
      [0, 1, 2, 3],
    );
  });

  it('sorts by an output column with problem levels last', () => {
    expect(arrangeRows(rows, { sort: 'output:Y' }).map((r) => r.outputs.Y)).toEqual(['0', '1', '1', 'Z']);
  });

  it('sorts by severity and leaves its input untouched', () => {
    const before = rows.map((r) => r.index);
    expect(arrangeRows(rows, { sort: 'severity', direction: 'descending' })[0]!.index).toBe(2);
    expect(rows.map((r) => r.index)).toEqual(before);
  });

  it('counts rows per finding kind', () => {
    expect(Object.fromEntries(kindCounts(rows))).toEqual({ mismatch: 1, floating: 1 });
  });
});
