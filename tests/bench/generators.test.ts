/**
 * Structural checks of the benchmark's circuit generators: transistor counts against the textbook
 * figures, unique names, and no gate left hanging. Their logic is checked with the solver in
 * generatorsFunction.test.ts.
 */
import { describe, expect, it } from 'vitest';
import type { Device, MosDevice, Netlist } from '../../src/core/model/netlist.ts';
import {
  adderBank,
  inverterChain,
  mirrorFullAdder,
  muxTree,
  ratioedDecoder,
  rippleAdder,
  rotateLeft,
  transistorCount,
} from '../../bench/generators/index.ts';

const mos = (devices: readonly Device[]): MosDevice[] =>
  devices.filter((d): d is MosDevice => d.kind === 'nmos' || d.kind === 'pmos');

/** Every gate is driven by a pin, a rail, or some channel's drain or source. */
function undrivenGates(netlist: Netlist): string[] {
  const driven = new Set([...netlist.inputs, ...netlist.rails.map((r) => r.net)]);
  for (const d of mos(netlist.devices)) driven.add(d.drain).add(d.source);
  return mos(netlist.devices)
    .map((d) => d.gate)
    .filter((g) => !driven.has(g));
}

function duplicateNames(netlist: Netlist): string[] {
  const seen = new Set<string>();
  return netlist.devices.map((d) => d.name).filter((n) => seen.has(n) || !seen.add(n));
}

describe('inverter chain', () => {
  it('has one PMOS and one NMOS per stage (static CMOS inverter: 2 transistors, common practice, no source)', () => {
    const chain = inverterChain(7);
    expect(transistorCount(chain)).toBe(14);
    expect(mos(chain.devices).filter((d) => d.kind === 'pmos')).toHaveLength(7);
    expect(chain.inputs).toEqual(['A']);
    expect(chain.outputs).toEqual(['Y']);
  });

  it('rejects a chain of no stages', () => {
    expect(() => inverterChain(0)).toThrow(RangeError);
  });
});

describe('mirror full adder', () => {
  const cell = mos(mirrorFullAdder('FA.', { a: 'A', b: 'B', ci: 'C', sum: 'S', co: 'CO' }));

  it('has 28 transistors, 14 of each kind (Weste & Harris, CMOS VLSI Design, 4th ed., fig. 11.4, from memory)', () => {
    expect(cell).toHaveLength(28);
    expect(cell.filter((d) => d.kind === 'nmos')).toHaveLength(14);
  });

  it('mirrors: swapping NMOS for PMOS, GND for VDD and n-nodes for p-nodes maps the pull-down onto the pull-up', () => {
    // In the figure the internal nodes of the two networks pair up one to one (n1↔p1 …).
    const swap = (net: string): string => (net === 'GND' ? 'VDD' : net.replace(/^FA\.n(\d)$/, 'FA.p$1'));
    const edge = (g: string, x: string, y: string): string => `${g}:${[x, y].sort().join('-')}`;
    const pullUp = cell.filter((d) => d.kind === 'pmos' && !d.name.includes('.I'));
    const pullDown = cell.filter((d) => d.kind === 'nmos' && !d.name.includes('.I'));
    const mapped = pullDown.map((d) => edge(d.gate, swap(d.drain), swap(d.source))).sort();
    expect(mapped).toEqual(pullUp.map((d) => edge(d.gate, d.drain, d.source)).sort());
    expect(pullUp).toHaveLength(12);
  });
});

describe('ripple-carry adder', () => {
  it('uses 28 transistors per bit and chains the carry', () => {
    const adder = rippleAdder(4);
    expect(transistorCount(adder)).toBe(4 * 28);
    expect(adder.inputs).toEqual(['A0', 'A1', 'A2', 'A3', 'B0', 'B1', 'B2', 'B3', 'CI']);
    expect(adder.outputs).toEqual(['S0', 'S1', 'S2', 'S3', 'CO']);
    expect(undrivenGates(adder)).toEqual([]);
    expect(duplicateNames(adder)).toEqual([]);
  });
});

describe('transmission-gate multiplexer tree', () => {
  it.each([1, 3, 6])('with %i select bits has 4·(2^k − 1) + 2k transistors', (k) => {
    const tree = muxTree(k);
    expect(transistorCount(tree)).toBe(4 * (2 ** k - 1) + 2 * k);
    expect(tree.inputs).toHaveLength(2 ** k + k);
    expect(undrivenGates(tree)).toEqual([]);
    expect(duplicateNames(tree)).toEqual([]);
  });
});

describe('ratioed decoder', () => {
  it.each([1, 3, 5])('with %i address bits has 2^k·(k + 1) + 2k transistors and 2^k lines', (k) => {
    const decoder = ratioedDecoder(k);
    expect(transistorCount(decoder)).toBe(2 ** k * (k + 1) + 2 * k);
    expect(decoder.outputs).toHaveLength(2 ** k);
    expect(undrivenGates(decoder)).toEqual([]);
    expect(duplicateNames(decoder)).toEqual([]);
  });

  it('gives each line a PMOS load with its gate at GND (pseudo-NMOS, common practice, no source)', () => {
    const loads = mos(ratioedDecoder(2).devices).filter((d) => d.kind === 'pmos' && d.gate === 'GND');
    expect(loads.map((d) => d.drain)).toEqual(['Y0', 'Y1', 'Y2', 'Y3']);
  });
});

describe('adder bank for the exhaustive sweep', () => {
  it('has 16 inputs and 1,792 transistors', () => {
    const bank = adderBank();
    expect(bank.inputs).toHaveLength(16);
    expect(transistorCount(bank)).toBe(1792);
    expect(bank.outputs).toHaveLength(8 * 9);
    expect(undrivenGates(bank)).toEqual([]);
    expect(duplicateNames(bank)).toEqual([]);
  });

  it('rotates operand bits left', () => {
    expect(rotateLeft(['b0', 'b1', 'b2', 'b3'], 1)).toEqual(['b3', 'b0', 'b1', 'b2']);
    expect(rotateLeft(['b0', 'b1', 'b2'], 0)).toEqual(['b0', 'b1', 'b2']);
  });
});
