/**
 * Component tables (docs/semantics.md §10): a group's table is the engine's own evaluation of that
 * group for every control assignment, so tables of textbook gates are their truth tables, and an entry
 * equals a full solve of any vector that produces it.
 */
import { describe, expect, it } from 'vitest';
import { compile } from '../../src/core/compile/compile.ts';
import type { Netlist } from '../../src/core/model/netlist.ts';
import { DEFAULT_TECHNOLOGY } from '../../src/core/model/technology.ts';
import { FLAG_STATES, LEVEL_0, LEVEL_1, levelName } from '../../src/core/solver/levels.ts';
import { starterById } from '../../src/core/starters/index.ts';
import { ComponentTables } from '../../src/core/tables/componentTables.ts';
import {
  binaryEntry,
  STATE_EXACT,
  STATE_LEVEL,
  ternaryEntry,
  type GroupTable,
} from '../../src/core/tables/table.ts';
import { nandLatch } from '../cells.ts';
import { fixtureCell } from '../solver/fixtures.ts';

const VDD = DEFAULT_TECHNOLOGY.vdd;

/** The tables of a netlist, and lookups by net name. */
function tablesOf(netlist: Netlist, options = {}) {
  const compiled = compile(netlist, DEFAULT_TECHNOLOGY);
  const tables = new ComponentTables(compiled, options);
  const net = (name: string): number => compiled.netIndex.get(name) as number;
  const tableOf = (name: string): GroupTable => {
    const found = tables.binary(tables.groupOfNet[net(name)]!);
    if (found.kind !== 'table') throw new Error(found.reason);
    return found;
  };
  /** Level of `name` in its group's table with the named controls at 0/1 (others at 0). */
  const level = (name: string, controls: Record<string, 0 | 1>): string => {
    const table = tableOf(name);
    const volts = new Float64Array(compiled.netCount);
    for (const [c, v] of Object.entries(controls)) volts[net(c)] = v * VDD;
    const entry = binaryEntry(table.shape, volts, VDD);
    const i = table.shape.nets.indexOf(net(name));
    return levelName(table.states[entry * table.shape.nets.length + i]! & STATE_LEVEL);
  };
  return { compiled, tables, net, tableOf, level };
}

const bits = (k: number, n: number): (0 | 1)[] =>
  Array.from({ length: n }, (_, i) => ((k >> (n - 1 - i)) & 1) as 0 | 1);

/** The textbook gates' truth tables (common practice, no source). */
const GATES: [string, string[], (v: (0 | 1)[]) => boolean][] = [
  ['inverter', ['A'], ([a]) => !a],
  ['nand2', ['A', 'B'], ([a, b]) => !(a && b)],
  ['nor2', ['A', 'B'], ([a, b]) => !(a || b)],
  ['aoi21', ['A', 'B', 'C'], ([a, b, c]) => !((a && b) || c)],
];

describe('tables of textbook gates equal their truth tables', () => {
  for (const [id, inputs, f] of GATES) {
    it(`${id}: Y at an exact rail for every vector, clean`, () => {
      const { level, tableOf } = tablesOf(starterById(id)!.design.netlist);
      expect(tableOf('Y').shape.controls.length).toBe(inputs.length);
      for (let k = 0; k < 2 ** inputs.length; k++) {
        const v = bits(k, inputs.length);
        const controls = Object.fromEntries(inputs.map((n, i) => [n, v[i]!]));
        expect(level('Y', controls)).toBe(f(v) ? '1' : '0');
      }
      const table = tableOf('Y');
      const y = table.shape.nets.indexOf(tablesOf(starterById(id)!.design.netlist).net('Y'));
      for (let e = 0; e < table.entries; e++) {
        expect(table.states[e * table.shape.nets.length + y]! & STATE_EXACT).toBe(STATE_EXACT);
        expect(table.cleanObserved[e]).toBe(1);
        expect(table.current[e]).toBe(0);
      }
    });
  }

  it('transmission-gate multiplexer: Y = S ? D1 : D0 where the select and its complement agree', () => {
    const { level, tableOf } = tablesOf(starterById('mux2')!.design.netlist);
    // Controls: S, its complement Sb (an inverter's output), and the data inputs tied to the channels.
    expect(tableOf('Y').shape.controls.length).toBe(4);
    for (let k = 0; k < 8; k++) {
      const [s, d1, d0] = bits(k, 3) as [0 | 1, 0 | 1, 0 | 1];
      expect(level('Y', { S: s, Sb: (1 - s) as 0 | 1, D1: d1, D0: d0 })).toBe(String(s ? d1 : d0));
    }
    // Both gates on with different data: a fight, which the table records as the engine solves it.
    expect(level('Y', { S: 1, Sb: 0, D1: 1, D0: 1 })).toBe('1');
    expect(level('Y', { S: 0, Sb: 0, D0: 0, D1: 1 })).toBe('X');
  });
});

