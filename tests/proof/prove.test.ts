/**
 * Proofs over all 0/1 vectors (docs/semantics.md §10): for every property a cell where it holds and
 * one where it fails at a known vector, the textbook gates' functions, and cells outside the scope.
 */
import { describe, expect, it } from 'vitest';
import { circuit } from '../../src/core/model/builder.ts';
import type { Netlist } from '../../src/core/model/netlist.ts';
import type { PropertyResult } from '../../src/core/proof/decide.ts';
import type { ProofProperty } from '../../src/core/proof/properties.ts';
import { proveCell } from '../../src/core/proof/prove.ts';
import { starterById } from '../../src/core/starters/index.ts';
import { inverter, nand2, nand2MissingPullUp, nandLatch, resistorLoadInverter } from '../cells.ts';

function prove(netlist: Netlist, expectations: Record<string, string> = {}) {
  const report = proveCell(netlist, { expectations });
  return (property: ProofProperty, output: string | null = null): PropertyResult => {
    const found = report.properties.find((p) => p.property === property && p.output === output);
    if (!found) throw new Error(`no ${property} for ${output}`);
    return found;
  };
}

/** The counterexample as `A=1 B=0`, inputs in the cell's order. */
const at = (p: PropertyResult, netlist: Netlist): string =>
  netlist.inputs.map((n) => `${n}=${p.vector?.[n]}`).join(' ');

/** Y from A through one NMOS gated by EN: a high arrives one threshold down; off, Y floats. */
const nmosPass = circuit('nmos_pass')
  .rails()
  .input('A', 'EN')
  .output('Y')
  .nmos('N1', { g: 'EN', d: 'A', s: 'Y' })
  .build();

/** Two inverters, from A and from B, drive Y: they fight wherever A and B differ. */
const fight = circuit('fight')
  .rails()
  .input('A', 'B')
  .output('Y')
  .pmos('PA', { g: 'A', d: 'Y', s: 'VDD', w: 2 })
  .nmos('NA', { g: 'A', d: 'Y', s: 'GND' })
  .pmos('PB', { g: 'B', d: 'Y', s: 'VDD', w: 2 })
  .nmos('NB', { g: 'B', d: 'Y', s: 'GND' })
  .build();

describe('each property holds on a good cell and fails at a known vector on a faulty one', () => {
  it('function: NAND2 is !(A & B); without its B pull-up it floats at A=1 B=0 (the only such vector)', () => {
    expect(prove(nand2, { Y: '!(A & B)' })('function', 'Y').holds).toBe(true);
    const broken = prove(nand2MissingPullUp, { Y: '!(A & B)' })('function', 'Y');
    expect(broken.holds).toBe(false);
    expect(at(broken, nand2MissingPullUp)).toBe('A=1 B=0');
    expect(broken.findings!.map((f) => f.kind).sort()).toEqual(['floating', 'mismatch']);
  });

  it('no-static-current: the CMOS inverter draws none; the resistor-load inverter does at A=1', () => {
    expect(prove(inverter)('no-static-current').holds).toBe(true);
    const load = prove(resistorLoadInverter)('no-static-current');
    expect(load.holds).toBe(false);
    expect(load.vector).toEqual({ A: 1 });
    expect(load.findings?.[0]?.path).toEqual(['VDD', 'R1', 'Y', 'N1', 'GND']);
  });

  it('no-contention and no-unknown: two inverters on one net fight where A and B differ', () => {
    expect(prove(inverter)('no-contention').holds).toBe(true);
    expect(prove(inverter)('no-unknown', 'Y').holds).toBe(true);
    const p = prove(fight);
    for (const property of ['no-contention', 'no-unknown', 'no-static-current'] as const) {
      expect(p(property, property === 'no-unknown' ? 'Y' : null).holds).toBe(false);
      expect(['A=0 B=1', 'A=1 B=0']).toContain(
        at(p(property, property === 'no-unknown' ? 'Y' : null), fight),
      );
    }
  });

  it('no-floating: a transmission gate expected to be Z when off holds; a NAND2 without a pull-up floats', () => {
    const tg = starterById('transmission-gate')!.design;
    expect(prove(tg.netlist, tg.expectations)('no-floating', 'Y').holds).toBe(true);
    const broken = prove(nand2MissingPullUp)('no-floating', 'Y');
    expect(broken.holds).toBe(false);
    expect(at(broken, nand2MissingPullUp)).toBe('A=1 B=0');
  });

  it('no-degraded: a transmission gate passes full levels; a lone NMOS passes a high one threshold down (A=1 EN=1)', () => {
    const tg = starterById('transmission-gate')!.design;
    expect(prove(tg.netlist, tg.expectations)('no-degraded', 'Y').holds).toBe(true);
    const p = prove(nmosPass, { Y: 'EN ? A : Z' });
    expect(p('function', 'Y').holds).toBe(true);
    expect(p('no-floating', 'Y').holds).toBe(true);
    const degraded = p('no-degraded', 'Y');
    expect(degraded.holds).toBe(false);
    expect(at(degraded, nmosPass)).toBe('A=1 EN=1');
    expect(degraded.findings!.map((f) => f.kind)).toEqual(['degraded']);
  });
});

describe('published facts', () => {
  // The functions of the textbook gates (common practice, no source).
  for (const id of [
    'inverter',
    'nand2',
    'nor2',
    'aoi21',
    'oai21',
    'mux2',
    'tristate-inverter',
    'transmission-gate',
  ]) {
    it(`${id}: every property holds`, () => {
      const { netlist, expectations } = starterById(id)!.design;
      const report = proveCell(netlist, { expectations });
      expect(report.properties.filter((p) => p.holds !== true)).toEqual([]);
      expect(report.properties.some((p) => p.property === 'function')).toBe(true);
    });
  }
});

describe('outside the scope of proofs', () => {
  it('a NAND latch keeps stored state: every property is undecided, and the reason says to use a sequence', () => {
    const report = proveCell(nandLatch, { expectations: { Q: '!SN | RN & Q' } });
    for (const p of report.properties) {
      expect(p.holds).toBeNull();
      expect(p.reason).toMatch(/stored state at SN=1 RN=1.*sequence/);
    }
  });

  it('a loop past the table bound is not covered; a combinational group past it is encoded structurally', () => {
    const latch = proveCell(nandLatch, { maxControls: 1 });
    expect(latch.properties[0]?.reason).toMatch(/^out of scope for proofs: a loop of 2 components/);
    const gate = proveCell(starterById('aoi21')!.design.netlist, {
      expectations: { Y: '!(A & B | C)' },
      maxControls: 1,
    });
    expect(gate.properties.every((p) => p.holds === true)).toBe(true);
    expect(gate.notes).toEqual(['1 of 1 groups encoded structurally (past the table bound)']);
  });
});
