import { describe, expect, it } from 'vitest';
import { circuit } from '../../src/core/model/builder.ts';
import { DEFAULT_TECHNOLOGY, withVdd } from '../../src/core/model/technology.ts';
import { PowerOptionsError, powerReport } from '../../src/core/power/powerReport.ts';
import { inverter, nand, scaled } from '../sizing/cells.ts';

function near(actual: number | undefined, expected: number): void {
  expect((actual as number) / expected).toBeCloseTo(1, 6);
}

const NO_LEAK = { ...DEFAULT_TECHNOLOGY, ioffPerWidth: 0 };
const random = { frequency: 1e6, activity: 'random', load: 0 } as const;

describe('static power through conducting paths', () => {
  it('a 10 kΩ pull-up to 5 V into 40 kΩ draws 0.1 mA and 0.5 mW', () => {
    // Resistive divider, Ohm's law (common practice, no source).
    const divider = circuit('divider')
      .supply('VDD', 5)
      .ground()
      .output('Y')
      .resistor('RU', 'VDD', 'Y', 10e3)
      .resistor('RD', 'Y', 'GND', 40e3)
      .build();
    const report = powerReport(divider, withVdd(NO_LEAK, 5), random);
    expect(report.vectors).toHaveLength(1);
    near(report.staticWatts[0], 0.5e-3);
    near(report.vectors[0]!.supplyCurrent, 0.1e-3);
  });

  it('a resistor-load inverter burns VDD²/(R_L + R_on) with its input high and nothing with it low', () => {
    // Static power = VDD · I (Weste & Harris, 4th ed., ch. 5, static power); I by Ohm's law through the load and the NMOS.
    const rload = circuit('rload')
      .rails()
      .input('A')
      .output('Y')
      .resistor('RL', 'VDD', 'Y', 40e3)
      .nmos('N1', { g: 'A', d: 'Y', s: 'GND', w: 1, l: 0.25 })
      .build();
    const ron = NO_LEAK.rn * 0.25;
    const report = powerReport(rload, NO_LEAK, random);
    expect(report.staticWatts[0]).toBe(0);
    near(report.staticWatts[1], 2.5 ** 2 / (40e3 + ron));
    near(report.averageStaticWatts, 2.5 ** 2 / (40e3 + ron) / 2);
  });
});

describe('leakage of off transistors', () => {
  // The model (common practice, no source): I = ioffPerWidth · W · V_DS / VDD, so an off device with
  // the full supply across it leaks ioffPerWidth · W, and static power is VDD · I.
  const tech = DEFAULT_TECHNOLOGY;

  it('an inverter leaks through its NMOS with the input low and its PMOS with the input high', () => {
    const report = powerReport(inverter(1, 2), tech, random);
    near(report.leakageWatts[0], tech.ioffPerWidth * 1 * tech.vdd);
    near(report.leakageWatts[1], tech.ioffPerWidth * 2 * tech.vdd);
    near(report.vectors[0]!.leakageCurrent, tech.ioffPerWidth * 1);
  });

  it('grows linearly with width', () => {
    const base = powerReport(inverter(), tech, random).leakageWatts;
    const wide = powerReport(scaled(inverter(), 3), tech, random).leakageWatts;
    wide.forEach((w, i) => near(w, 3 * base[i]!));
  });

  it('grows with the supply', () => {
    const low = powerReport(inverter(), withVdd(tech, 1.8), random).leakageWatts[0]!;
    const high = powerReport(inverter(), withVdd(tech, 3.3), random).leakageWatts[0];
    expect(high).toBeGreaterThan(low);
  });

  it('two off NMOS in series leak less than one (the stack effect)', () => {
    // Stacked off transistors leak less than one alone (Weste & Harris, 4th ed., ch. 5, from memory);
    // in this linear model exactly half, the internal node settling at VDD/2.
    const report = powerReport(nand(2, 1, 1), { ...tech, ioffPerWidth: 1e-9 }, random);
    const bothOff = report.vectors.find((v) => v.inputs.A === '0' && v.inputs.B === '0');
    const topOff = report.vectors.find((v) => v.inputs.A === '0' && v.inputs.B === '1');
    near(bothOff?.leakageWatts, (topOff?.leakageWatts ?? 0) / 2);
  });

  it('n off NMOS in series share the supply evenly: 1/n of one device with VDD across it', () => {
    // Derived from the linear model (equal conductances in series divide VDD evenly); checks the
    // two-net and the larger-group solves of the undriven stack nodes.
    const one = powerReport(nand(2, 1, 1), tech, random).vectors[1]!.leakageWatts; // A = 0, B = 1: NA alone
    for (const n of [3, 4, 5]) {
      // Every input 0: the PMOS are all on, the n NMOS all off.
      near(powerReport(nand(n, 1, 1), tech, random).vectors[0]!.leakageWatts, one / n);
    }
  });

  it('static power is the sum of the DC and leakage parts for every vector', () => {
    const report = powerReport(nand(2), tech, random);
    for (const v of report.vectors) expect(v.staticWatts).toBeCloseTo(v.dcWatts + v.leakageWatts, 20);
  });
});

describe('options are checked and named', () => {
  const cell = inverter();
  const cases = [
    { settings: { ...random, frequency: -1 }, pass: {}, field: 'frequency' },
    { settings: { ...random, load: Number.NaN }, pass: {}, field: 'load' },
    { settings: { ...random, activity: 'sequence' as const }, pass: {}, field: 'sequence' },
    { settings: random, pass: { maxInputs: 0 }, field: 'maxInputs' },
  ];
  for (const { settings, pass, field } of cases) {
    it(`rejects a bad ${field}`, () => {
      let error: unknown;
      try {
        powerReport(cell, DEFAULT_TECHNOLOGY, settings, pass);
      } catch (e) {
        error = e;
      }
      expect(error).toBeInstanceOf(PowerOptionsError);
      expect((error as PowerOptionsError).field).toBe(field);
    });
  }

  it('does not change the netlist it is given', () => {
    const copy = structuredClone(cell);
    powerReport(cell, DEFAULT_TECHNOLOGY, { frequency: 1e6, activity: 'random', load: 1e-15 });
    expect(cell).toEqual(copy);
  });
});

describe('notes that qualify the figures', () => {
  it('every report says what it leaves out', () => {
    const report = powerReport(inverter(), DEFAULT_TECHNOLOGY, random);
    expect(report.notes.join(' ')).toMatch(/short-circuit/);
  });

  it('a floating output in some vectors is named; a static gate gets no such note', () => {
    // A tristate inverter floats its output with EN = 0 (the trade's definition of high-impedance).
    const tristate = circuit('tristate')
      .rails()
      .input('A', 'EN', 'ENb')
      .output('Y')
      .pmos('P1', { g: 'A', d: 'p', s: 'VDD' })
      .pmos('P2', { g: 'ENb', d: 'Y', s: 'p' })
      .nmos('N2', { g: 'EN', d: 'Y', s: 'n' })
      .nmos('N1', { g: 'A', d: 'n', s: 'GND' })
      .build();
    expect(powerReport(tristate, DEFAULT_TECHNOLOGY, random).notes.join(' ')).toMatch(/\(Y\)/);
    expect(powerReport(nand(2), DEFAULT_TECHNOLOGY, random).notes.join(' ')).not.toMatch(/definite/);
  });
});
