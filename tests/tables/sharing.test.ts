/**
 * Identical groups share one table (docs/semantics.md §10): internal consistency, no outside source.
 * Every table a group receives from an identical one equals, array for array, the table built by
 * evaluating that group itself; and two adders of the bench's bank, 16 copies of one full adder,
 * build a handful of tables for their 64 groups. Fixed seeds.
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { compile } from '../../src/core/compile/compile.ts';
import type { Netlist } from '../../src/core/model/netlist.ts';
import { DEFAULT_TECHNOLOGY } from '../../src/core/model/technology.ts';
import { TableBench } from '../../src/core/tables/build.ts';
import { ComponentTables } from '../../src/core/tables/componentTables.ts';
import type { GroupTable, NoTable } from '../../src/core/tables/table.ts';
import { adderBank, inverterChain, muxTree, ratioedDecoder } from '../../bench/generators/index.ts';
import { nandLatch } from '../cells.ts';
import { passNetwork, randomNetlist } from '../property/generators.ts';
import { stagedCell } from '../property/stagedCells.ts';

/** A table's contents as plain arrays (NaN volts as text, so they compare). */
function contents(t: GroupTable | NoTable) {
  if (t.kind === 'none') return { reason: t.reason };
  return {
    states: Array.from(t.states),
    flags: Array.from(t.flags),
    volts: Array.from(t.volts, String),
    current: Array.from(t.current),
    clean: Array.from(t.clean),
    cleanObserved: Array.from(t.cleanObserved),
  };
}

/** Checks every group's shared tables against its own; returns how many tables were shared. */
function sharedEqualOwn(netlist: Netlist): { shared: number; groups: number } {
  const compiled = compile(netlist, DEFAULT_TECHNOLOGY);
  const tables = new ComponentTables(compiled);
  const own = new ComponentTables(compiled);
  const bench = new TableBench(compiled, own.schedule);
  for (const shape of tables.shapes) {
    for (const ternary of [false, true]) {
      const got = ternary ? tables.ternary(shape.index) : tables.binary(shape.index);
      expect(got.shape).toBe(shape);
      if (got.kind === 'none') continue;
      expect(contents(got)).toEqual(contents(bench.build(shape, ternary)));
    }
  }
  return { shared: tables.shared, groups: tables.shapes.length };
}

describe('identical groups share one table', () => {
  it('two adders of the bench bank: 64 groups, tables built once per kind of group', () => {
    const { shared, groups } = sharedEqualOwn(adderBank(2));
    // 16 mirror full adders of four groups each (carry, inverted carry, sum, inverted sum; common
    // practice, no source). The first bit's carry-in is GND, so its carry and sum groups differ from
    // the others', and its buffers differ by load: at most 6 kinds, each built once per kind of table.
    expect(groups).toBe(64);
    expect(shared).toBeGreaterThanOrEqual(2 * (64 - 6));
  });

  it.each([
    ['a 12-stage inverter chain', inverterChain(12)],
    ['a 1-select-bit transmission-gate multiplexer tree', muxTree(1)],
    ['a 4-address-bit pseudo-NMOS decoder', ratioedDecoder(4)],
    ['a NAND latch (feedback: never shared)', nandLatch],
  ])('%s: every shared table is the group own', (_, netlist) => {
    sharedEqualOwn(netlist);
  });

  it('random staged cells, random wiring and pass networks', () => {
    const cells = fc.oneof(
      stagedCell({ maxInputs: 5, maxStages: 6 }).map((c) => c.netlist),
      randomNetlist(),
      passNetwork(),
    );
    let shared = 0;
    fc.assert(
      fc.property(cells, (netlist) => {
        shared += sharedEqualOwn(netlist).shared;
      }),
      { numRuns: 150, seed: 1203 },
    );
    expect(shared).toBeGreaterThan(20);
  });
});
