/**
 * The compiled form the solver runs on: numbering, adjacency, on-resistance and net capacitance.
 * Values are worked by hand from the default technology (core/model/technology.ts: Rn 13 kΩ and Rp
 * 31 kΩ at W/L = 1, RCN 2nd ed. table 3.3, from memory; Cox 6 fF/µm² from memory; 1 fF/µm diffusion,
 * common practice, no source).
 */
import { describe, expect, it } from 'vitest';
import { compile, CompileError, NMOS, PMOS, RESISTOR } from '../../src/core/compile/compile.ts';
import { circuit } from '../../src/core/model/builder.ts';
import { DEFAULT_TECHNOLOGY as TECH } from '../../src/core/model/technology.ts';
import { inverter, resistorLoadInverter } from '../cells.ts';

function rowOf(start: Int32Array, items: Int32Array, row: number): number[] {
  return Array.from(items.subarray(start[row], start[row + 1]));
}

describe('compile', () => {
  it('numbers nets and channel elements and files each element under its nets', () => {
    const c = compile(inverter, TECH);
    const y = c.netIndex.get('Y') as number;
    const a = c.netIndex.get('A') as number;
    expect(c.netCount).toBe(c.netNames.length);
    expect([...c.chKind]).toEqual([PMOS, NMOS]);
    expect(rowOf(c.netChannels.start, c.netChannels.items, y)).toEqual([0, 1]);
    expect(rowOf(c.netGates.start, c.netGates.items, a)).toEqual([0, 1]);
    expect(c.railVolts[c.netIndex.get('VDD') as number]).toBe(2.5);
    expect(c.railVolts[c.netIndex.get('GND') as number]).toBe(0);
    expect(Number.isNaN(c.railVolts[y])).toBe(true);
  });

  it('gives each transistor R·L/W and each resistor its ohms', () => {
    const c = compile(inverter, TECH);
    // P1: W = 2 µm, L = 0.25 µm → 31 kΩ · 0.125 = 3.875 kΩ; N1: W = 1 µm → 13 kΩ · 0.25 = 3.25 kΩ.
    expect(c.chOhms[0]).toBeCloseTo(3875, 6);
    expect(c.chOhms[1]).toBeCloseTo(3250, 6);
    const r = compile(resistorLoadInverter, TECH);
    expect(r.chKind[0]).toBe(RESISTOR);
    expect(r.chOhms[0]).toBe(40e3);
    expect(r.chGate[0]).toBe(-1);
  });

  it('adds gate area and diffusion width into each net capacitance', () => {
    const c = compile(inverter, TECH);
    // Y: two drains, (2 + 1) µm · 1 fF/µm = 3 fF. A: two gates, (2 + 1) µm · 0.25 µm · 6 fF/µm² = 4.5 fF.
    expect(c.netCap[c.netIndex.get('Y') as number]).toBeCloseTo(3e-15, 27);
    expect(c.netCap[c.netIndex.get('A') as number]).toBeCloseTo(4.5e-15, 27);
  });

  it('refuses an input that is also a rail, naming it', () => {
    const bad = circuit('bad')
      .rails()
      .input('VDD')
      .output('Y')
      .nmos('N1', { g: 'VDD', d: 'Y', s: 'GND' })
      .build();
    expect(() => compile(bad, TECH)).toThrow(CompileError);
    expect(() => compile(bad, TECH)).toThrow(/VDD/);
  });
});
