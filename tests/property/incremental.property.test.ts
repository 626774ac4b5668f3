import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { compile } from '../../src/core/compile/compile.ts';
import type { InputValue, InputVector } from '../../src/core/model/design.ts';
import { DEFAULT_TECHNOLOGY } from '../../src/core/model/technology.ts';
import { Simulator, type SolveResult } from '../../src/core/solver/simulator.ts';
import { STARTERS } from '../../src/core/starters/index.ts';
import { randomNetlist } from './generators.ts';

/** Everything a solve reports, as comparable plain data. */
function snapshot(r: SolveResult) {
  return {
    volts: Array.from(r.volts, (v) => (Number.isNaN(v) ? 'nan' : v.toFixed(9))),
    levels: Array.from(r.levels),
    flags: Array.from(r.flags),
    conduction: Array.from(r.conduction),
    current: Array.from(r.chCurrent, (i) => i.toExponential(6)),
    settled: r.settled,
  };
}

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
            const expected = snapshot(new Simulator(compiled).solveFresh(v));
            expect(snapshot(reused.solveFresh(v))).toEqual(expected);
            expect(snapshot(recycling.solveFresh(v, { recycle: true }))).toEqual(expected);
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
            expect(snapshot(a)).toEqual(snapshot(b));
          }
        },
      ),
      { numRuns: 150 },
    );
  });
});
