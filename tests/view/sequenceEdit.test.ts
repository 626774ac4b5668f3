import { describe, expect, it } from 'vitest';
import {
  insertStep,
  moveStep,
  nextCellValue,
  removeStep,
  setStepCell,
  setStepValue,
} from '../../src/core/view/sequenceEdit.ts';

describe('step edits', () => {
  const steps = [{ D: '0' }, { D: '1' }, { D: 'Z' }] as const;

  it('insert, remove, set and move return new lists', () => {
    expect(insertStep(steps, 1, { D: 'X' }).map((s) => s.D)).toEqual(['0', 'X', '1', 'Z']);
    expect(removeStep(steps, 0).map((s) => s.D)).toEqual(['1', 'Z']);
    expect(setStepValue(steps, 2, 'D', '1').map((s) => s.D)).toEqual(['0', '1', '1']);
    expect(moveStep(steps, 0, 1).map((s) => s.D)).toEqual(['1', '0', 'Z']);
    expect(moveStep(steps, 2, 5).map((s) => s.D)).toEqual(['0', '1', 'Z']);
    expect(steps.map((s) => s.D)).toEqual(['0', '1', 'Z']);
  });

  it('cycles a cell through held and the four values', () => {
    const order = [undefined, '0', '1', 'Z', 'X'] as const;
    expect(order.map(nextCellValue)).toEqual(['0', '1', 'Z', 'X', undefined]);
    expect(setStepCell([{ D: '1', CLK: '0' }], 0, 'D', undefined)).toEqual([{ CLK: '0' }]);
    expect(setStepCell([{ CLK: '0' }], 0, 'D', 'Z')).toEqual([{ CLK: '0', D: 'Z' }]);
  });
});
