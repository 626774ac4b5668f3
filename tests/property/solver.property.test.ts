import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { checkSequence, checkSweep } from '../../src/core/analysis/check.ts';
import type { CheckReport } from '../../src/core/analysis/report.ts';
import type { Netlist } from '../../src/core/model/netlist.ts';
import { STARTERS } from '../../src/core/starters/index.ts';
import { complementaryGate, conducts, passNetwork, randomNetlist, spTree } from './generators.ts';
import { reportRows } from '../../src/core/analysis/sweepColumns.ts';

const INPUTS = ['A', 'B', 'C', 'D'];

describe('complementary static CMOS gates', () => {
  // A pull-down network and its dual pull-up conduct under complementary conditions, so the output is
  // always driven by exactly one of them (W&H 4th ed. §1.4, complementary CMOS; common practice).
  it('never short or float, and compute the complement of the pull-down function', () => {
    fc.assert(
      fc.property(spTree(INPUTS), (tree) => {
        const used = INPUTS.filter((i) => conducts(tree).includes(i));
        const gate = complementaryGate(tree, used);
        const report = checkSweep(gate, { expectations: { Y: `!${conducts(tree)}` } });
        expect(report.summary.short).toBe(0);
        expect(report.summary.floating).toBe(0);
        expect(report.summary['static-current']).toBe(0);
        expect(report.summary.mismatch).toBe(0);
      }),
      { numRuns: 150 },
    );
  });
});

/**
 * What a result says, independent of the order anything was listed in. Levels and findings must match
 * exactly; voltages and currents come from linear solves whose rounding depends on the order of the
 * unknowns, so they are compared separately, to a relative 1e-9.
 */
function fingerprint(report: CheckReport): unknown {
  const rows = reportRows(report);
  return {
    rows: rows.map((v) => ({
      outputs: v.outputs,
      known: Object.fromEntries(Object.entries(v.voltages).map(([k, x]) => [k, x !== null])),
    })),
    findings: report.findings
      .map((f) => `${f.kind}|${f.vector}|${[...f.nets].sort().join(',')}|${[...f.devices].sort().join(',')}`)
      .sort(),
  };
}

function expectSameNumbers(a: CheckReport, b: CheckReport): void {
  const close = (x: number, y: number): boolean =>
    Math.abs(x - y) <= 1e-9 * Math.max(1, Math.abs(x), Math.abs(y));
  const rowsA = reportRows(a);
  const rowsB = reportRows(b);
  rowsA.forEach((row, i) => {
    const other = rowsB[i]!;
    expect(close(row.supplyCurrent, other.supplyCurrent)).toBe(true);
    for (const [net, v] of Object.entries(row.voltages)) {
      const w = other.voltages[net];
      expect(v === null || w === null || w === undefined ? v === w : close(v, w)).toBe(true);
    }
  });
}

/** The two reports say the same thing. */
function expectSameResult(a: CheckReport, b: CheckReport): void {
  expect(fingerprint(a)).toEqual(fingerprint(b));
  expectSameNumbers(a, b);
}

function shuffled(netlist: Netlist, order: number[]): Netlist {
  const devices = [...netlist.devices];
  order.forEach((j, i) => {
    const k = j % devices.length;
    [devices[i % devices.length], devices[k]] = [devices[k]!, devices[i % devices.length]!];
  });
  return { ...netlist, devices, rails: [...netlist.rails].reverse() };
}

describe('determinism', () => {
  it('shuffling device and rail order never changes a starter cell result (sweep and sequences)', () => {
    fc.assert(
      fc.property(
        fc.constantFrom(...STARTERS),
        fc.array(fc.nat(), { minLength: 1, maxLength: 20 }),
        (starter, order) => {
          const { netlist, expectations, sequences } = starter.design;
          const other = shuffled(netlist, order);
          expectSameResult(
            checkSweep(other, { expectations, allNets: true }),
            checkSweep(netlist, { expectations, allNets: true }),
          );
          for (const s of sequences) {
            expectSameResult(
              checkSequence(other, s.steps, { allNets: true }),
              checkSequence(netlist, s.steps, { allNets: true }),
            );
          }
        },
      ),
      { numRuns: 60 },
    );
  });
  it('shuffling never changes a random netlist result', () => {
    fc.assert(
      fc.property(randomNetlist(), fc.array(fc.nat(), { minLength: 1, maxLength: 12 }), (netlist, order) => {
        expectSameResult(
          checkSweep(shuffled(netlist, order), { allNets: true }),
          checkSweep(netlist, { allNets: true }),
        );
      }),
      { numRuns: 200 },
    );
  });
});

describe('the limiting transistor of a degraded level', () => {
  // docs/semantics.md §2: among the paths that reach a net's best level, the device that made the last
  // drop, the smallest name where they disagree. Our own rule: no published source applies.
  it('does not depend on device order in pass networks', () => {
    const limiters = (report: CheckReport): string[] =>
      report.findings.filter((f) => f.kind === 'degraded').map((f) => `${f.vector}|${f.nets}|${f.devices}`);
    fc.assert(
      fc.property(passNetwork(), fc.array(fc.nat(), { minLength: 1, maxLength: 12 }), (netlist, order) => {
        const a = limiters(checkSweep(shuffled(netlist, order)));
        const b = limiters(checkSweep(netlist));
        expect(a.sort()).toEqual(b.sort());
      }),
      { numRuns: 300, seed: 9 },
    );
  });
});

describe('robustness', () => {
  it('random netlists never crash the solver and always give a level per output', () => {
    fc.assert(
      fc.property(randomNetlist(), fc.boolean(), (netlist, undriven) => {
        const report = checkSweep(netlist, { undrivenInputs: undriven });
        for (const v of reportRows(report)) {
          for (const level of Object.values(v.outputs)) expect(['0', '1', 'X', 'Z']).toContain(level);
          expect(Number.isFinite(v.supplyCurrent)).toBe(true);
        }
      }),
      { numRuns: 300 },
    );
  });
});
