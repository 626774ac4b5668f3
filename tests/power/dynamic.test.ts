import { describe, expect, it } from 'vitest';
import { circuit } from '../../src/core/model/builder.ts';
import { withVdd } from '../../src/core/model/technology.ts';
import { dynamicPower, switchingEnergy } from '../../src/core/power/dynamic.ts';
import { powerReport } from '../../src/core/power/powerReport.ts';
import { inverter, nand, nor, UNIT_RC_TECH } from '../sizing/cells.ts';

function near(actual: number | undefined, expected: number): void {
  expect((actual as number) / expected).toBeCloseTo(1, 9);
}

/** 1.8 V, no transistor parasitics and no leakage: only drawn capacitors and the load switch. */
const IDEAL_18 = { ...withVdd(UNIT_RC_TECH, 1.8), cgPerArea: 0, cdPerWidth: 0, ioffPerWidth: 0 };

describe('switching energy and power arithmetic', () => {
  it('100 fF at 1.8 V draws C·VDD² = 324 fJ from the supply per 0→1 transition', () => {
    // Weste & Harris, 4th ed., ch. 5 (derived from E = C·VDD²): 100e-15 · 1.8² = 324e-15 J.
    near(switchingEnergy(100e-15, 1.8), 324e-15);
  });

  it('α 0.25, C 100 fF, 1.8 V, 500 MHz gives 40.5 µW', () => {
    // P = α·C·VDD²·f = 0.25 · 100e-15 · 3.24 · 500e6 (W&H 4th ed. ch. 5, derived).
    near(dynamicPower(0.25, 100e-15, 1.8, 500e6), 40.5e-6);
  });
});

describe('activity from the truth table (independent, equiprobable inputs)', () => {
  // α = P(0)·P(1) for a new independent vector each cycle (Rabaey, Chandrakasan, Nikolić, 2nd ed.,
  // NOR example: 3/16, from memory).
  it('NAND2 and NOR2 outputs: α = 3/16', () => {
    for (const cell of [nand(2), nor(2)]) {
      near(
        powerReport(cell, UNIT_RC_TECH, { frequency: 1e6, activity: 'random', load: 0 }).activity.Y,
        3 / 16,
      );
    }
  });

  it('inverter output and every input: α = 1/4', () => {
    const report = powerReport(inverter(), UNIT_RC_TECH, { frequency: 1e6, activity: 'random', load: 0 });
    near(report.activity.Y, 1 / 4);
    near(report.activity.A, 1 / 4);
  });

  it('an inverter into 100 fF at 1.8 V and 500 MHz burns 40.5 µW', () => {
    // α = 1/4 from the truth table, then the arithmetic above: the whole chain through the solver.
    const report = powerReport(inverter(), IDEAL_18, { frequency: 500e6, activity: 'random', load: 100e-15 });
    near(report.capacitance.Y, 100e-15);
    near(report.dynamicWatts, 40.5e-6);
    expect(report.convention).toMatch(/0→1/);
  });
});

describe('activity counted over a sequence', () => {
  const steps = ['1', '0', '1', '0', '1'].map((a) => ({ A: a as '0' | '1' }));

  it('A = 1,0,1,0,1 makes Y rise twice in four step changes: α = 1/2, 324 fJ each at 1.8 V', () => {
    const report = powerReport(
      inverter(),
      IDEAL_18,
      { frequency: 1e9, activity: 'sequence', load: 100e-15 },
      { sequence: steps },
    );
    const y = report.nets.find((n) => n.net === 'Y');
    near(y?.activity, 0.5);
    near(y?.energyPerTransition, 324e-15);
    near(report.dynamicWatts, 0.5 * 324e-15 * 1e9);
    expect(report.vectors).toHaveLength(5);
  });

  it('a level passed through an NMOS swings only to VDD − Vtn, so it draws C·VDD·(VDD − Vtn)', () => {
    // Weste & Harris, 4th ed., ch. 5: energy per transition C·VDD·V_swing (from memory); the
    // NMOS-passed high is VDD − Vtn (W&H 4th ed. ch. 1, pass transistors, without body effect).
    const pass = circuit('nmos pass')
      .rails()
      .input('D', 'G')
      .output('Y')
      .nmos('N1', { g: 'G', d: 'Y', s: 'D', w: 1, l: 1 })
      .capacitor('CY', 'Y', 'GND', 100e-15)
      .build();
    const sequence = [
      { D: '0', G: '1' },
      { D: '1', G: '1' },
    ] as const;
    const report = powerReport(
      pass,
      IDEAL_18,
      { frequency: 1e6, activity: 'sequence', load: 0 },
      { sequence },
    );
    const y = report.nets.find((n) => n.net === 'Y');
    near(y?.swing, 1.8 - IDEAL_18.vtn);
    near(y?.energyPerTransition, 100e-15 * 1.8 * (1.8 - IDEAL_18.vtn));
  });
});
