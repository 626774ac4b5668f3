import { describe, expect, it } from 'vitest';
import { levelAt, levelStrips, stripRuns } from '../../src/core/view/levelStrip.ts';
import type { StepLevel } from '../../src/core/view/levelStrip.ts';
import { leading } from '../helpers.ts';

const L = (level: StepLevel['level'], degraded = false): StepLevel => ({ level, degraded });

describe('level strips', () => {
  // Cross-coupled NAND latch with active-low set S̄ and reset R̄: set (S̄ = 0) gives Q = 1, both high holds,
  // reset (R̄ = 0) gives Q = 0, both high holds again (W&H 4th ed., sequential circuits; common practice).
  it('merges held steps of a NAND latch into runs', () => {
    const q = [L('1'), L('1'), L('0'), L('0')];
    expect(stripRuns(q)).toEqual([
      { start: 0, end: 2, level: '1', look: 'high' },
      { start: 2, end: 4, level: '0', look: 'low' },
    ]);
  });

  it('splits a degraded high from a full high and treats a missing step as X', () => {
    const runs = stripRuns([L('1'), L('1', true), undefined, L('Z')]);
    expect(runs.map((r) => r.look)).toEqual(['high', 'degraded-high', 'unknown', 'floating']);
  });

  it('builds one strip per chosen net and reads a step back', () => {
    const steps = [
      { Q: L('1'), QB: L('0') },
      { Q: L('1'), QB: L('0') },
      { Q: L('0'), QB: L('1') },
    ];
    const [q, qb] = leading(levelStrips(steps, ['Q', 'QB']), 2);
    expect(q.net).toBe('Q');
    expect(levelAt(q, 1)).toBe('1');
    expect(levelAt(q, 2)).toBe('0');
    expect(levelAt(qb, 2)).toBe('1');
    expect(levelAt(qb, 9)).toBeUndefined();
  });
});
