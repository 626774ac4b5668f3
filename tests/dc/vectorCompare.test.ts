/**
 * One vector's level-1 answer beside its switch-level estimate (docs/semantics.md §2, "DC levels",
 * 6), as the app's Vector view shows it.
 *
 * Sources: the two sides are the engine's own answers (checkSweep and the level-1 sweep), compared, not
 * published. That a ratioed (pseudo-NMOS) NOR's low output sits above 0 V and draws static current is
 * Weste & Harris, CMOS VLSI Design, 4th ed. (2011), §9.2.2 on pseudo-nMOS (from memory); that a set SR
 * latch holds Q at VDD is its truth table: common practice, no source.
 */
import { describe, expect, it } from 'vitest';
import { checkSweep } from '../../src/core/analysis/check.ts';
import { compareAtLastStep } from '../../src/core/dc/vectorCompare.ts';
import { dcSweep } from '../../src/core/dc/vectorDc.ts';
import { DEFAULT_TECHNOLOGY } from '../../src/core/model/technology.ts';
import { ratioedNor2 } from '../../src/core/starters/combinational.ts';
import { nandLatch } from '../../src/core/starters/sequential.ts';
import { reportRows } from '../../src/core/analysis/sweepColumns.ts';

describe('the level-1 answer beside the switch-level estimate', () => {
  it('a ratioed NOR low: both voltages, both currents, and where they differ', () => {
    const vector = { A: '1', B: '0' } as const;
    const c = compareAtLastStep(ratioedNor2, DEFAULT_TECHNOLOGY, [vector]);
    const row = reportRows(checkSweep(ratioedNor2)).find(
      (v) => v.inputs['A'] === '1' && v.inputs['B'] === '0',
    );
    const dc = dcSweep(ratioedNor2, DEFAULT_TECHNOLOGY)[2];
    const y = c.outputs.find((o) => o.name === 'Y');
    expect(y).toMatchObject({ level: row?.outputs['Y'], differs: true });
    expect(y?.switchVolts).toBeCloseTo(row?.voltages['Y'] as number, 9);
    expect(y?.dcVolts).toBeCloseTo(dc?.voltages['Y'] as number, 9);
    expect(c.switchCurrent).toBeCloseTo(row?.supplyCurrent as number, 15);
    expect(c.dcCurrent).toBeCloseTo(dc?.supplyCurrent as number, 15);
    expect(c.inputs).toMatchObject(vector);
  });

  it('a sequence step keeps the charge the steps before it left: a set latch holds Q high', () => {
    const c = compareAtLastStep(nandLatch, DEFAULT_TECHNOLOGY, [{ Sb: '0', Rb: '1' }, { Sb: '1' }]);
    expect(c.outputs.find((o) => o.name === 'Q')?.dcVolts).toBeCloseTo(2.5, 6);
    // Alone, the hold vector starts from an unknown state: the latch balances, and no voltage is given.
    const alone = compareAtLastStep(nandLatch, DEFAULT_TECHNOLOGY, [{ Sb: '1', Rb: '1' }]);
    expect(alone.outputs.find((o) => o.name === 'Q')?.dcVolts).toBeNull();
    expect(alone.notes.join(' ')).toMatch(/unstable balance/);
  });
});
