/**
 * Cells that are combinational by construction never read X (docs/semantics.md §2, the steady-state
 * search): each 0/1 vector has exactly one steady state, so the sweep must give it, and a sequence
 * must reach it from any earlier state. The truth tables come from the construction (passGateCells.ts).
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { checkSweep, sweepVectors } from '../../src/core/analysis/check.ts';
import { compile } from '../../src/core/compile/compile.ts';
import { DEFAULT_TECHNOLOGY as TECH } from '../../src/core/model/technology.ts';
import { levelName } from '../../src/core/solver/levels.ts';
import { Simulator, type SolveResult } from '../../src/core/solver/simulator.ts';
import { passGateCell } from './passGateCells.ts';
import { reportRows } from '../../src/core/analysis/sweepColumns.ts';

/** The result `base` with the given nets set to definite levels: an earlier state to start from. */
function startingFrom(base: SolveResult, nets: readonly number[], bits: number): SolveResult {
  const volts = base.volts.slice();
  const driven = base.driven.slice();
  nets.forEach((n, i) => {
    volts[n] = (bits >> i) & 1 ? TECH.vdd : 0;
    driven[n] = 1;
  });
  return { ...base, volts, driven };
}

describe('combinational pass-gate cells', () => {
  it('the sweep gives every vector its one steady state, with no X and no error', () => {
    fc.assert(
      fc.property(passGateCell(), ({ netlist, table }) => {
        const report = checkSweep(netlist);
        expect(
          reportRows(report)
            .map((v) => v.outputs.Y)
            .join(''),
        ).toBe(table.join(''));
        expect(report.summary.errors).toBe(0);
      }),
      { numRuns: 150, seed: 21 },
    );
  });

  it('a sequence reaches the same level from any earlier state of the gate-feeding nets', () => {
    fc.assert(
      fc.property(passGateCell(), fc.array(fc.nat(), { minLength: 8, maxLength: 8 }), (cell, starts) => {
        const c = compile(cell.netlist, TECH);
        const sim = new Simulator(c, { incremental: false });
        const gateNets = [...Array(c.netCount).keys()].filter(
          (n) =>
            Number.isNaN(c.railVolts[n]) &&
            !c.inputNets.includes(n) &&
            c.netGates.start[n + 1]! > c.netGates.start[n]!,
        );
        const y = c.netIndex.get('Y') as number;
        [...sweepVectors(cell.netlist.inputs)].forEach((vector, row) => {
          const base = sim.solveFresh(vector);
          for (const bits of [0, -1, ...starts]) {
            const r = sim.solveNext(vector, startingFrom(base, gateNets, bits));
            expect(levelName(r.levels[y]!)).toBe(String(cell.table[row]));
          }
        });
      }),
      { numRuns: 60, seed: 22 },
    );
  });
});
