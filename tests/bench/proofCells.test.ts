/**
 * The proof rows' generators: transistor counts from the gates they are built of, and their
 * functions checked through the solver against arithmetic.
 */
import { describe, expect, it } from 'vitest';
import { checkSweep } from '../../src/core/analysis/check.ts';
import { reportRows } from '../../src/core/analysis/sweepColumns.ts';
import type { Netlist } from '../../src/core/model/netlist.ts';
import { rippleAdder, transistorCount } from '../../bench/generators/index.ts';
import {
  equalityComparator,
  equalityExpectation,
  miswire,
  nandFullAdder,
  nandRippleAdder,
} from '../../bench/generators/proofCells.ts';

function names(netlist: Netlist): { duplicates: string[]; undriven: string[] } {
  const seen = new Set<string>();
  const duplicates = netlist.devices.map((d) => d.name).filter((n) => seen.has(n) || !seen.add(n));
  const driven = new Set([...netlist.inputs, ...netlist.rails.map((r) => r.net)]);
  for (const d of netlist.devices)
    if (d.kind === 'nmos' || d.kind === 'pmos') driven.add(d.drain).add(d.source);
  const undriven = netlist.devices.flatMap((d) =>
    (d.kind === 'nmos' || d.kind === 'pmos') && !driven.has(d.gate) ? [d.gate] : [],
  );
  return { duplicates, undriven };
}

/** The number the levels of `stem`0… spell, least significant first. */
const word = (values: Record<string, string | number>, stem: string, bits: number): number =>
  Array.from({ length: bits }, (_, i) => (String(values[`${stem}${i}`]) === '1' ? 2 ** i : 0)).reduce(
    (a, b) => a + b,
    0,
  );

describe('structure', () => {
  it('32-bit comparator: 64 inputs, 1,018 transistors (64 two-inverter buffers, 32 XNORs of four NAND2 and an inverter, 31 AND2)', () => {
    // Static CMOS inverter 2, NAND2 4 transistors (common practice, no source).
    const eq = equalityComparator(32);
    expect(eq.inputs).toHaveLength(64);
    expect(transistorCount(eq)).toBe(64 * 4 + 32 * 18 + 31 * 6);
    expect(names(eq)).toEqual({ duplicates: [], undriven: [] });
  });

  it('NAND full adder: nine NAND2, 36 transistors; 32 bits make 1,152 against 896 for the mirror adder', () => {
    expect(nandFullAdder('F.', { a: 'A', b: 'B', ci: 'C', sum: 'S', co: 'CO' })).toHaveLength(36);
    const adder = nandRippleAdder(32);
    expect(transistorCount(adder)).toBe(1152);
    expect(transistorCount(rippleAdder(32))).toBe(896);
    expect(adder.inputs).toEqual(rippleAdder(32).inputs);
    expect(adder.outputs).toEqual(rippleAdder(32).outputs);
    expect(names(adder)).toEqual({ duplicates: [], undriven: [] });
  });

  it('miswire moves one gate and refuses a name that is no transistor', () => {
    const wrong = miswire(nandRippleAdder(2), 'FA1.g5.NA', 'CI');
    const moved = wrong.devices.filter(
      (d, i) => JSON.stringify(d) !== JSON.stringify(nandRippleAdder(2).devices[i]),
    );
    expect(moved).toEqual([expect.objectContaining({ name: 'FA1.g5.NA', gate: 'CI' })]);
    expect(() => miswire(nandRippleAdder(2), 'nothing', 'CI')).toThrow(RangeError);
  });
});

describe('function through the solver', () => {
  it('a 4-bit comparator gives EQ = 1 exactly when A = B, and its expected function says so', () => {
    const report = checkSweep(equalityComparator(4), { expectations: { EQ: equalityExpectation(4) } });
    for (const row of reportRows(report)) {
      const same = word(row.inputs, 'A', 4) === word(row.inputs, 'B', 4);
      expect(row.outputs.EQ).toBe(same ? '1' : '0');
    }
    expect(report.summary.errors + report.summary.warnings).toBe(0);
  });

  it('a 4-bit NAND ripple adder adds: S + 16·CO = A + B + CI for all 512 vectors', () => {
    const report = checkSweep(nandRippleAdder(4));
    for (const row of reportRows(report)) {
      const sum = word(row.inputs, 'A', 4) + word(row.inputs, 'B', 4) + Number(row.inputs.CI);
      expect(word(row.outputs, 'S', 4) + (row.outputs.CO === '1' ? 16 : 0)).toBe(sum);
    }
  });
});
