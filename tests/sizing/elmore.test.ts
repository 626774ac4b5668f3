import { describe, expect, it } from 'vitest';
import { circuit } from '../../src/core/model/builder.ts';
import { evaluate } from '../../src/core/sizing/rcNetwork.ts';
import { delayCapacitances, totalCapacitance } from '../../src/core/sizing/nodeCapacitance.ts';
import { sizingReport } from '../../src/core/sizing/sizingReport.ts';
import { extractStage } from '../../src/core/sizing/stage.ts';
import type { Netlist } from '../../src/core/model/netlist.ts';
import { inverter, nand, UNIT_C, UNIT_R, UNIT_RC_TECH } from './cells.ts';

const RC = UNIT_R * UNIT_C;
/** A technology without transistor parasitics: only drawn resistors and capacitors count. */
const IDEAL = { ...UNIT_RC_TECH, cgPerArea: 0, cdPerWidth: 0 };

function near(actual: number | undefined, expected: number): void {
  expect((actual as number) / expected).toBeCloseTo(1, 9);
}

describe('Elmore delay of resistor networks', () => {
  it('chain 1 kΩ/10 fF, 2 kΩ/20 fF, 3 kΩ/30 fF from the supply: 250 ps at the end', () => {
    // τ = Σ_k C_k · R_shared (W. C. Elmore, J. Appl. Phys. 19:55, 1948):
    // 1k·(10+20+30)f + 2k·(20+30)f + 3k·30f = 60 + 100 + 90 = 250 ps (derived).
    const chain = circuit('rc chain')
      .rails()
      .output('Y')
      .resistor('R1', 'VDD', 'n1', 1e3)
      .resistor('R2', 'n1', 'n2', 2e3)
      .resistor('R3', 'n2', 'Y', 3e3)
      .capacitor('C1', 'n1', 'GND', 10e-15)
      .capacitor('C2', 'n2', 'GND', 20e-15)
      .capacitor('C3', 'Y', 'GND', 30e-15)
      .build();
    const report = sizingReport(chain, IDEAL);
    near(report.rise?.seconds, 250e-12);
    expect(report.rise?.path).toEqual(['VDD', 'R1', 'n1', 'R2', 'n2', 'R3', 'Y']);
    expect(report.fall).toBeNull();
  });

  it('an N-segment RC ladder of total R and C gives RC(N+1)/(2N), tending to RC/2', () => {
    // Rabaey, Chandrakasan, Nikolić, 2nd ed., distributed RC line (section on the Elmore delay of an RC chain).
    const n = 10;
    let b = circuit('ladder').rails().output(`x${n}`);
    for (let i = 1; i <= n; i++) {
      b = b.resistor(`R${i}`, i === 1 ? 'VDD' : `x${i - 1}`, `x${i}`, 1e3 / n);
      b = b.capacitor(`C${i}`, `x${i}`, 'GND', 100e-15 / n);
    }
    near(sizingReport(b.build(), IDEAL).rise?.seconds, (1e3 * 100e-15 * (n + 1)) / (2 * n));
  });
});

