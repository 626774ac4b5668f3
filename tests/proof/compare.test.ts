/**
 * Equivalence of two cells (docs/semantics.md §10): the same output levels for every vector, or a
 * vector where they differ, replayed in both.
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { rippleAdder } from '../../bench/generators/index.ts';
import { miswire, nandRippleAdder } from '../../bench/generators/proofCells.ts';
import { checkSweep } from '../../src/core/analysis/check.ts';
import { reportRows } from '../../src/core/analysis/sweepColumns.ts';
import { circuit } from '../../src/core/model/builder.ts';
import type { Netlist } from '../../src/core/model/netlist.ts';
import { ComparisonError, compareCells } from '../../src/core/proof/compare.ts';
import { starterById } from '../../src/core/starters/index.ts';
import { stagedCell } from '../property/stagedCells.ts';

const cell = (netlist: Netlist) => ({ netlist });

/** Y = !(!A & !B): a NAND2 of the inverted inputs. */
const nandOfInverted = circuit('nand_of_inverted')
  .rails()
  .input('A', 'B')
  .output('Y')
  .pmos('PIA', { g: 'A', d: 'An', s: 'VDD', w: 2 })
  .nmos('NIA', { g: 'A', d: 'An', s: 'GND' })
  .pmos('PIB', { g: 'B', d: 'Bn', s: 'VDD', w: 2 })
  .nmos('NIB', { g: 'B', d: 'Bn', s: 'GND' })
  .pmos('PA', { g: 'An', d: 'Y', s: 'VDD', w: 2 })
  .pmos('PB', { g: 'Bn', d: 'Y', s: 'VDD', w: 2 })
  .nmos('NA', { g: 'An', d: 'Y', s: 'm', w: 2 })
  .nmos('NB', { g: 'Bn', d: 'm', s: 'GND', w: 2 })
  .build();

/** Y = A | B: a NOR2 and an inverter. */
const or2 = circuit('or2')
  .rails()
  .input('A', 'B')
  .output('Y')
  .pmos('PA', { g: 'A', d: 'u', s: 'VDD', w: 4 })
  .pmos('PB', { g: 'B', d: 'Yn', s: 'u', w: 4 })
  .nmos('NA', { g: 'A', d: 'Yn', s: 'GND' })
  .nmos('NB', { g: 'B', d: 'Yn', s: 'GND' })
  .pmos('PO', { g: 'Yn', d: 'Y', s: 'VDD', w: 2 })
  .nmos('NO', { g: 'Yn', d: 'Y', s: 'GND' })
  .build();

describe('published facts', () => {
  it('De Morgan: a NAND of inverted inputs is an OR (M. M. Mano, Digital Design, 3rd ed., §2.4, from memory)', () => {
    expect(compareCells(cell(nandOfInverted), cell(or2))).toEqual({ equivalent: true });
  });

  it('a NAND2 and a NOR2 differ where A and B differ, and the replays show it', () => {
    const nand2 = starterById('nand2')!.design.netlist;
    const nor2 = starterById('nor2')!.design.netlist;
    const found = compareCells(cell(nand2), cell(nor2));
    expect(found.equivalent).toBe(false);
    expect(found.vector!.A).not.toBe(found.vector!.B);
    expect(found.outputs).toEqual({ a: { Y: '1' }, b: { Y: '0' } });
  });

  it('ripple-carry adders of mirror and of NAND full adders are equivalent; a miswired transistor is found', () => {
    expect(compareCells(cell(rippleAdder(4)), cell(nandRippleAdder(4)))).toEqual({ equivalent: true });
    const wrong = miswire(nandRippleAdder(4), 'FA2.g5.NA', 'CI');
    const found = compareCells(cell(rippleAdder(4)), cell(wrong));
    expect(found.equivalent).toBe(false);
    // The good adder's answer at the counterexample is the sum A + B + CI (arithmetic).
    const v = found.vector!;
    const word = (stem: string): number =>
      [0, 1, 2, 3].reduce((s, i) => s + (v[`${stem}${i}`] ?? NaN) * 2 ** i, 0);
    const sum = word('A') + word('B') + (v['CI'] ?? NaN);
    const read = (levels: Record<string, string>): number =>
      [0, 1, 2, 3].reduce((s, i) => s + (levels[`S${i}`] === '1' ? 2 ** i : 0), 0) +
      (levels.CO === '1' ? 16 : 0);
    expect(read(found.outputs!.a)).toBe(sum);
    expect(found.outputs!.a).not.toEqual(found.outputs!.b);
  });
});

describe('unusable comparisons', () => {
  it('cells with different pins are refused, naming the pins', () => {
    const inverter = starterById('inverter')!.design.netlist;
    expect(() => compareCells(cell(inverter), cell(or2))).toThrow(ComparisonError);
    expect(() => compareCells(cell(inverter), cell(or2))).toThrow(/inputs differ \(or2 only: B\)/);
  });
});

describe('agreement with two sweeps (internal consistency, fixed seed)', () => {
  it('a random cell against itself with one device left out: equivalent exactly when every row agrees', () => {
    let undecided = 0;
    fc.assert(
      fc.property(stagedCell({ maxInputs: 8, maxStages: 5 }), fc.nat(), ({ netlist }, drop) => {
        const other = {
          ...netlist,
          devices: netlist.devices.filter((_, i) => i !== drop % netlist.devices.length),
        };
        const found = compareCells(cell(netlist), cell(other));
        if (found.equivalent === null) undecided++;
        const [a, b] = [reportRows(checkSweep(netlist)), reportRows(checkSweep(other))];
        const differs = a.map((row, i) => JSON.stringify(row.outputs) !== JSON.stringify(b[i]?.outputs));
        if (found.equivalent === true) expect(differs.some(Boolean)).toBe(false);
        if (found.equivalent === false) {
          const index = netlist.inputs.reduce((k, n) => k * 2 + (found.vector?.[n] ?? NaN), 0);
          expect(differs[index]).toBe(true);
          expect(found.outputs).toEqual({ a: a[index]?.outputs, b: b[index]?.outputs });
        }
      }),
      { numRuns: 80, seed: 1203 },
    );
    expect(undecided).toBeLessThan(8);
  });
});
