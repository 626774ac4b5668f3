import { describe, expect, it } from 'vitest';
import { circuit } from '../../src/core/model/builder.ts';
import { DEFAULT_TECHNOLOGY, type Technology } from '../../src/core/model/technology.ts';
import { FLAG_DEGRADED } from '../../src/core/solver/levels.ts';
import type { InputValue } from '../../src/core/model/design.ts';
import { solve, solveSteps } from '../helpers.ts';
import { nand2 } from '../cells.ts';

describe('IEEE Std 1364 switch primitives with an X or Z control', () => {
  // Source: IEEE Std 1364-2005 clause 7 (carried as IEEE Std 1800-2017 table 28-6): nmos switch,
  // rows data 0/1/x/z, columns control 0/1/x/z: d0: z 0 L L; d1: z 1 H H; dx: z x x x; dz: z z z z.
  // L means "0 or z" and H "1 or z": not a definite level, which a four-level result reports as X.
  const table: Record<string, string[]> = {
    '0': ['Z', '0', 'X', 'X'],
    '1': ['Z', '1', 'X', 'X'],
    X: ['Z', 'X', 'X', 'X'],
    Z: ['Z', 'Z', 'Z', 'Z'],
  };
  const controls: InputValue[] = ['0', '1', 'X', 'Z'];
  const nmosSwitch = circuit('sw')
    .rails()
    .input('D', 'G')
    .output('Y')
    .nmos('N1', { g: 'G', d: 'D', s: 'Y' })
    .capacitor('C', 'Y', 'GND', 1e-15)
    .build();
  const pmosSwitch = circuit('sw')
    .rails()
    .input('D', 'G')
    .output('Y')
    .pmos('P1', { g: 'G', d: 'D', s: 'Y' })
    .capacitor('C', 'Y', 'GND', 1e-15)
    .build();

  for (const [data, row] of Object.entries(table)) {
    it(`nmos, data ${data}: ${row.join(' ')}`, () => {
      expect(controls.map((g) => solve(nmosSwitch, { D: data as InputValue, G: g }).level('Y'))).toEqual(row);
    });
    it(`pmos (control inverted), data ${data}`, () => {
      const inverted: InputValue[] = ['1', '0', 'X', 'Z'];
      expect(inverted.map((g) => solve(pmosSwitch, { D: data as InputValue, G: g }).level('Y'))).toEqual(row);
    });
  }
});

describe("Bryant's switch-level model", () => {
  // Source: R. E. Bryant, "A switch-level model and simulator for MOS digital systems", IEEE Trans.
  // Computers C-33(2), 1984 (rule restated from memory): a node is definite under an indeterminate
  // transistor only if it has the same value with it open and closed.
  const nand = nand2;
  it('NAND2 with A = 0, B = X gives 1', () => expect(solve(nand, { A: '0', B: 'X' }).level('Y')).toBe('1'));
  it('NAND2 with A = 1, B = X gives X', () => expect(solve(nand, { A: '1', B: 'X' }).level('Y')).toBe('X'));
  it('an inverter with input X gives X', () => {
    const inv = circuit('inv')
      .rails()
      .input('A')
      .output('Y')
      .pmos('P', { g: 'A', d: 'Y', s: 'VDD' })
      .nmos('N', { g: 'A', d: 'Y', s: 'GND' })
      .build();
    expect(solve(inv, { A: 'X' }).level('Y')).toBe('X');
  });
});

describe('resistive divider', () => {
  // Common practice, no source: 10 kΩ from 5 V, 40 kΩ to ground → 4.00 V, 0.1 mA, 0.5 mW.
  const divider = circuit('div')
    .supply('VDD', 5)
    .ground()
    .output('Y')
    .resistor('R1', 'VDD', 'Y', 10e3)
    .resistor('R2', 'Y', 'GND', 40e3)
    .build();
  const r = solve(divider, {});
  it('sets the tap at 4.00 V', () => expect(r.volts('Y')).toBeCloseTo(4.0, 9));
  it('draws 0.1 mA and 0.5 mW', () => {
    expect(r.result.supplyCurrent).toBeCloseTo(1e-4, 12);
    expect(r.result.staticPower).toBeCloseTo(5e-4, 12);
  });
  it('lists the path VDD → R1 → Y → R2 → GND', () => {
    const p = r.result.paths[0]!;
    const names = p.nets.map((n) => r.result.compiled.netNames[n]);
    expect(names).toEqual(['VDD', 'Y', 'GND']);
    expect(p.current).toBeCloseTo(1e-4, 12);
  });
});

