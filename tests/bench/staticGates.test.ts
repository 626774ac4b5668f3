/**
 * The DC benchmark's cells are what they are named after: transistor counts, and every vector's
 * output through the switch-level solver against the Boolean function. A static CMOS gate has two
 * transistors per input and NAND4 and AO222 compute the functions named (common practice, no source).
 */
import { describe, expect, it } from 'vitest';
import { ao222, nandGate, transistorCount } from '../../bench/generators/index.ts';
import { sweepVectors } from '../../src/core/analysis/vectors.ts';
import { solve } from '../helpers.ts';

describe('DC benchmark cells', () => {
  it('NAND4: 8 transistors, Y = !(A·B·C·D)', () => {
    const nand4 = nandGate(4);
    expect(transistorCount(nand4)).toBe(8);
    for (const v of sweepVectors(nand4.inputs)) {
      const all = Object.values(v).every((x) => x === '1');
      expect(solve(nand4, v).level('Y')).toBe(all ? '0' : '1');
    }
  });
  it('AO222: 14 transistors, Y = A·B + C·D + E·F', () => {
    const cell = ao222();
    expect(transistorCount(cell)).toBe(14);
    for (const v of sweepVectors(cell.inputs)) {
      const on = (a: string, b: string): boolean => v[a] === '1' && v[b] === '1';
      expect(solve(cell, v).level('Y')).toBe(on('A', 'B') || on('C', 'D') || on('E', 'F') ? '1' : '0');
    }
  });
});
