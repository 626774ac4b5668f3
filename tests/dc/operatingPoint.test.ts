import { describe, expect, it } from 'vitest';
import { compile } from '../../src/core/compile/compile.ts';
import { problems } from '../../src/core/dc/explain.ts';
import { DcSolver, sourcesFor, type OperatingPoint } from '../../src/core/dc/operatingPoint.ts';
import { GMIN_STEPPING, NEWTON, PSEUDO_TRANSIENT, SOURCE_STEPPING } from '../../src/core/dc/strategies.ts';
import { circuit } from '../../src/core/model/builder.ts';
import type { InputVector } from '../../src/core/model/design.ts';
import type { Netlist } from '../../src/core/model/netlist.ts';
import { DEFAULT_TECHNOLOGY, type Technology } from '../../src/core/model/technology.ts';
import { nandLatch } from '../../src/core/starters/sequential.ts';
import { tristateInverter } from '../../src/core/starters/combinational.ts';
import { cmosInverter, pseudoNmosInverter, squareLaw } from './helpers.ts';

function operatingPoint(
  netlist: Netlist,
  vector: InputVector,
  tech: Technology = DEFAULT_TECHNOLOGY,
  options: { maxIterations?: number; start?: number } = {},
): { point: OperatingPoint; volts: (net: string) => number } {
  const c = compile(netlist, tech);
  const start = options.start === undefined ? undefined : new Float64Array(c.netCount).fill(options.start);
  const point = new DcSolver(c).solve(sourcesFor(c, vector), {
    ...(start === undefined ? {} : { start }),
    ...(options.maxIterations === undefined ? {} : { maxIterations: options.maxIterations }),
  });
  return { point, volts: (net) => point.volts[c.netIndex.get(net) as number] as number };
}

describe('pseudo-NMOS inverter, output low', () => {
  // Published: VDD 2.5 V, Vt 0.4 V, k'n 115 and k'p 30 µA/V², (W/L)n 1.5, r = kn/kp = 9 → VOL 0.120 V
  // and 42.3 µA (the RCN 0.25 µm parameters of Rabaey, Chandrakasan, Nikolić, Digital Integrated
  // Circuits, 2nd ed., 2003, tables 3.2–3.3, from memory; VOL = (VDD − Vt)(1 − √(1 − 1/r)) is the
  // square-law result of Sedra & Smith, Microelectronic Circuits, 5th ed., from memory). Re-derived:
  // the grounded-gate PMOS is saturated, I = (kp/2)(VDD − Vt)², and the NMOS in the linear region
  // carries it: kn[(VDD − Vt)V − V²/2] = I.
  const tech = squareLaw({ vdd: 2.5, vtn: 0.4, vtp: 0.4, kpn: 115e-6, kpp: 30e-6 });
  const kn = 115e-6 * 1.5;
  const kp = kn / 9;
  const L = 0.25;
  const netlist = pseudoNmosInverter(1.5 * L, (kp / 30e-6) * L, L);
  const vov = 2.5 - 0.4;
  const current = (kp / 2) * vov ** 2;
  const vol = vov - Math.sqrt(vov ** 2 - (2 * current) / kn);

  it('re-derives the published figures', () => {
    expect(vol).toBeCloseTo(vov * (1 - Math.sqrt(1 - 1 / 9)), 12);
    expect(Math.abs(vol - 0.12)).toBeLessThan(0.001);
    expect(Math.abs(current - 42.3e-6)).toBeLessThan(0.05e-6);
  });
  it('the DC solve gives VOL 0.120 V and 42.3 µA from the supply', () => {
    const { point, volts } = operatingPoint(netlist, { A: '1' }, tech);
    expect(Math.abs(volts('Y') - vol)).toBeLessThan(1e-6);
    expect(point.supplyCurrent).toBeCloseTo(current, 9);
    expect(point.groups.every((g) => g.status === 'solved')).toBe(true);
  });
  it('with the input low the output sits at VDD and no current flows', () => {
    const { point, volts } = operatingPoint(netlist, { A: '0' }, tech);
    expect(volts('Y')).toBeCloseTo(2.5, 6);
    expect(Math.abs(point.supplyCurrent)).toBeLessThan(1e-11);
  });
});