describe('threshold drop through pass devices', () => {
  // W&H 4th ed. ch. 2 (pass transistors): NMOS passes a degraded 1 of VDD − Vtn, PMOS a degraded 0 of
  // |Vtp|, a transmission gate passes both rails. VDD 1.0 V, Vt 0.3 V → 0.70 V and 0.30 V (derived).
  const tech: Technology = { ...DEFAULT_TECHNOLOGY, vdd: 1.0, vtn: 0.3, vtp: 0.3, vil: 0.35, vih: 0.65 };
  const pass = (kind: 'nmos' | 'pmos') =>
    (kind === 'nmos' ? base.nmos('M', pins) : base.pmos('M', pins)).capacitor('C', 'Y', 'GND', 1e-15).build();
  const base = circuit('pass').supply('VDD').ground().input('D', 'G').output('Y');
  const pins = { g: 'G', d: 'D', s: 'Y' };
  it('an NMOS-passed 1 is 0.70 V and flagged degraded', () => {
    const r = solve(pass('nmos'), { D: '1', G: '1' }, tech);
    expect(r.volts('Y')).toBeCloseTo(0.7, 9);
    expect(r.flags('Y') & FLAG_DEGRADED).toBeTruthy();
    expect(r.level('Y')).toBe('1');
  });
  it('a PMOS-passed 0 is 0.30 V and flagged degraded', () => {
    const r = solve(pass('pmos'), { D: '0', G: '0' }, tech);
    expect(r.volts('Y')).toBeCloseTo(0.3, 9);
    expect(r.flags('Y') & FLAG_DEGRADED).toBeTruthy();
    expect(r.level('Y')).toBe('0');
  });
  it('a transmission gate passes both rails whole, not flagged', () => {
    const tg = circuit('tg')
      .rails()
      .input('D', 'EN', 'ENb')
      .output('Y')
      .nmos('N', { g: 'EN', d: 'D', s: 'Y' })
      .pmos('P', { g: 'ENb', d: 'D', s: 'Y' })
      .build();
    for (const d of ['0', '1'] as const) {
      const r = solve(tg, { D: d, EN: '1', ENb: '0' }, tech);
      expect(r.volts('Y')).toBe(d === '1' ? 1.0 : 0);
      expect(r.flags('Y') & FLAG_DEGRADED).toBe(0);
    }
  });
});

describe('charge sharing by capacitance ratio', () => {
  // Charge conservation, V = ΣCi·Vi / ΣCi (RCN 2nd ed., dynamic logic, charge sharing; common practice).
  // 30 fF at 2.5 V shares with 10 fF at 0 V → 1.875 V. Diffusion capacitance is zeroed so only the
  // two capacitors count.
  const tech: Technology = { ...DEFAULT_TECHNOLOGY, cdPerWidth: 0 };
  const cell = circuit('share')
    .rails()
    .input('D', 'WE', 'WEb', 'SH', 'CLR')
    .output('a', 'b')
    .nmos('NW', { g: 'WE', d: 'D', s: 'a' })
    .pmos('PW', { g: 'WEb', d: 'D', s: 'a' })
    .nmos('NS', { g: 'SH', d: 'a', s: 'b' })
    .nmos('NC', { g: 'CLR', d: 'b', s: 'GND' })
    .capacitor('Ca', 'a', 'GND', 30e-15)
    .capacitor('Cb', 'b', 'GND', 10e-15)
    .build();
  const steps = solveSteps(
    cell,
    [{ D: '1', WE: '1', WEb: '0', SH: '0', CLR: '1' }, { WE: '0', WEb: '1', CLR: '0' }, { SH: '1' }],
    tech,
  );
  it('stores 2.5 V and 0 V first', () => {
    expect(steps[1]!.volts('a')).toBeCloseTo(2.5, 12);
    expect(steps[1]!.volts('b')).toBeCloseTo(0, 12);
    expect(steps[1]!.level('a')).toBe('Z');
  });
  it('shares to 1.875 V when joined', () => {
    expect(steps[2]!.volts('a')).toBeCloseTo(1.875, 9);
    expect(steps[2]!.volts('b')).toBeCloseTo(1.875, 9);
  });
});
