/**
 * The hierarchy model: instantiate, descend, recursion refused, a renamed pin followed by every
 * instance, and a flip-flop of two latch instances against the same circuit flattened by hand.
 * Rules: docs/semantics.md §1 (hierarchy).
 */
import { reportRows } from '../../src/core/analysis/sweepColumns.ts';
import { describe, expect, it } from 'vitest';
import { checkSequence, checkSweep } from '../../src/core/analysis/check.ts';
import { cellDesign, cellsByName } from '../../src/core/hierarchy/cellDesign.ts';
import { renameCell, renamePin } from '../../src/core/hierarchy/edits.ts';
import { flattenCell, HierarchyError } from '../../src/core/hierarchy/flatten.ts';
import { locateName } from '../../src/core/hierarchy/paths.ts';
import { circuit } from '../../src/core/model/builder.ts';
import type { InputVector } from '../../src/core/model/design.ts';
import { mapDeviceNets, type Netlist } from '../../src/core/model/netlist.ts';
import { tgDLatch } from '../../src/core/starters/sequential.ts';
import { inverter, resistorLoadInverter } from '../cells.ts';
import { buffer, bufferDesign, cell, design, flipFlop, flipFlopDesign, latchCell } from './cells.ts';

describe('instantiating a cell', () => {
  const flat = cellDesign(bufferDesign).netlist;

  it('names every device and inner net by its instance path', () => {
    expect(flat.devices.map((d) => d.name)).toEqual(['X1.P1', 'X1.N1', 'X2.P1', 'X2.N1']);
    expect(flat.devices[0]).toMatchObject({ gate: 'A', drain: 'mid', source: 'VDD' });
    expect(flat.devices[3]).toMatchObject({ gate: 'mid', drain: 'Y', source: 'GND' });
  });

  it('joins the rails of placed cells by name (rails are global)', () => {
    expect(flat.rails).toEqual(inverter.rails);
    expect(flat.inputs).toEqual(['A']);
    expect(flat.outputs).toEqual(['Y']);
  });

  it('computes what two inverters in a row compute: Y = A', () => {
    const report = checkSweep(flat, { expectations: { Y: 'A' } });
    expect(reportRows(report).map((v) => v.outputs['Y'])).toEqual(['0', '1']);
    expect(report.summary.errors).toBe(0);
  });

  it('gives an inner net of an instance its own path, apart from the net of that name above', () => {
    const inner = cell(circuit('pair').input('A').output('Y').nmos('N1', { g: 'A', d: 'Y', s: 'k' }).build());
    const outer = cell(circuit('top').input('A').output('Y').build(), [
      { name: 'X1', cell: 'pair', pins: { A: 'A', Y: 'k' } },
      { name: 'X2', cell: 'pair', pins: { A: 'k', Y: 'Y' } },
    ]);
    const nets = flattenCell(cellsByName({ cells: [inner, outer] }), 'top').devices.map((d) =>
      'source' in d ? d.source : '',
    );
    expect(nets).toEqual(['X1.k', 'X2.k']);
  });

  it('refuses a hierarchical name that is also a net of the cell, naming it', () => {
    const clash = cell(circuit('buf').input('A').output('X1.mid').build(), buffer.instances);
    const inv = cell(
      circuit('inv').rails().input('A').output('Y').nmos('N1', { g: 'A', d: 'mid', s: 'Y' }).build(),
    );
    expect(() => flattenCell(cellsByName({ cells: [inv, clash] }), 'buf')).toThrow(/X1\.mid/);
  });
});

describe('descending to a hierarchical name', () => {
  const cells = cellsByName(flipFlopDesign);

  it('finds the instance path and the name inside the cell', () => {
    const found = locateName(cells, 'dff', 'XS.n1');
    expect(found?.path.map((i) => i.name)).toEqual(['XS']);
    expect(found).toMatchObject({ cell: 'tg_d_latch', local: 'n1' });
    expect(locateName(cells, 'dff', 'XM.NT1')).toMatchObject({ cell: 'tg_d_latch', local: 'NT1' });
  });

  it('stays at the top for a name the top cell holds, and gives null for a name nowhere', () => {
    expect(locateName(cells, 'dff', 'CLKN')).toMatchObject({ path: [], cell: 'dff', local: 'CLKN' });
    expect(locateName(cells, 'dff', 'XS.nowhere')).toBeNull();
  });

  it('names the same net as the flat netlist does', () => {
    const flat = cellDesign(flipFlopDesign).netlist;
    for (const d of flat.devices) {
      const found = locateName(cells, 'dff', d.name);
      expect(found, d.name).not.toBeNull();
    }
  });
});