describe('unit RC model delays (Weste & Harris, 4th ed., §4.3)', () => {
  // The model: unit NMOS R, unit PMOS 2R, width k gives R/k (or 2R/k); every unit of width adds C of
  // gate and C of diffusion per terminal, and the node between two series transistors is one shared
  // diffusion region. Delays are Elmore time constants, Σ R·C.
  const load = (h: number, cinUnits: number): number => h * cinUnits * UNIT_C;

  it('inverter (N 1, P 2) driving h copies of itself: (3 + 3h)RC both ways', () => {
    for (const h of [0, 1, 4]) {
      const report = sizingReport(inverter(), UNIT_RC_TECH, { load: load(h, 3) });
      near(report.rise?.seconds, (3 + 3 * h) * RC);
      near(report.fall?.seconds, (3 + 3 * h) * RC);
    }
  });

  it('NAND2 (all widths 2) driving h NAND2s: worst fall (7 + 4h)RC through both NMOS', () => {
    for (const h of [0, 1, 4]) {
      const report = sizingReport(nand(2), UNIT_RC_TECH, { load: load(h, 4) });
      near(report.fall?.seconds, (7 + 4 * h) * RC);
      expect(report.fall?.path).toEqual(['GND', 'NB', 'n1', 'NA', 'Y']);
    }
  });

  it('NAND2 rise with one PMOS on and the internal node cut off: (6 + 4h)RC', () => {
    // The book's rising case: A = 0 turns on PA and cuts NA, so only the output node charges.
    for (const h of [0, 1, 4]) {
      const cell = nand(2);
      const stage = extractStage(cell, UNIT_RC_TECH, 'Y');
      const caps = delayCapacitances(cell, UNIT_RC_TECH, true);
      const c = Float64Array.from(stage.nets, (n) => totalCapacitance(caps.get(n)!));
      c[stage.output]! += load(h, 4);
      const on = stage.elements.map((e) => ['PA', 'NB'].includes(e.name));
      near(evaluate(stage, on, 'up', c)?.elmore, (6 + 4 * h) * RC);
    }
  });

  it('NAND2 worst rise also charges the internal node through NA: (8 + 4h)RC', () => {
    // Derived with the same model: B = 0, A = 1 joins n1 (2C) to Y behind PB's R, adding 2RC.
    for (const h of [0, 1]) {
      const report = sizingReport(nand(2), UNIT_RC_TECH, { load: load(h, 4) });
      near(report.rise?.seconds, (8 + 4 * h) * RC);
      expect(report.rise?.controls).toEqual({ A: '1', B: '0' });
    }
  });

  it('NAND3 (N 3, P 2) worst fall: (12 + 5h)RC', () => {
    // Weste & Harris, 4th ed., §4.3 NAND3 example (from memory): R/3·3C + 2R/3·3C + R·(9 + 5h)C.
    for (const h of [0, 2]) {
      near(sizingReport(nand(3), UNIT_RC_TECH, { load: load(h, 5) }).fall?.seconds, (12 + 5 * h) * RC);
    }
  });

  it('counting one diffusion region per terminal makes the series node 4C: fall (8 + 4h)RC', () => {
    // Derived: n1 carries 2C + 2C instead of 2C, adding R/2 · 2C = RC to the (7 + 4h)RC above.
    const report = sizingReport(nand(2), UNIT_RC_TECH, { load: load(1, 4), sharedDiffusion: false });
    near(report.fall?.seconds, (8 + 4 * 1) * RC);
  });
});

describe('stages that are not plain complementary gates', () => {
  it('a resistor-load inverter pulls up through its resistor and down through the NMOS', () => {
    const cell: Netlist = circuit('rload')
      .rails()
      .input('A')
      .output('Y')
      .resistor('RL', 'VDD', 'Y', 40e3)
      .nmos('N1', { g: 'A', d: 'Y', s: 'GND', w: 1, l: 1 })
      .build();
    const out = sizingReport(cell, IDEAL, { load: 10e-15 }).outputs[0]!;
    near(out.pullUp?.ohms, 40e3);
    near(out.pullDown?.ohms, UNIT_R);
    near(out.rise?.seconds, 40e3 * 10e-15);
    near(out.fall?.seconds, UNIT_R * 10e-15);
  });
});

describe('transmission gates switch both devices together', () => {
  // A transmission gate's select and its local complement always differ, so both devices conduct
  // together and the pass resistance is Rn ∥ Rp (Weste & Harris, 4th ed., ch. 1, transmission gate;
  // common practice). With the complement on its own pin, the worst case is one device alone.
  const tg = (localInverter: boolean): Netlist => {
    let b = circuit('tg').rails().input('D', 'S').output('Y');
    if (localInverter) {
      b = b
        .pmos('PI', { g: 'S', d: 'Sb', s: 'VDD', w: 2, l: 1 })
        .nmos('NI', { g: 'S', d: 'Sb', s: 'GND', w: 1, l: 1 });
    } else b = b.input('Sb');
    return b
      .nmos('NT', { g: 'S', d: 'D', s: 'Y', w: 1, l: 1 })
      .pmos('PT', { g: 'Sb', d: 'D', s: 'Y', w: 2, l: 1 })
      .build();
  };

  it('with a local inverter on the select: Rn ∥ Rp', () => {
    const out = sizingReport(tg(true), IDEAL).outputs[0]!;
    near(out.pullUp?.ohms, UNIT_R / 2); // R ∥ 2R/2 = R/2
    expect(out.pullUp?.controls).toEqual({ S: '1', Sb: '0' });
  });

  it('with the complement on its own pin: one device alone, R', () => {
    near(sizingReport(tg(false), IDEAL).outputs[0]!.pullUp?.ohms, UNIT_R);
  });
});
