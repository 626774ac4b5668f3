import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { compile } from '../../src/core/compile/compile.ts';
import type { InputValue, InputVector } from '../../src/core/model/design.ts';
import type { Netlist } from '../../src/core/model/netlist.ts';
import { DEFAULT_TECHNOLOGY } from '../../src/core/model/technology.ts';
import { LeakageEstimator } from '../../src/core/power/leakage.ts';
import { Simulator, type SolveResult } from '../../src/core/solver/simulator.ts';
import { STARTERS } from '../../src/core/starters/index.ts';
import { randomNetlist } from './generators.ts';
import { passGateCell } from './passGateCells.ts';
import { stagedCell } from './stagedCells.ts';

// Internal consistency, no outside source: reusing a component's undriven-net solve across vectors
// (docs/semantics.md §2, components) must give every vector's leakage to the last bit, as solving
// every vector afresh does.
const value = fc.constantFrom<InputValue>('0', '1', '0', '1', 'X', 'Z');
const netlists = fc.oneof(
  fc.constantFrom(...STARTERS.map((s) => s.design.netlist)),
  randomNetlist(),
  stagedCell({ maxInputs: 5, maxStages: 5 }).map((c) => c.netlist),
  passGateCell().map((c) => c.netlist),
);

/** Every 0/1 vector in counting order (the sweep), then the extra rows with X and Z. */
function vectors(netlist: Netlist, rows: readonly (readonly InputValue[])[]): InputVector[] {
  const names = netlist.inputs;
  const sweep = Array.from({ length: 2 ** names.length }, (_, i) =>
    Object.fromEntries(
      names.map((n, b): [string, InputValue] => [n, (i >> (names.length - 1 - b)) & 1 ? '1' : '0']),
    ),
  );
  const extra = rows.map((row) => Object.fromEntries(names.map((n, i) => [n, row[i % row.length]!])));
  return [...sweep, ...extra];
}

/** Solves the vectors in turn and compares the two estimates on each result as it comes. */
function expectSameLeakage(
  netlist: Netlist,
  all: readonly InputVector[],
  solve: (simulator: Simulator, v: InputVector, previous: SolveResult | null) => SolveResult,
): void {
  const compiled = compile(netlist, DEFAULT_TECHNOLOGY);
  const simulator = new Simulator(compiled);
  const reusing = new LeakageEstimator(compiled);
  const plain = new LeakageEstimator(compiled, { reuse: false });
  let previous: SolveResult | null = null;
  for (const v of all) {
    const result = solve(simulator, v, previous);
    const expected = plain.of(result);
    const got = reusing.of(result);
    expect(Object.is(got.watts, expected.watts), JSON.stringify(v)).toBe(true);
    expect(Object.is(got.current, expected.current)).toBe(true);
    previous = result;
  }
}

describe('leakage reused per component state', () => {
  const rows = fc.array(fc.array(value, { minLength: 3, maxLength: 3 }), { maxLength: 12 });

  it('equals the plain estimate bit for bit on every vector of a sweep (each vector solved afresh)', () => {
    fc.assert(
      fc.property(netlists, rows, (netlist, extra) => {
        const all = vectors(netlist, extra);
        // Twice over, so that the second round is answered from the stored states.
        expectSameLeakage(netlist, [...all, ...all], (simulator, v) => simulator.solveFresh(v));
      }),
      { numRuns: 150 },
    );
  });

  it('equals it in a sequence too, where floating nets carry their charge from step to step', () => {
    fc.assert(
      fc.property(netlists, rows, (netlist, extra) => {
        const all = vectors(netlist, extra);
        expectSameLeakage(netlist, [...all, ...all], (simulator, v, previous) =>
          previous ? simulator.solveNext(v, previous) : simulator.solveFresh(v),
        );
      }),
      { numRuns: 100 },
    );
  });
});