describe('groups with feedback', () => {
  it('the transmission-gate carry TGC: one group over A, B, CI with a definite table', () => {
    const { tables, compiled, net } = tablesOf(fixtureCell('tgc.sp').netlist);
    const loop = tables.shapes.find((s) => s.feedback)!;
    expect(Array.from(loop.controls, (n) => compiled.netNames[n]).sort()).toEqual(['A', 'B', 'CI']);
    const table = tables.binary(loop.index) as GroupTable;
    const k = loop.nets.indexOf(net('K'));
    const names = Array.from(loop.controls, (n) => compiled.netNames[n]);
    for (let e = 0; e < table.entries; e++) {
      const value = (name: string): number => (e >> names.indexOf(name)) & 1;
      const majority = value('A') + value('B') + value('CI') >= 2;
      // K is the inverted carry (majority of three, common practice).
      expect(table.states[e * loop.nets.length + k]! & STATE_LEVEL).toBe(majority ? LEVEL_0 : LEVEL_1);
      for (let i = 0; i < loop.nets.length; i++)
        expect(table.flags[e * loop.nets.length + i]! & FLAG_STATES).toBe(0);
    }
  });

  it("a NAND latch's group holds stored state where both set and reset are released", () => {
    const { tableOf, level } = tablesOf(nandLatch);
    const table = tableOf('Q');
    expect(table.shape.feedback).toBe(true);
    expect(level('Q', { SN: 1, RN: 1 })).toBe('X');
    expect(level('Q', { SN: 0, RN: 1 })).toBe('1');
    expect(level('Q', { SN: 1, RN: 0 })).toBe('0');
    const held = Array.from({ length: table.entries }, (_, e) =>
      Array.from(
        table.shape.nets,
        (_, i) => table.flags[e * table.shape.nets.length + i]! & FLAG_STATES,
      ).some(Boolean),
    );
    expect(held.filter(Boolean)).toHaveLength(1);
  });
});

describe('bounds and the ternary option', () => {
  it('a group past the bound gets no table, with the reason', () => {
    const { tables, net } = tablesOf(starterById('aoi21')!.design.netlist, { maxControls: 2 });
    const found = tables.binary(tables.groupOfNet[net('Y')]!);
    expect(found.kind).toBe('none');
    if (found.kind === 'none') expect(found.reason).toMatch(/3 controls exceed the table bound of 2/);
  });

  it('an inverter with its input at X: Y is X in the ternary table, and entries index by base 3', () => {
    const { tables, net, compiled } = tablesOf(starterById('inverter')!.design.netlist);
    const table = tables.ternary(tables.groupOfNet[net('Y')]!) as GroupTable;
    expect(table.entries).toBe(3);
    const volts = new Float64Array(compiled.netCount);
    const levelAt = (a: number): string => {
      volts[net('A')] = a;
      return levelName(table.states[ternaryEntry(table.shape, volts, VDD)]! & STATE_LEVEL);
    };
    expect([levelAt(0), levelAt(VDD), levelAt(NaN)]).toEqual(['1', '0', 'X']);
    volts[net('A')] = 1.2;
    expect(ternaryEntry(table.shape, volts, VDD)).toBe(-1);
    expect(binaryEntry(table.shape, volts, VDD)).toBe(-1);
  });
});
