/**
 * Transistors written as instances of kit subcircuits the file does not define, CDL `short`
 * links, and cells reachable by name (docs/semantics.md §6). The device names below follow the
 * open kits' conventions (`…nfet…`, `…_lv_pmos`); the naming rule is common practice, no source.
 */
import { describe, expect, it } from 'vitest';
import { importSpice, type SpiceImportError } from '../../src/core/netlist-io/spiceImport.ts';
import { refusalOf } from './refusal.ts';
import type { Netlist } from '../../src/core/model/netlist.ts';

const FILE = 'kit/cells.spice';

function only(text: string, options = {}): { netlist: Netlist; notes: readonly string[] } {
  const result = importSpice(text, FILE, options);
  const cell = result.cells[0];
  if (cell === undefined || result.cells.length !== 1) throw new Error('expected one cell');
  return { netlist: cell.netlist, notes: cell.notes };
}

function refusal(text: string, options = {}): SpiceImportError {
  return refusalOf(text, FILE, options);
}

const INV = (n: string, p: string) => `.subckt inv A Y VGND VPWR
X0 Y A VGND VGND ${n} w=650000u l=150000u
X1 Y A VPWR VPWR ${p} w=1e+06u l=150000u
.ends
`;

describe('undefined subcircuits that stand for transistors', () => {
  it.each([
    ['sky130_fd_pr__nfet_01v8', 'sky130_fd_pr__pfet_01v8_hvt'],
    ['sg13_lv_nmos', 'sg13_lv_pmos'],
    ['nch_lvt', 'pch_lvt'],
    ['mos_n', 'mos_p'],
  ])('reads %s and %s by name, with a note listing them', (n, p) => {
    const { netlist, notes } = only(`.option scale=1e-6\n${INV(n, p)}`, {
      supplyNames: ['VPWR'],
      groundNames: ['VGND'],
    });
    expect(netlist.devices.map((d) => [d.kind, d.name])).toEqual([
      ['nmos', 'X0'],
      ['pmos', 'X1'],
    ]);
    expect(netlist.devices[0]).toMatchObject({
      drain: 'Y',
      gate: 'A',
      source: 'VGND',
      bulk: 'VGND',
      w: 0.65,
      l: 0.15,
    });
    expect(notes).toContain(
      `subcircuits not defined in this file read as devices: ${n} → nmos ×1, ${p} → pmos ×1`,
    );
  });

  it('refuses a name that decides nothing, naming the line and the option to use', () => {
    const e = refusal(INV('kitfet_a', 'kitfet_b'));
    expect(e.line).toBe(2);
    expect(e.message).toMatch(
      /X0: subcircuit kitfet_a is not defined in this file, and its name does not say NMOS or PMOS: give --treat-as kitfet_a=nmos/,
    );
  });

  it('takes the mapping from the option or from our own directive', () => {
    const options = { standIns: new Map([['kitfet_a', 'nmos' as const]]) };
    const text = `* railwise: treat-as kitfet_b=pmos\n.option scale=1e-6\n${INV('kitfet_a', 'kitfet_b')}`;
    const { netlist, notes } = only(text, options);
    expect(netlist.devices.map((d) => d.kind)).toEqual(['nmos', 'pmos']);
    expect(notes).toContain(
      'subcircuits not defined in this file read as devices: kitfet_a → nmos ×1 (as told), kitfet_b → pmos ×1 (as told)',
    );
  });

  it('refuses a bad directive and a mapping with the wrong number of nets, with the line', () => {
    expect(refusal(`* railwise: treat-as kitfet=bjt\n${INV('nfet', 'pfet')}`).message).toMatch(
      /^kit\/cells\.spice:1: treat-as: "kitfet=bjt"/,
    );
    const e = refusal(`.subckt d A B\nXD1 A B C dantenna\n.ends`, {
      standIns: new Map([['dantenna', 'diode' as const]]),
    });
    expect(e.line).toBe(2);
    expect(e.message).toMatch(/XD1: dantenna is read as diode, which takes 2 nets, not 3/);
  });

  it('reads two-terminal antenna and diode subcircuits as protection diodes', () => {
    const { netlist } = only(`.subckt ant A VSS\nXD1 VSS A dantenna l=780n w=780n\n.ends`);
    expect(netlist.devices).toEqual([{ kind: 'diode', name: 'XD1', anode: 'VSS', cathode: 'A' }]);
  });
});

describe('short links (CDL)', () => {
  it('joins an internal net into the port it is shorted to, with a note', () => {
    const { netlist, notes } = only(`.subckt probe A X VDD VSS
MP n29 A VDD VDD pch w=1u l=0.15u
MN n29 A VSS VSS nch w=1u l=0.15u
rI1 n29 X short
.ends`);
    expect(netlist.devices.map((d) => (d.kind === 'nmos' ? d.drain : ''))).toContain('X');
    expect(netlist.outputs).toEqual(['X']);
    expect(notes).toContain('short links join their nets: rI1 (n29 into X)');
  });

  it('keeps a link between a pin and a rail as the smallest resistor, so both names stay (a tie cell)', () => {
    const { netlist, notes } = only(
      `.subckt tie VGND VPWR HI LO\nrI12 VGND LO short\nrI11 HI VPWR short\n.ends`,
      {
        supplyNames: ['VPWR'],
        groundNames: ['VGND'],
      },
    );
    expect(netlist.outputs).toEqual(['HI', 'LO']);
    expect(netlist.devices).toContainEqual({
      kind: 'resistor',
      name: 'rI11',
      a: 'HI',
      b: 'VPWR',
      ohms: 0.001,
    });
    expect(
      notes.some((n) => n.startsWith('short links between two pins or rails kept as 0.001 Ω resistors')),
    ).toBe(true);
  });

  it('reads an instance of a subcircuit named short as the same link', () => {
    const { netlist } = only(`.subckt tie VGND VNB LO\nX0 VGND LO VNB short w=480000u l=45000u\n.ends`, {
      groundNames: ['VGND', 'VNB'],
    });
    expect(netlist.devices).toEqual([{ kind: 'resistor', name: 'X0', a: 'VGND', b: 'LO', ohms: 0.001 }]);
  });
});

describe('every cell is reachable', () => {
  const LIB = `.subckt inv A Y VDD VSS
MP Y A VDD VDD pch w=1u l=0.25u
MN Y A VSS VSS nch w=1u l=0.25u
.ends
.subckt buf A Y VDD VSS
X1 A m VDD VSS inv
X2 m Y VDD VSS inv
.ends
`;

  it('picks any subcircuit by name, also one that another instantiates', () => {
    const r = importSpice(LIB, FILE, { cell: 'INV' });
    expect(r.cells.map((c) => c.name)).toEqual(['inv']);
    expect(importSpice(LIB, FILE).cells.map((c) => c.name)).toEqual(['buf']);
    expect(importSpice(LIB, FILE, { cell: 'nand' }).cells).toEqual([]);
    expect(importSpice(LIB, FILE, { cell: 'nand' }).available).toEqual(['inv', 'buf']);
  });
});
