/**
 * How the panel shows undecided outputs (docs/semantics.md §3): the vector table flags the `unknown`
 * kind, and nets with several steady states carry the stored-state mark beside the X look.
 */
import { describe, expect, it } from 'vitest';
import { checkSweep } from '../../src/core/analysis/check.ts';
import { compile } from '../../src/core/compile/compile.ts';
import { DEFAULT_TECHNOLOGY } from '../../src/core/model/technology.ts';
import { Simulator } from '../../src/core/solver/simulator.ts';
import { netState } from '../../src/core/view/solvedView.ts';
import { vectorRows } from '../../src/core/view/vectorTable.ts';
import { lookOf, PROBLEM_GLYPHS, problemMarks } from '../../src/core/view/visualLanguage.ts';
import { fixtureCell } from '../solver/fixtures.ts';

const latch = fixtureCell('nand-latch.sp').netlist;

describe('undecided outputs in the panel', () => {
  it('the table row of the holding vector lists unknown, after mismatch and before floating', () => {
    const rows = vectorRows(checkSweep(latch).sweep!);
    expect(rows.map((r) => r.kinds.join())).toEqual(['', '', '', 'unknown']);
    expect(rows[3]!.errors).toBe(2);
  });

  it('a net with several steady states reads X with the stored-state mark', () => {
    const c = compile(latch, DEFAULT_TECHNOLOGY);
    const r = new Simulator(c).solveFresh({ SB: '1', RB: '1' });
    const q = netState(r, c.netIndex.get('Q') as number);
    expect(lookOf(q).mark).toBe('X');
    expect(problemMarks(q)).toEqual(['stored-state']);
    expect(PROBLEM_GLYPHS['stored-state']).toBe('‖');
  });
});
