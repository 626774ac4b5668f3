import { describe, expect, it } from 'vitest';
import {
  completeVector,
  cycledValue,
  indexOfVector,
  stepVector,
  toggleInput,
  vectorOfIndex,
} from '../../src/core/view/vectorControl.ts';

const AB = ['A', 'B'];

describe('vector stepping', () => {
  // A two-input truth table is written 00, 01, 10, 11 with the first input as the high bit
  // (common practice, no source).
  it('enumerates combinations in truth-table order', () => {
    expect([0, 1, 2, 3].map((k) => vectorOfIndex(AB, k))).toEqual([
      { A: '0', B: '0' },
      { A: '0', B: '1' },
      { A: '1', B: '0' },
      { A: '1', B: '1' },
    ]);
  });

  it('round-trips a vector through its index', () => {
    for (let k = 0; k < 8; k++)
      expect(indexOfVector(['A', 'B', 'C'], vectorOfIndex(['A', 'B', 'C'], k))).toBe(BigInt(k));
  });

  it('wraps forward and back', () => {
    expect(stepVector(AB, { A: '1', B: '1' }, 1)).toEqual({ A: '0', B: '0' });
    expect(stepVector(AB, { A: '0', B: '0' }, -1)).toEqual({ A: '1', B: '1' });
    expect(stepVector(AB, { A: '0', B: '1' }, 1)).toEqual({ A: '1', B: '0' });
  });

  it('restarts at 0 from a vector with an undriven input', () => {
    expect(indexOfVector(AB, { A: 'Z', B: '1' })).toBeNull();
    expect(stepVector(AB, { A: 'Z', B: '1' }, 1)).toEqual({ A: '0', B: '0' });
  });

  it('toggles one input without touching the others or the original', () => {
    const before = { A: '0', B: '1' } as const;
    expect(toggleInput(before, 'A')).toEqual({ A: '1', B: '1' });
    expect(toggleInput({ A: 'X', B: '1' }, 'A')).toEqual({ A: '0', B: '1' });
    expect(before).toEqual({ A: '0', B: '1' });
  });

  it('cycles a step cell through 0, 1, Z, X', () => {
    expect(['0', '1', 'Z', 'X'].map((v) => cycledValue(v as '0'))).toEqual(['1', 'Z', 'X', '0']);
  });

  it('steps exactly on a 65-input cell, past the 2^53 a double holds', () => {
    const wide = Array.from({ length: 65 }, (_, i) => `I${i}`);
    const allOnes = Object.fromEntries(wide.map((n) => [n, '1' as const]));
    // 2^65 − 1 + 1 wraps to 0; the step below it is 2^65 − 2, whose last bit alone is 0.
    expect(Object.values(stepVector(wide, allOnes, 1)).every((v) => v === '0')).toBe(true);
    const below = stepVector(wide, allOnes, -1);
    expect(below.I64).toBe('0');
    expect(wide.slice(0, 64).every((n) => below[n] === '1')).toBe(true);
    expect(indexOfVector(wide, below)).toBe(2n ** 65n - 2n);
  });

  it('fills missing inputs with 0', () => {
    expect(completeVector(AB, { B: '1' })).toEqual({ A: '0', B: '1' });
  });
});