describe('recursion', () => {
  it('is refused with the chain of cells named', () => {
    const a = cell(circuit('a').input('A').build(), [{ name: 'XB', cell: 'b', pins: {} }]);
    const b = cell(circuit('b').input('A').build(), [{ name: 'XC', cell: 'c', pins: {} }]);
    const c = cell(circuit('c').input('A').build(), [{ name: 'XA', cell: 'a', pins: {} }]);
    expect(() => cellDesign(design([a, b, c], 'a'))).toThrow(HierarchyError);
    expect(() => cellDesign(design([a, b, c], 'a'))).toThrow(/a → b → c → a/);
  });
});

describe('renaming', () => {
  it('a pin updates every instance that places the cell, in every cell', () => {
    const twoUsers = design([cell(inverter), buffer, { ...buffer, name: 'buf2' }], 'buf');
    const renamed = renamePin(twoUsers, 'inv', 'A', 'IN');
    const inv = renamed.cells.find((c) => c.name === 'inv')!;
    expect(inv.netlist.inputs).toEqual(['IN']);
    expect(inv.netlist.devices.every((d) => !('gate' in d) || d.gate === 'IN')).toBe(true);
    for (const user of renamed.cells.filter((c) => c.name !== 'inv'))
      for (const i of user.instances) expect(Object.keys(i.pins).sort()).toEqual(['IN', 'Y']);
    expect(cellDesign(renamed).netlist).toEqual(cellDesign(twoUsers).netlist);
  });

  it('a cell updates every instance of it and the open cell', () => {
    const renamed = renameCell(bufferDesign, 'inv', 'lamp_inv');
    expect(renamed.cells.find((c) => c.name === 'buf')?.instances.map((i) => i.cell)).toEqual([
      'lamp_inv',
      'lamp_inv',
    ]);
    expect(renameCell(bufferDesign, 'buf', 'buffer').open).toBe('buffer');
    expect(() => renameCell(bufferDesign, 'buf', 'inv')).toThrow(/already named inv/);
  });
});

/** The flip-flop's devices written out by hand: the latch's devices twice, each net renamed. */
function flipFlopByHand(): Netlist {
  const copy = (prefix: string, pins: Record<string, string>) =>
    tgDLatch.devices.map((d) => {
      const net = (n: string): string =>
        pins[n] ?? (tgDLatch.rails.some((r) => r.net === n) ? n : `${prefix}_${n}`);
      return { ...mapDeviceNets(d, net), name: `${prefix}_${d.name}` };
    });
  const clock = flipFlop.netlist;
  return {
    ...clock,
    devices: [
      ...clock.devices,
      ...copy('m', { D: 'D', CLK: 'CLKN', Q: 'M' }),
      ...copy('s', { D: 'M', CLK: 'CLK', Q: 'Q' }),
    ],
  };
}

describe('a flip-flop of two latch instances', () => {
  // A master–slave D flip-flop takes D at the rising edge of CLK and holds it otherwise
  // (W&H 4th ed. §10.3.1; common practice).
  const steps: InputVector[] = [
    { D: '1', CLK: '0' },
    { D: '1', CLK: '1' }, // rising edge: Q = 1
    { D: '0', CLK: '1' }, // D changes while CLK = 1: Q holds 1
    { D: '0', CLK: '0' }, // falling edge: Q holds 1
    { D: '0', CLK: '1' }, // rising edge: Q = 0
    { D: '1', CLK: '1' }, // Q holds 0
  ];
  const q = (netlist: Netlist) => checkSequence(netlist, steps).steps?.map((s) => s.outputs['Q']);

  it('takes D at the rising edge of CLK', () => {
    expect(q(cellDesign(flipFlopDesign).netlist)).toEqual(['X', '1', '1', '1', '0', '0']);
  });

  it('gives the same levels at every step as the flip-flop flattened by hand', () => {
    expect(q(cellDesign(flipFlopDesign).netlist)).toEqual(q(flipFlopByHand()));
    expect(latchCell.netlist.name).toBe('tg_d_latch');
  });
});

describe('findings and current paths inside an instance', () => {
  it('name nets and devices by their hierarchical names', () => {
    const load = cell(resistorLoadInverter);
    const top = cell(circuit('top').input('A').output('Y').build(), [
      { name: 'X1', cell: resistorLoadInverter.name, pins: { A: 'A', Y: 'Y' } },
    ]);
    const report = checkSweep(cellDesign(design([load, top], 'top')).netlist);
    const current = report.findings.find((f) => f.kind === 'static-current');
    expect(current?.devices).toEqual(['X1.R1', 'X1.N1']);
    expect(current?.path).toEqual(['VDD', 'X1.R1', 'Y', 'X1.N1', 'GND']);
    expect(reportRows(report)[1]?.currentPaths[0]?.chain).toEqual(['VDD', 'X1.R1', 'Y', 'X1.N1', 'GND']);
  });
});
