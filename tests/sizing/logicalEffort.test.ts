import { describe, expect, it } from 'vitest';
import { circuit } from '../../src/core/model/builder.ts';
import { SizingOptionsError, sizingReport } from '../../src/core/sizing/sizingReport.ts';
import { aoi21, inverter, nand, nor, scaled, UNIT_R, UNIT_RC_TECH } from './cells.ts';

/** Relative comparison: the figures are ratios of floating-point sums. */
function near(actual: number | null | undefined, expected: number): void {
  expect(actual).not.toBeNull();
  expect((actual as number) / expected).toBeCloseTo(1, 9);
}

describe('logical effort from the drawn network', () => {
  // Per-input logical effort of gates sized as in the book (γ = 2): inverter 1, NAND n (n+2)/3,
  // NOR n (2n+1)/3. Weste & Harris, 4th ed., table 4.2; Sutherland, Sproull & Harris 1999, table 1.1.
  const cases = [
    { name: 'inverter (N 1, P 2)', cell: inverter(), g: 1 },
    { name: 'NAND2 (N 2, P 2)', cell: nand(2), g: 4 / 3 },
    { name: 'NOR2 (N 1, P 4)', cell: nor(2), g: 5 / 3 },
    { name: 'NAND3 (N 3, P 2)', cell: nand(3), g: 5 / 3 },
    { name: 'NOR3 (N 1, P 6)', cell: nor(3), g: 7 / 3 },
  ];

  for (const { name, cell, g } of cases) {
    it(`${name}: g = ${g.toFixed(3)} on every input`, () => {
      const report = sizingReport(cell, UNIT_RC_TECH);
      for (const input of cell.inputs) near(report.logicalEffort[input], g);
    });

    it(`${name}: unchanged when every width is scaled by 3.7`, () => {
      // g is a ratio of capacitances at equal drive: scaling all widths scales both (derived).
      const report = sizingReport(scaled(cell, 3.7), UNIT_RC_TECH);
      for (const input of cell.inputs) near(report.logicalEffort[input], g);
    });
  }

  it('takes γ from the technology: with Rp = Rn a NAND2 sized N 2, P 1 has g = 3/2', () => {
    // NAND n: g = (n + γ) / (1 + γ), here γ = 1 (Sutherland, Sproull & Harris 1999, ch. 4, from
    // memory); the equivalent inverter is N 1, P 1 (Cinv = 2) and each input sees 2 + 1.
    const report = sizingReport(nand(2, 2, 1), { ...UNIT_RC_TECH, rp: UNIT_R });
    near(report.logicalEffort.A, 3 / 2);
  });

  it('AOI21 sized N 2,2,1 / P 4,4,4: g = 2 on A and B, 5/3 on C, p = 7/3', () => {
    // Weste & Harris, 4th ed., figure of compound-gate logical efforts (from memory).
    const cell = aoi21(1);
    const sized = {
      ...cell,
      devices: cell.devices.map((d) =>
        d.kind === 'pmos' ? { ...d, w: 4 } : d.kind === 'nmos' ? { ...d, w: d.name === 'NC' ? 1 : 2 } : d,
      ),
    };
    const report = sizingReport(sized, UNIT_RC_TECH);
    near(report.logicalEffort.A, 2);
    near(report.logicalEffort.B, 2);
    near(report.logicalEffort.C, 5 / 3);
    near(report.parasiticDelay, 7 / 3);
  });
});

describe('rising and falling efforts', () => {
  it('a book-sized NAND2 has the same effort both ways: 4/3', () => {
    // Weste & Harris, 4th ed., table 4.2: a gate sized for equal rise and fall has g_u = g_d = g.
    const out = sizingReport(nand(2), UNIT_RC_TECH).outputs[0]!;
    near(out.logicalEffortRise.A, 4 / 3);
    near(out.logicalEffortFall.A, 4 / 3);
  });

  it('pseudo-NMOS NOR3 (NMOS 4/3, PMOS load 2/3): g_up 4/3, g_down 4/9, average 8/9', () => {
    // Weste & Harris, 4th ed., solutions to exercise 9.18: the pull-down keeps the current left after
    // the always-on load (4/3 − 1/3 of a unit NMOS); the load alone pulls up.
    let b = circuit('pseudo nor3').rails().input('A', 'B', 'C').output('Y');
    b = b.pmos('PL', { g: 'GND', d: 'Y', s: 'VDD', w: 2 / 3, l: 1 });
    for (const x of ['A', 'B', 'C']) b = b.nmos(`N${x}`, { g: x, d: 'Y', s: 'GND', w: 4 / 3, l: 1 });
    const out = sizingReport(b.build(), UNIT_RC_TECH).outputs[0]!;
    near(out.logicalEffortRise.A, 4 / 3);
    near(out.logicalEffortFall.A, 4 / 9);
    near(((out.logicalEffortRise.B as number) + (out.logicalEffortFall.B as number)) / 2, 8 / 9);
    expect(out.notes.join(' ')).toMatch(/ratioed/);
  });
});