describe('NMOS passing a high, with body effect', () => {
  // Rabaey, Chandrakasan, Nikolić, 2nd ed. (2003), 0.25 µm: VT0 0.43 V, γ 0.4 V^½, 2φF 0.6 V, VDD
  // 2.5 V (tables 3.2–3.3, from memory). The passed level stops where Vout = VDD − VT(Vout), VSB =
  // Vout: 1.765 V (±0.01), re-derived here by bisection. Subthreshold current is ignored (level 1).
  const netlist = circuit('pass')
    .rails()
    .input('A')
    .output('Y')
    .nmos('N1', { g: 'VDD', d: 'A', s: 'Y' })
    .capacitor('CL', 'Y', 'GND', 10e-15)
    .build();
  const vt = (v: number): number => 0.43 + 0.4 * (Math.sqrt(0.6 + v) - Math.sqrt(0.6));
  let lo = 0;
  let hi = 2.5;
  for (let i = 0; i < 60; i++) {
    const mid = (lo + hi) / 2;
    if (mid < 2.5 - vt(mid)) lo = mid;
    else hi = mid;
  }

  it('stops at VDD − VT(Vout) = 1.765 V', () => {
    expect(Math.abs(lo - 1.765)).toBeLessThan(0.01);
    const { volts } = operatingPoint(netlist, { A: '1' });
    // GMIN (1 pS) draws a trickle, so the device stays a hair above threshold: well under 1 mV.
    expect(Math.abs(volts('Y') - lo)).toBeLessThan(1e-3);
    expect(Math.abs(volts('Y') - 1.765)).toBeLessThan(0.01);
  });
  it('passes a low to 0 V', () => {
    expect(operatingPoint(netlist, { A: '0' }).volts('Y')).toBeCloseTo(0, 9);
  });
});

describe('resistive divider (common practice, no source)', () => {
  // 10 kΩ from 5 V over 40 kΩ to ground: 4.00 V and 0.1 mA.
  const netlist = circuit('divider')
    .supply('VDD', 5)
    .ground()
    .output('Y')
    .resistor('R1', 'VDD', 'Y', 10e3)
    .resistor('R2', 'Y', 'GND', 40e3)
    .build();
  it('gives 4.00 V and 0.1 mA', () => {
    const { point, volts } = operatingPoint(netlist, {}, { ...DEFAULT_TECHNOLOGY, vdd: 5 });
    expect(volts('Y')).toBeCloseTo(4.0, 6);
    expect(point.supplyCurrent).toBeCloseTo(1e-4, 9);
  });
});

describe('nets without a DC voltage are reported, never guessed', () => {
  it('a tristate output that is off floats: no voltage, and the reason', () => {
    const { point, volts } = operatingPoint(tristateInverter, { A: '1', EN: '0' });
    expect(volts('Y')).toBeNaN();
    expect(problems(point).some((p) => p.nets.includes('Y') && /floating/.test(p.message))).toBe(true);
  });
  it('a NAND latch holding (Sb = Rb = 1) from a balanced start is at its unstable balance', () => {
    const { point, volts } = operatingPoint(nandLatch, { Sb: '1', Rb: '1' });
    expect(volts('Q')).toBeNaN();
    expect(volts('Qb')).toBeNaN();
    expect(point.groups.some((g) => g.status === 'unstable')).toBe(true);
  });
  it('a NAND latch that is set has Q high and Qb low', () => {
    const { volts } = operatingPoint(nandLatch, { Sb: '0', Rb: '1' });
    expect(volts('Q')).toBeCloseTo(2.5, 6);
    expect(volts('Qb')).toBeLessThan(0.01);
  });
  it('an input at X leaves what it reaches unknown', () => {
    const inv = cmosInverter(1, 1);
    const { point, volts } = operatingPoint(inv, { A: 'X' });
    expect(volts('Y')).toBeNaN();
    expect(point.groups[0]?.status).toBe('blocked');
    expect(point.supplyCurrent).toBeNaN();
  });
  it('when every strategy runs out of iterations, the nets and what was tried are named', () => {
    const tech = squareLaw({ vdd: 2.5, vtn: 0.4, vtp: 0.4 });
    const pseudo = pseudoNmosInverter(1, 0.2);
    const { point, volts } = operatingPoint(pseudo, { A: '1' }, tech, { maxIterations: 1, start: 2.5 });
    expect(volts('Y')).toBeNaN();
    const [group] = point.groups;
    expect(group?.status).toBe('not-converged');
    expect(group?.tried).toEqual([NEWTON, PSEUDO_TRANSIENT, GMIN_STEPPING, SOURCE_STEPPING]);
    expect(problems(point)[0]?.message).toMatch(/Y: did not converge \(still moving: Y; tried damped Newton/);
  });
});
