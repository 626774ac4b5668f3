/**
 * Per-vector level-1 DC beside the switch-level estimate (docs/semantics.md §2, "DC levels").
 *
 * Sources: the NAND2 levels are its truth table and an SR latch holds what it was set to (common
 * practice, no source); a ratioed (pseudo-NMOS) NOR's low output above 0 V with static current is
 * Weste & Harris, CMOS VLSI Design, 4th ed. (2011), §9.2.2 (from memory); a transmission gate passes
 * both rails undegraded, W&H ch. 1 on pass transistors (common practice). 2.5 V is the default
 * technology's VDD.
 */
import { describe, expect, it } from 'vitest';
import { checkSweep } from '../../src/core/analysis/check.ts';
import { dcSequence, dcSweep } from '../../src/core/dc/vectorDc.ts';
import { DEFAULT_TECHNOLOGY } from '../../src/core/model/technology.ts';
import { nand2, ratioedNor2, transmissionGate } from '../../src/core/starters/combinational.ts';
import { nandLatch, prechargedAnd2 } from '../../src/core/starters/sequential.ts';
import { reportRows } from '../../src/core/analysis/sweepColumns.ts';

describe('per-vector level-1 DC beside the switch-level estimate', () => {
  it('follows the sweep order of checkSweep', () => {
    const dc = dcSweep(nand2, DEFAULT_TECHNOLOGY);
    const report = checkSweep(nand2);
    expect(dc).toHaveLength(4);
    dc.forEach((row, i) => {
      const level = reportRows(report)[i]?.outputs['Y'];
      expect(row.voltages['Y']).toBeCloseTo(level === '1' ? 2.5 : 0, 6);
      expect(row.differs).toEqual([]);
      expect(row.notes).toEqual([]);
    });
  });

  it('a ratioed NOR disagrees with the linear estimate on its low level and its current', () => {
    // The switch level models each device as a fixed on-resistance; the level-1 load PMOS is
    // saturated and the pull-down NMOS linear, so the low output and the static current differ.
    const [, a] = dcSweep(ratioedNor2, DEFAULT_TECHNOLOGY);
    const report = checkSweep(ratioedNor2);
    const switchLow = reportRows(report)[1]?.voltages['Y'] as number;
    expect(a?.voltages['Y']).toBeGreaterThan(0);
    expect(a?.voltages['Y']).toBeLessThan(DEFAULT_TECHNOLOGY.vil);
    expect(Math.abs((a?.voltages['Y'] as number) - switchLow)).toBeGreaterThan(0.05 * 2.5);
    expect(a?.differs).toContain('Y');
    expect(a?.supplyCurrent).toBeGreaterThan(0);
  });

  it('a transmission gate passes both rails in full', () => {
    const dc = dcSweep(transmissionGate, DEFAULT_TECHNOLOGY, { allNets: true });
    const on = dc.filter((_row, i) => reportRows(checkSweep(transmissionGate))[i]?.inputs['EN'] === '1');
    expect(on.map((r) => r.voltages['Y'])).toEqual([expect.closeTo(0, 6), expect.closeTo(2.5, 6)]);
  });

  it('a latch in a sequence keeps the state it was set to; in the sweep its hold state is undecided', () => {
    const steps = dcSequence(nandLatch, DEFAULT_TECHNOLOGY, [
      { Sb: '0', Rb: '1' },
      { Sb: '1' },
      { Rb: '0' },
      { Rb: '1' },
    ]);
    expect(steps.map((s) => s.voltages['Q'])).toEqual([
      expect.closeTo(2.5, 6),
      expect.closeTo(2.5, 6),
      expect.closeTo(0, 2),
      expect.closeTo(0, 2),
    ]);
    const hold = dcSweep(nandLatch, DEFAULT_TECHNOLOGY)[3];
    expect(hold?.voltages['Q']).toBeNull();
    expect(hold?.notes.join(' ')).toMatch(/unstable balance/);
  });

  it('a precharged node that floats keeps its charge, and the output inverter reads it', () => {
    // CLK = 0 precharges X; CLK = 1 with A = 0 leaves X floating at VDD, so Y = A & B = 0.
    const [pre, evaluate] = dcSequence(prechargedAnd2, DEFAULT_TECHNOLOGY, [
      { CLK: '0', A: '0', B: '0' },
      { CLK: '1' },
    ]);
    expect(pre?.voltages['Y']).toBeCloseTo(0, 6);
    expect(evaluate?.voltages['Y']).toBeCloseTo(0, 6);
    expect(evaluate?.notes).toEqual(['X: floating, held at its stored 2.500 V']);
  });
});