describe('parasitic delay in units of p_inv', () => {
  // Inverter 1, NAND n: n, NOR n: n with the book sizing (Weste & Harris, 4th ed., §4.4, parasitic
  // delay of common gates).
  const cases = [
    { name: 'inverter', cell: inverter(), p: 1 },
    { name: 'NAND2', cell: nand(2), p: 2 },
    { name: 'NAND3', cell: nand(3), p: 3 },
    { name: 'NOR2', cell: nor(2), p: 2 },
    { name: 'NOR3', cell: nor(3), p: 3 },
  ];
  for (const { name, cell, p } of cases) {
    it(`${name}: p = ${p}`, () => near(sizingReport(cell, UNIT_RC_TECH).parasiticDelay, p));
  }
});

describe('worst-case drive and the equivalent inverter', () => {
  it('NAND2 (N 2, P 2): one PMOS of 2R/2 up, two NMOS of R/2 in series down, both R', () => {
    // Unit RC model (Weste & Harris, 4th ed., §4.3): width k has R/k (NMOS), 2R/k (PMOS).
    const out = sizingReport(nand(2), UNIT_RC_TECH).outputs[0]!;
    near(out.pullUp?.ohms, UNIT_R);
    near(out.pullDown?.ohms, UNIT_R);
    expect(out.pullDown?.path).toEqual(['GND', 'NB', 'n1', 'NA', 'Y']);
    expect(out.pullUp?.path).toHaveLength(3);
    expect(out.pullUp?.path[0]).toBe('VDD');
    near(out.equivalentInverter?.wn, 1);
    near(out.equivalentInverter?.wp, 2);
  });

  it('NOR3 (N 1, P 6): the worst pull-up is the full series stack of three', () => {
    const out = sizingReport(nor(3), UNIT_RC_TECH).outputs[0]!;
    expect(out.pullUp?.path).toEqual(['VDD', 'PA', 'p1', 'PB', 'p2', 'PC', 'Y']);
    expect(out.pullUp?.controls).toEqual({ A: '0', B: '0', C: '0' });
    near(out.pullUp?.ohms, UNIT_R);
  });

  it('a pass input that feeds no gate has no logical effort, and the report says why', () => {
    const cell = {
      ...inverter(),
      name: 'pass',
      inputs: ['D', 'S'],
      devices: [
        { kind: 'nmos' as const, name: 'N1', gate: 'S', drain: 'Y', source: 'D', w: 1, l: 1 },
        { kind: 'nmos' as const, name: 'N2', gate: 'Y', drain: 'GND', source: 'GND', w: 1, l: 1 },
      ],
    };
    const out = sizingReport(cell, UNIT_RC_TECH).outputs[0]!;
    near(out.pullUp?.ohms, UNIT_R);
    expect(out.logicalEffort.D).toBeNull();
    expect(out.notes.join(' ')).toMatch(/input pin/);
  });

  it('stops at the documented bound of 12 independent gate signals, saying so', () => {
    const out = sizingReport(nand(13), UNIT_RC_TECH).outputs[0]!;
    expect(out.pullDown).toBeNull();
    expect(out.logicalEffort.A).toBeNull();
    expect(out.notes.join(' ')).toMatch(/13 gate signals.*12/);
  });

  it('rejects a negative load, naming the option', () => {
    expect(() => sizingReport(nand(2), UNIT_RC_TECH, { load: -1e-15 })).toThrow(SizingOptionsError);
  });

  it('does not change the netlist it is given', () => {
    const cell = nand(3);
    const copy = structuredClone(cell);
    sizingReport(cell, UNIT_RC_TECH, { load: 1e-15 });
    expect(cell).toEqual(copy);
  });
});
