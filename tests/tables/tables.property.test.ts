/**
 * Internal consistency, no outside source: a table entry is what a full scalar solve writes for the
 * group when the solve's control voltages select that entry, on random cells (binary tables on 0/1
 * vectors, ternary tables on vectors with X inputs too). Fixed seeds.
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { compile } from '../../src/core/compile/compile.ts';
import type { InputValue, InputVector } from '../../src/core/model/design.ts';
import { DEFAULT_TECHNOLOGY } from '../../src/core/model/technology.ts';
import { Simulator, type SolveResult } from '../../src/core/solver/simulator.ts';
import { ComponentTables } from '../../src/core/tables/componentTables.ts';
import {
  binaryEntry,
  STATE_DRIVEN,
  STATE_EXACT,
  ternaryEntry,
  type GroupTable,
} from '../../src/core/tables/table.ts';
import { stagedCell } from '../property/stagedCells.ts';
import { randomNetlist } from '../property/generators.ts';

const VDD = DEFAULT_TECHNOLOGY.vdd;

/** What the solve wrote for the group's nets and elements, in a table's encoding. */
function fromSolve(table: GroupTable, r: SolveResult) {
  const { nets, elements } = table.shape;
  return {
    states: Array.from(nets, (n) => {
      const v = r.volts[n];
      const exact = r.driven[n] === 1 && (v === 0 || v === VDD);
      return r.levels[n]! | (exact ? STATE_EXACT : 0) | (r.driven[n] ? STATE_DRIVEN : 0);
    }),
    flags: Array.from(nets, (n) => r.flags[n]),
    volts: Array.from(nets, (n) => String(r.volts[n])),
    current: elements.some((e) => r.chCurrent[e] !== 0) ? 1 : 0,
  };
}

function fromTable(table: GroupTable, e: number) {
  const w = table.shape.nets.length;
  return {
    states: Array.from(table.states.subarray(e * w, (e + 1) * w)),
    flags: Array.from(table.flags.subarray(e * w, (e + 1) * w)),
    volts: Array.from(table.volts.subarray(e * w, (e + 1) * w), String),
    current: table.current[e],
  };
}

/** Checks every group with a table against one solved vector; returns how many entries were compared. */
function compareAll(tables: ComponentTables, r: SolveResult, ternary: boolean): number {
  let compared = 0;
  for (const shape of tables.shapes) {
    const table = ternary ? tables.ternary(shape.index) : tables.binary(shape.index);
    if (table.kind !== 'table') continue;
    const e = ternary ? ternaryEntry(shape, r.volts, VDD) : binaryEntry(shape, r.volts, VDD);
    if (e < 0) continue;
    expect(fromTable(table, e)).toEqual(fromSolve(table, r));
    compared++;
  }
  return compared;
}

function vectors(inputs: readonly string[], values: readonly InputValue[]): InputVector[] {
  const out: InputVector[] = [];
  for (let k = 0; k < values.length ** inputs.length; k++) {
    let rest = k;
    out.push(
      Object.fromEntries(
        inputs.map((name) => {
          const v = values[rest % values.length]!;
          rest = Math.floor(rest / values.length);
          return [name, v];
        }),
      ),
    );
  }
  return out;
}

describe('a table entry equals a full solve of the vector that selects it', () => {
  it('binary tables on random staged cells (every 0/1 vector)', () => {
    let compared = 0;
    fc.assert(
      fc.property(stagedCell({ maxInputs: 5, maxStages: 6 }), ({ netlist }) => {
        const compiled = compile(netlist, DEFAULT_TECHNOLOGY);
        const tables = new ComponentTables(compiled);
        const sim = new Simulator(compiled, { incremental: false });
        for (const v of vectors(netlist.inputs, ['0', '1']))
          compared += compareAll(tables, sim.solveFresh(v), false);
      }),
      { numRuns: 120, seed: 1201 },
    );
    expect(compared).toBeGreaterThan(1000);
  });

  it('ternary tables, inputs also at X, and random netlists with loops', () => {
    const cells = fc.oneof(
      stagedCell({ maxInputs: 3, maxStages: 4 }).map((c) => c.netlist),
      randomNetlist(),
    );
    fc.assert(
      fc.property(cells, (netlist) => {
        const compiled = compile(netlist, DEFAULT_TECHNOLOGY);
        const tables = new ComponentTables(compiled);
        const sim = new Simulator(compiled);
        for (const v of vectors(netlist.inputs, ['0', '1', 'X'])) {
          const r = sim.solveFresh(v);
          compareAll(tables, r, true);
          compareAll(tables, r, false);
        }
      }),
      { numRuns: 150, seed: 1202 },
    );
  });
});
