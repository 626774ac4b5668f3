/**
 * The bit-parallel sweep (docs/semantics.md §2.10) must write exactly the rows the scalar engine
 * writes: levels, voltages, currents, findings, every field. Random cells mix static gates, broken
 * gates, ratioed (pseudo-NMOS) loads, pass devices, transmission gates, tristates, fights, random
 * wiring with resistors and capacitors, and feedback (latches); extra inputs in front make each
 * cell's vectors vary inside a 32-vector word, so fallbacks land mid-word.
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { checkSweep } from '../../src/core/analysis/check.ts';
import type { WordRows } from '../../src/core/analysis/vectorsWordPass.ts';
import { WordSweep } from '../../src/core/analysis/vectorsWordPass.ts';
import { compile } from '../../src/core/compile/compile.ts';
import type { Netlist } from '../../src/core/model/netlist.ts';
import { DEFAULT_TECHNOLOGY } from '../../src/core/model/technology.ts';
import { Simulator } from '../../src/core/solver/simulator.ts';
import { usableExpectations } from '../../src/core/expect/problems.ts';
import {
  adderBank,
  inverterChain,
  muxTree,
  ratioedDecoder,
  rippleAdder,
} from '../../bench/generators/index.ts';
import { nand2MissingPullUp, nandLatch } from '../cells.ts';
import { passNetwork, randomNetlist } from '../property/generators.ts';
import { passGateCell } from '../property/passGateCells.ts';
import { stagedCell } from '../property/stagedCells.ts';

/** The cell with inputs P0… in front, up to `inputs` in all (they drive nothing). */
function padded(netlist: Netlist, inputs = 10): Netlist {
  const pads = Array.from({ length: Math.max(0, inputs - netlist.inputs.length) }, (_, i) => `P${i}`);
  return { ...netlist, inputs: [...pads, ...netlist.inputs] };
}

/** Vectors the tables decided and vectors the scalar engine solved, for one sweep. */
function split(
  netlist: Netlist,
  expectations: Record<string, string> = {},
): { fast: number; scalar: number } | null {
  const simulator = new Simulator(compile(netlist, DEFAULT_TECHNOLOGY));
  const sweep = WordSweep.plan(simulator, simulator.compiled.outputNets, expectations);
  if (sweep === null) return null;
  const counts = { fast: 0, scalar: 0 };
  const rows: WordRows = {
    addWords: () => {},
    addPlains: (n) => (counts.fast += n),
    add: () => counts.scalar++,
  };
  sweep.run(rows);
  return counts;
}

/** Both sweeps of a cell agree in every field; returns whether the bit-parallel path ran. */
function sameRows(netlist: Netlist, expectations: Record<string, string>, allNets: boolean): boolean {
  const options = { expectations, allNets };
  const words = checkSweep(netlist, options);
  const scalar = checkSweep(netlist, { ...options, wordParallel: false });
  expect(words).toEqual(scalar);
  return split(netlist, expectations) !== null;
}

describe("the bit-parallel sweep writes the scalar engine's rows", () => {
  it('on random staged cells: static, broken, ratioed, pass, mux, tristate and fighting stages', () => {
    let ran = 0;
    fc.assert(
      fc.property(
        stagedCell({ maxInputs: 6, maxStages: 6 }),
        fc.boolean(),
        ({ netlist, expectations }, all) => {
          const usable = usableExpectations(netlist, expectations).expectations;
          if (sameRows(padded(netlist), usable, all)) ran++;
        },
      ),
      { numRuns: 20, seed: 1101 },
    );
    expect(ran).toBeGreaterThan(10);
  }, 120_000);

  it('on random wiring with resistors and capacitors, pass networks and pass-gate cells', () => {
    let ran = 0;
    const cells = fc.oneof(
      randomNetlist(),
      passNetwork(),
      passGateCell().map((c) => c.netlist),
    );
    fc.assert(
      fc.property(cells, fc.boolean(), (netlist, all) => {
        if (sameRows(padded(netlist), {}, all)) ran++;
      }),
      { numRuns: 10, seed: 1102 },
    );
    expect(ran).toBeGreaterThan(3);
  }, 120_000);

  it('on a latch (feedback): its holding vectors fall back, the rest stay word-wise', () => {
    const latch = padded(nandLatch);
    expect(sameRows(latch, {}, true)).toBe(true);
    // SN = RN = 1 holds: Q and QN are X from an unknown state (common practice, no source).
    expect(split(latch)).toEqual({ fast: 768, scalar: 256 });
  });

  it('falls back mid-word: the floating vector of a NAND2 without one pull-up, and expected-function mismatches', () => {
    const broken = padded(nand2MissingPullUp);
    expect(sameRows(broken, { Y: '!(A & B)' }, false)).toBe(true);
    // Y floats for A = 1, B = 0 only: one vector in four, in every word (common practice, no source).
    expect(split(broken)).toEqual({ fast: 768, scalar: 256 });
    // A wrong expectation (Y = A & B) disagrees wherever the NAND2 is driven: 3 vectors in 4.
    expect(split(broken, { Y: 'A & B' })).toEqual({ fast: 0, scalar: 1024 });
    // Y = P0 | !(A & B) also disagrees at A = B = 1 when P0 = 1: 128 vectors more.
    expect(split(broken, { Y: 'P0 | !(A & B)' })).toEqual({ fast: 640, scalar: 384 });
  });

  // The multiplexer tree's transmission gates form one group of 14 controls (no table past 12) and
  // the decoder's 256 tables of 2^8 entries would cost more than its 1,024 vectors: both stay scalar.
  it.each([
    ['a 5-bit mirror ripple adder', rippleAdder(5), 1],
    ['a 3-select-bit transmission-gate multiplexer tree', muxTree(3), null],
    ['an 8-address-bit pseudo-NMOS decoder', padded(ratioedDecoder(8)), null],
    ['a 40-stage inverter chain', padded(inverterChain(40)), 1],
    ['one adder of the bench bank (16 inputs)', adderBank(1), 1],
  ])(
    'on the bench family %s',
    (_, netlist, fastShare) => {
      expect(sameRows(netlist, {}, false)).toBe(fastShare !== null);
      const counts = split(netlist);
      if (fastShare === null) expect(counts).toBeNull();
      else expect(counts?.fast).toBe(fastShare * 2 ** netlist.inputs.length);
    },
    60_000,
  );
});
