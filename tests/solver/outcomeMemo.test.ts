import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { compile } from '../../src/core/compile/compile.ts';
import { circuit } from '../../src/core/model/builder.ts';
import type { InputValue, InputVector } from '../../src/core/model/design.ts';
import type { Netlist } from '../../src/core/model/netlist.ts';
import { DEFAULT_TECHNOLOGY } from '../../src/core/model/technology.ts';
import { levelName } from '../../src/core/solver/levels.ts';
import { OutcomeStore } from '../../src/core/solver/memo.ts';
import { Simulator, type SolveResult } from '../../src/core/solver/simulator.ts';
import { buildTopology } from '../../src/core/solver/topology.ts';
import { STARTERS } from '../../src/core/starters/index.ts';
import { solveSnapshot } from '../helpers.ts';
import { randomNetlist } from '../property/generators.ts';
import { passGateCell } from '../property/passGateCells.ts';

// The outcome memo (src/core/solver/memo.ts) replays a component's outcome when its gates and tied
// sources sit at 0, VDD or unknown, and shares its tables across the schedules of different undriven
// inputs. Replaying must never change an answer.

function nand2(): Netlist {
  return circuit('nand2')
    .rails()
    .input('A', 'B')
    .output('Y')
    .pmos('PA', { g: 'A', d: 'Y', s: 'VDD', w: 2 })
    .pmos('PB', { g: 'B', d: 'Y', s: 'VDD', w: 2 })
    .nmos('NA', { g: 'A', d: 'Y', s: 'm', w: 2 })
    .nmos('NB', { g: 'B', d: 'm', s: 'GND', w: 2 })
    .build();
}

describe('outcome memo with unknown inputs', () => {
  // IEEE Std 1364-2005, 7.2 (nand truth table, from memory): nand(0, z) = 1 and nand(1, z) = x.
  // A floating gate makes its device maybe-conducting (docs/semantics.md §2 item 1), which gives the
  // same answers at switch level.
  it('an undriven input of a NAND2 gives 1 with the other input at 0 and X with it at 1, memo warm or cold', () => {
    const compiled = compile(nand2(), DEFAULT_TECHNOLOGY);
    const warm = new Simulator(compiled);
    const order: InputVector[] = [
      { A: '0', B: '1' },
      { A: '1', B: '1' },
      { A: 'Z', B: '0' },
      { A: 'Z', B: '1' },
      { A: '1', B: 'Z' },
      { A: 'Z', B: '0' },
      { A: 'Z', B: '1' },
    ];
    const y = (r: SolveResult) => levelName(r.levels[compiled.netIndex.get('Y')!]!);
    const got = order.map((v) => y(warm.solveFresh(v)));
    expect(got).toEqual(['1', '0', '1', 'X', 'X', '1', 'X']);
    for (const v of order)
      expect(solveSnapshot(warm.solveFresh(v))).toEqual(solveSnapshot(new Simulator(compiled).solveFresh(v)));
  });

  it('a component that an undriven input does not touch shares its table; one it joins does not', () => {
    // A transmission gate from input D to Y (select S and its complement Sb): leaving D undriven puts D
    // into Y's component, while the inverter making Sb is the same component either way.
    const netlist = circuit('tgate')
      .rails()
      .input('D', 'S')
      .output('Y')
      .pmos('PI', { g: 'S', d: 'Sb', s: 'VDD', w: 2 })
      .nmos('NI', { g: 'S', d: 'Sb', s: 'GND', w: 1 })
      .nmos('NT', { g: 'S', d: 'D', s: 'Y', w: 1 })
      .pmos('PT', { g: 'Sb', d: 'D', s: 'Y', w: 2 })
      .build();
    const c = compile(netlist, DEFAULT_TECHNOLOGY);
    const driven = buildTopology(c);
    const undriven = buildTopology(c, new Set([c.netIndex.get('D')!]));
    const store = new OutcomeStore();
    const componentOf = (t: typeof driven, net: string) => t.cccOfNet[c.netIndex.get(net)!]!;
    const sb = [
      store.tableFor(driven, componentOf(driven, 'Sb')),
      store.tableFor(undriven, componentOf(undriven, 'Sb')),
    ];
    const y = [
      store.tableFor(driven, componentOf(driven, 'Y')),
      store.tableFor(undriven, componentOf(undriven, 'Y')),
    ];
    expect(sb[0]).toBe(sb[1]);
    expect(y[0]).not.toBe(y[1]);
  });

  const value = fc.constantFrom<InputValue>('0', '1', 'X', 'Z');
  const cells = fc.oneof(
    fc.constantFrom(...STARTERS.map((s) => s.design.netlist)),
    randomNetlist(),
    passGateCell().map((p) => p.netlist),
  );
  it('a simulator that has solved other vectors (other undriven inputs among them) answers as a new one', () => {
    fc.assert(
      fc.property(
        cells,
        fc.array(fc.array(value, { minLength: 4, maxLength: 4 }), { minLength: 2, maxLength: 10 }),
        (netlist, rows) => {
          const compiled = compile(netlist, DEFAULT_TECHNOLOGY);
          const reused = new Simulator(compiled);
          for (const row of rows) {
            const v: InputVector = Object.fromEntries(
              netlist.inputs.map((n, i) => [n, row[i % row.length]!]),
            );
            expect(solveSnapshot(reused.solveFresh(v))).toEqual(
              solveSnapshot(new Simulator(compiled).solveFresh(v)),
            );
          }
        },
      ),
      { numRuns: 200 },
    );
  });
});
