import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { compile } from '../../src/core/compile/compile.ts';
import type { InputValue, InputVector } from '../../src/core/model/design.ts';
import { DEFAULT_TECHNOLOGY } from '../../src/core/model/technology.ts';
import { Simulator, type SolveResult } from '../../src/core/solver/simulator.ts';
import { STARTERS } from '../../src/core/starters/index.ts';
import { solveSnapshot } from '../helpers.ts';
import { randomNetlist } from './generators.ts';
import { inverterChain, rippleAdder } from '../../bench/generators/index.ts';
import { toggleWalk } from '../../bench/vectors.ts';

const value = fc.constantFrom<InputValue>('0', '1', '0', '1', 'X', 'Z');

// Internal consistency, no outside source: re-evaluating only what changed inputs reach must give
// exactly what evaluating every component gives.
describe('incremental re-evaluation', () => {
  const netlists = fc.oneof(fc.constantFrom(...STARTERS.map((s) => s.design.netlist)), randomNetlist());
  it('sweep mode: a reused (and a recycling) simulator matches a new one on every vector', () => {
    fc.assert(
      fc.property(
        netlists,
        fc.array(fc.array(value, { minLength: 3, maxLength: 3 }), { minLength: 2, maxLength: 8 }),
        (netlist, rows) => {
          const compiled = compile(netlist, DEFAULT_TECHNOLOGY);
          const reused = new Simulator(compiled);
          const recycling = new Simulator(compiled);
          for (const row of rows) {
            const v: InputVector = Object.fromEntries(
              netlist.inputs.map((n, i) => [n, row[i % row.length]!]),
            );
            const expected = solveSnapshot(new Simulator(compiled).solveFresh(v));
            expect(solveSnapshot(reused.solveFresh(v))).toEqual(expected);
            expect(solveSnapshot(recycling.solveFresh(v, { recycle: true }))).toEqual(expected);
          }
        },
      ),
      { numRuns: 150 },
    );
  });
  it('sequence mode: carrying state incrementally matches re-evaluating everything', () => {
    fc.assert(
      fc.property(
        netlists,
        fc.array(fc.array(value, { minLength: 3, maxLength: 3 }), { minLength: 2, maxLength: 8 }),
        (netlist, rows) => {
          const compiled = compile(netlist, DEFAULT_TECHNOLOGY);
          const fast = new Simulator(compiled);
          const full = new Simulator(compiled, { incremental: false });
          let a: SolveResult | null = null;
          let b: SolveResult | null = null;
          for (const row of rows) {
            const v: InputVector = Object.fromEntries(
              netlist.inputs.map((n, i) => [n, row[i % row.length]!]),
            );
            a = a ? fast.solveNext(v, a) : fast.solveFresh(v);
            b = b ? full.solveNext(v, b) : full.solveFresh(v);
            expect(solveSnapshot(a)).toEqual(solveSnapshot(b));
          }
        },
      ),
      { numRuns: 150 },
    );
  });
  // Small cells re-evaluate most of their nets on a toggle, so the finish walks every net. A long
  // adder toggled one input at a time takes the path that updates only the changed nets; the chain's
  // one input changes every stage, so it takes the whole walk again.
  it.each([
    ['a 32-bit ripple adder', rippleAdder(32)],
    ['a 200-stage inverter chain', inverterChain(200)],
  ])('toggles on %s: updating the changed nets alone matches re-evaluating everything', (_, netlist) => {
    const compiled = compile(netlist, DEFAULT_TECHNOLOGY);
    const fast = new Simulator(compiled);
    const full = new Simulator(compiled, { incremental: false });
    const walk = toggleWalk(netlist.inputs, 40);
    let a = fast.solveFresh(walk[0]!);
    let b = full.solveFresh(walk[0]!);
    for (const v of walk.slice(1)) {
      a = fast.solveNext(v, a);
      b = full.solveNext(v, b);
      expect(solveSnapshot(a)).toEqual(solveSnapshot(b));
      const r = fast.solveFresh(v, { recycle: true });
      expect(solveSnapshot(r)).toEqual(solveSnapshot(new Simulator(compiled).solveFresh(v)));
    }
  });
});
