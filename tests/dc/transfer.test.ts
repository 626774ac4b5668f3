import { describe, expect, it } from 'vitest';
import { TransferError, transferCurves, type TransferCurve } from '../../src/core/dc/transfer.ts';
import { circuit } from '../../src/core/model/builder.ts';
import type { Netlist } from '../../src/core/model/netlist.ts';
import { DEFAULT_TECHNOLOGY } from '../../src/core/model/technology.ts';
import { nand2, tristateInverter } from '../../src/core/starters/combinational.ts';
import { cmosInverter, pseudoNmosInverter, squareLaw } from './helpers.ts';

function inverter(wn = 1, wp = 1, l = 0.5): Netlist {
  return cmosInverter(wn, wp, l);
}

function curveOf(netlist: Netlist, tech = DEFAULT_TECHNOLOGY, output = 'Y', options = {}): TransferCurve {
  return transferCurves(netlist, tech, { input: 'A', ...options }).curves[output] as TransferCurve;
}

describe('switching threshold', () => {
  // VM = (VTn + r(VDD − |VTp|)) / (1 + r), r = √(kp/kn): Weste & Harris, CMOS VLSI Design, 4th ed.
  // (2011), example 2.18 form. Sedra & Smith, Microelectronic Circuits, 5th ed. (2004), table 4.8
  // 0.5 µm process: k'n 167, k'p 41.8 µA/V², equal W/L, VDD 3.3 V, VTn 0.7 V, |VTp| 0.8 V → 1.300 V.
  const ss = squareLaw({ vdd: 3.3, vtn: 0.7, vtp: 0.8, kpn: 167e-6, kpp: 41.8e-6 });
  it('S&S 0.5 µm inverter, equal W/L: VM = 1.300 V (±0.005)', () => {
    const r = Math.sqrt(41.8 / 167);
    const closed = (0.7 + r * (3.3 - 0.8)) / (1 + r);
    expect(Math.abs(closed - 1.3)).toBeLessThan(0.005);
    const vm = curveOf(inverter(), ss).vm as number;
    expect(Math.abs(vm - 1.3)).toBeLessThan(0.005);
    expect(Math.abs(vm - closed)).toBeLessThan(1e-4);
  });
});

describe('noise margins of a matched inverter', () => {
  // Weste & Harris, 4th ed., example 2.17 (solution): VDD 1.0 V, Vt 0.35 V, kn = kp: VIL 0.46, VIH
  // 0.54, VOL 0.04, VOH 0.96, NMH = NML = 0.42 V with VOL/VOH at the unity-gain points. The book
  // gives two decimals (its margins come from the rounded levels), so each figure is checked to
  // within that rounding; VIL = (3VDD + 2Vt)/8 and VIH = (5VDD − 2Vt)/8 (Sedra & Smith, 5th ed., from
  // memory) are checked tightly.
  const wh = squareLaw({ vdd: 1.0, vtn: 0.35, vtp: 0.35, kpn: 100e-6, kpp: 100e-6 });
  const y = curveOf(inverter(), wh);
  const book = { vil: 0.46, vih: 0.54, vol: 0.04, voh: 0.96, nml: 0.42, nmh: 0.42 };
  for (const [figure, value] of Object.entries(book)) {
    it(`${figure} = ${value} V`, () => {
      expect(Math.abs((y[figure as keyof typeof book] as number) - value)).toBeLessThanOrEqual(0.0051);
    });
  }
  it('VIL and VIH match the closed forms, VM is VDD/2', () => {
    expect(y.vil).toBeCloseTo((3 * 1.0 + 2 * 0.35) / 8, 6);
    expect(y.vih).toBeCloseTo((5 * 1.0 - 2 * 0.35) / 8, 6);
    expect(y.vm).toBeCloseTo(0.5, 6);
  });
  it('with VOL/VOH at the rails (Sedra & Smith, Rabaey et al.), VOL = 0 and VOH = VDD', () => {
    const rails = curveOf(inverter(), wh, 'Y', { convention: 'rails' });
    expect(rails.vol).toBeCloseTo(0, 6);
    expect(rails.voh).toBeCloseTo(1.0, 6);
    expect(rails.nml).toBeCloseTo(rails.vil as number, 6);
    expect(transferCurves(inverter(), wh, { input: 'A', convention: 'rails' }).convention).toBe('rails');
  });
});

