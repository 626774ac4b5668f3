/**
 * The steady-state search over feedback groups (docs/semantics.md §2): X that a loop of channel-connected
 * components makes up from its own unknown start is resolved to the level every steady state agrees on;
 * where steady states disagree the nets hold stored state; where there is none the loop oscillates.
 */
import { describe, expect, it } from 'vitest';
import { checkSequence, checkSweep } from '../../src/core/analysis/check.ts';
import { circuit, type CircuitBuilder } from '../../src/core/model/builder.ts';
import type { InputVector } from '../../src/core/model/design.ts';
import { starterById } from '../../src/core/starters/index.ts';
import { FLAG_BOUND, FLAG_OSCILLATING, FLAG_STATES } from '../../src/core/solver/levels.ts';
import { MAX_FEEDBACK_GUESSES } from '../../src/core/solver/feedback.ts';
import { leading, solve, solveSteps } from '../helpers.ts';
import { fixtureCell } from './fixtures.ts';
import { reportRows } from '../../src/core/analysis/sweepColumns.ts';

const bits = (i: number): InputVector => ({
  A: (i >> 2) & 1 ? '1' : '0',
  B: (i >> 1) & 1 ? '1' : '0',
  CI: i & 1 ? '1' : '0',
});
/**
 * Majority of three: the carry of a full adder (W&H 4th ed. ch. 11, addition, chapter from memory;
 * common practice).
 */
const majority = (i: number): string => (((i >> 2) & 1) + ((i >> 1) & 1) + (i & 1) >= 2 ? '1' : '0');

describe('transmission-gate carry (our own reproducer TGC)', () => {
  const tgc = fixtureCell('tgc.sp');

  it('sweep: CO = majority(A, B, CI) on all eight vectors with no findings', () => {
    const report = checkSweep(tgc.netlist, { expectations: tgc.expectations });
    expect(
      reportRows(report)
        .map((v) => v.outputs.CO)
        .join(''),
    ).toBe('00010111');
    expect(report.findings).toEqual([]);
  });

  it('sequence: the same answer from every earlier state', () => {
    for (let p = 0; p < 8; p++) {
      for (let v = 0; v < 8; v++) {
        const report = checkSequence(tgc.netlist, [bits(p), bits(v)], { expectations: tgc.expectations });
        expect(report.steps!.map((s) => s.outputs.CO)).toEqual([majority(p), majority(v)]);
        expect(report.findings).toEqual([]);
      }
    }
  });
});

describe('stored state in a sweep', () => {
  it('NAND latch holding (Sb = Rb = 1): Q and Qb are X, flagged as several steady states', () => {
    const latch = starterById('nand-latch')!.design.netlist;
    const s = solve(latch, { Sb: '1', Rb: '1' });
    for (const net of ['Q', 'Qb']) {
      expect(s.level(net)).toBe('X');
      expect(s.flags(net)).toBe(FLAG_STATES);
    }
    // Set and reset are decided: the latch is still computed where it does not hold.
    expect(solve(latch, { Sb: '0', Rb: '1' }).level('Q')).toBe('1');
  });

  it('TG D latch holding (CLK = 0) and the memory cell with its word line off hold too', () => {
    const tg = solve(starterById('tg-d-latch')!.design.netlist, { D: '1', CLK: '0' });
    expect(tg.flags('Q') & FLAG_STATES).toBe(FLAG_STATES);
    const cell = solve(starterById('sram6t')!.design.netlist, { WL: '0', BL: '1', BLB: '0' });
    expect(cell.flags('Q') & FLAG_STATES).toBe(FLAG_STATES);
  });

  it('releasing set and reset together in a sequence is a race: no steady state, both X', () => {
    const steps = solveSteps(starterById('nand-latch')!.design.netlist, [
      { Sb: '0', Rb: '0' },
      { Sb: '1', Rb: '1' },
    ]);
    const [, race] = leading(steps, 2);
    expect(race.flags('Q')).toBe(FLAG_STATES | FLAG_OSCILLATING);
    expect(race.result.settled).toBe(false);
  });
});

/** A ring of `n` inverters (static CMOS), n0 → n1 → … → n0. */
function ring(n: number): CircuitBuilder {
  let b = circuit(`ring${n}`).rails().output('n0');
  for (let i = 0; i < n; i++) {
    const a = `n${i}`;
    const y = `n${(i + 1) % n}`;
    b = b.pmos(`P${i}`, { g: a, d: y, s: 'VDD' }).nmos(`N${i}`, { g: a, d: y, s: 'GND' });
  }
  return b;
}

describe('rings', () => {
  // An odd ring of inverters has no steady state; an even one has two (a ring oscillator and a bistable
  // ring; common practice, no source).
  it('three inverters: no 0/1 assignment is steady, so no steady state in sweep mode', () => {
    const report = checkSweep(ring(3).build());
    expect(reportRows(report)[0]!.outputs.n0).toBe('X');
    expect(report.findings.map((f) => f.kind)).toEqual(['no-steady-state']);
    expect(report.findings[0]!.nets).toEqual(['n0', 'n1', 'n2']);
  });

  it(`${MAX_FEEDBACK_GUESSES} inverters are enumerated: two steady states, stored state`, () => {
    const s = solve(ring(MAX_FEEDBACK_GUESSES).build(), {});
    expect(s.flags('n0')).toBe(FLAG_STATES);
  });

  it(`${MAX_FEEDBACK_GUESSES + 2} inverters exceed the bound: X with a limit finding`, () => {
    const netlist = ring(MAX_FEEDBACK_GUESSES + 2).build();
    expect(solve(netlist, {}).flags('n0') & FLAG_BOUND).toBe(FLAG_BOUND);
    const kinds = checkSweep(netlist).findings.map((f) => `${f.kind}:${f.severity}`);
    expect(kinds).toEqual(['limit:warning', 'unknown:error']);
  });

  it('an X from outside the group is left to the group: nothing is guessed', () => {
    // The NAND latch with its set input at X: Q = !(X & Qb) is unknown because of that input.
    const latch = starterById('nand-latch')!.design.netlist;
    const s = solve(latch, { Sb: 'X', Rb: '1' });
    expect(s.level('Q')).toBe('X');
    expect(s.flags('Q') & FLAG_STATES).toBe(0);
  });
});
