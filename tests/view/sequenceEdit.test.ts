import { describe, expect, it } from 'vitest';
import {
  StepTextError,
  heldSteps,
  formatSteps,
  insertStep,
  moveStep,
  nextCellValue,
  setStepCell,
  parseSteps,
  removeStep,
  setStepValue,
} from '../../src/core/view/sequenceEdit.ts';

const D_LATCH = ['D', 'CLK'];

describe('step text', () => {
  it('parses only what each step changes; held values follow the sequence rule', () => {
    const steps = parseSteps('D=1 CLK=1; CLK=0; D=0', D_LATCH);
    expect(steps).toEqual([{ D: '1', CLK: '1' }, { CLK: '0' }, { D: '0' }]);
    expect(heldSteps(D_LATCH, steps)).toEqual([
      { D: '1', CLK: '1' },
      { D: '1', CLK: '0' },
      { D: '0', CLK: '0' },
    ]);
    expect(heldSteps(D_LATCH, [{ CLK: '0' }])).toEqual([{ D: 'X', CLK: '0' }]);
  });

  it('round-trips through its text form', () => {
    const steps = parseSteps('D=1 CLK=1; CLK=0; D=z CLK=x', D_LATCH);
    expect(formatSteps(steps, D_LATCH)).toBe('D=1 CLK=1; CLK=0; D=Z CLK=X');
    expect(parseSteps(formatSteps(steps, D_LATCH), D_LATCH)).toEqual(steps);
  });

  it('points at the bad token', () => {
    const text = 'D=1 CLK=1; D=2';
    const error = (() => {
      try {
        parseSteps(text, D_LATCH);
      } catch (e) {
        return e;
      }
    })();
    expect(error).toBeInstanceOf(StepTextError);
    expect((error as StepTextError).position).toBe(text.indexOf('2'));
    expect(() => parseSteps('Q=1', D_LATCH)).toThrow(StepTextError);
    expect(() => parseSteps('D1', D_LATCH)).toThrow(StepTextError);
  });
});

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