describe('curves beyond the inverter', () => {
  it('a pseudo-NMOS inverter reads its ratioed low at the rail: VOL 0.120 V', () => {
    // The published pseudo-NMOS case (see operatingPoint.test.ts for its sources and derivation).
    const tech = squareLaw({ vdd: 2.5, vtn: 0.4, vtp: 0.4, kpn: 115e-6, kpp: 30e-6 });
    const pseudo = pseudoNmosInverter(1.5 * 0.25, ((115e-6 * 1.5) / 9 / 30e-6) * 0.25);
    const y = curveOf(pseudo, tech, 'Y', { convention: 'rails' });
    expect(Math.abs((y.vol as number) - 0.12)).toBeLessThan(0.001);
    expect(y.voh).toBeCloseTo(2.5, 6);
  });
  it('two equal inverters in a row switch where one does (VM of the buffer = VM of the inverter)', () => {
    const buffer = circuit('buf')
      .rails()
      .input('A')
      .output('Y')
      .pmos('P1', { g: 'A', d: 'm', s: 'VDD', w: 2 })
      .nmos('N1', { g: 'A', d: 'm', s: 'GND', w: 1 })
      .pmos('P2', { g: 'm', d: 'Y', s: 'VDD', w: 2 })
      .nmos('N2', { g: 'm', d: 'Y', s: 'GND', w: 1 })
      .build();
    const one = curveOf(inverter(1, 2, 0.25));
    const two = curveOf(buffer);
    expect(two.inverting).toBe(false);
    expect(two.vm).toBeCloseTo(one.vm as number, 4);
    expect(two.vil as number).toBeLessThan(two.vm as number);
    expect(two.vih as number).toBeGreaterThan(two.vm as number);
  });
  it('chooses the held inputs so the output follows the swept one (NAND2: the other input at 1)', () => {
    const report = transferCurves(nand2, DEFAULT_TECHNOLOGY, { input: 'A' });
    expect(report.hold).toEqual({ B: 1 });
    expect(report.holdChosen).toEqual(['B']);
    expect(report.curves['Y']?.inverting).toBe(true);
    const held = transferCurves(nand2, DEFAULT_TECHNOLOGY, { input: 'A', hold: { B: '0' } });
    expect(held.holdChosen).toEqual([]);
    expect(held.curves['Y']?.vm).toBeNull();
    expect(held.curves['Y']?.notes.join(' ')).toMatch(/does not switch/);
  });
  it('a disabled tristate output has no curve, and says why', () => {
    const y = transferCurves(tristateInverter, DEFAULT_TECHNOLOGY, { input: 'A', hold: { EN: '0' } }).curves[
      'Y'
    ] as TransferCurve;
    expect(y.points.every(([, v]) => v === null)).toBe(true);
    expect(y.vm).toBeNull();
    expect(y.notes.join(' ')).toMatch(/Y, x2: floating/);
  });
  it('samples 0 to VDD evenly', () => {
    const y = curveOf(inverter(), DEFAULT_TECHNOLOGY, 'Y', { points: 11 });
    expect(y.points.map(([v]) => v)).toEqual(Array.from({ length: 11 }, (_, k) => (2.5 * k) / 10));
    expect(y.points[0]?.[1]).toBeCloseTo(2.5, 6);
    expect(y.points[10]?.[1]).toBeCloseTo(0, 6);
  });
});

describe('bad requests', () => {
  it.each([
    [{ input: 'Q' }, /'Q' is not an input/],
    [{ input: 'A', hold: { A: '1' } }, /swept input/],
    [{ input: 'A', hold: { C: '1' } }, /held 'C' is not an input/],
    [{ input: 'A', hold: { B: 'X' } }, /hold inputs at 0 or 1/],
    [{ input: 'A', points: 2 }, /points must be a whole number from 3/],
  ])('%j is a TransferError', (options, message) => {
    expect(() => transferCurves(nand2, DEFAULT_TECHNOLOGY, options as never)).toThrow(TransferError);
    expect(() => transferCurves(nand2, DEFAULT_TECHNOLOGY, options as never)).toThrow(message);
  });
});
