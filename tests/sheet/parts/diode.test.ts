/**
 * The diode on the sheet, from its spec to the solver. A protection diode sits reverse-biased in
 * normal operation and carries no steady-state current (common practice, no source); the
 * switch-level model goes further and never lets a diode conduct (docs/semantics.md §1), so a diode
 * drawn forward-biased joins nothing either. Nets and device names are our own.
 */
import { describe, expect, it } from 'vitest';
import { partForDevice, partSpec } from '../../../src/core/sheet/parts/index.ts';
import { autoPlace } from '../../../src/core/sheet/autoPlace.ts';
import { sheetToNetlist } from '../../../src/core/sheet/toNetlist.ts';
import { nextPartName } from '../../../src/core/sheet/naming.ts';
import { checkSweep } from '../../../src/core/analysis/check.ts';
import { circuit } from '../../../src/core/model/builder.ts';
import type { Sheet } from '../../../src/core/sheet/types.ts';
import { drawnInverter, part } from '../fixtures.ts';
import { canvasTexts, devicesOf, svgTexts } from './partSheets.ts';
import { reportRows } from '../../../src/core/analysis/sweepColumns.ts';

/** The drawn inverter with a clamp on Y each way: GND → Y and Y → VDD, joined by net labels. */
function clampedInverter(): Sheet {
  const inv = drawnInverter();
  const diode = (id: string, name: string, x: number, anode: string, cathode: string) => [
    part(id, 'diode', name, x, 0),
    part(`${id}a`, 'label', anode, x, -2),
    part(`${id}c`, 'label', cathode, x, 2),
  ];
  return {
    ...inv,
    parts: [...inv.parts, ...diode('d1', 'DN', 12, 'GND', 'Y'), ...diode('d2', 'DP', 16, 'Y', 'VDD')],
  };
}

describe('the diode part', () => {
  it('has no size: no fields, no defaults, only its name as text', () => {
    const d = part('d', 'diode', 'D1', 0, 0);
    expect(partSpec('diode').fields).toEqual([]);
    expect(partSpec('diode').defaults).toEqual({});
    expect(partSpec('diode').valueLabel(d)).toBe('');
    expect(canvasTexts(d)).toEqual(['D1']);
    expect(svgTexts(d)).toEqual(['D1']);
  });

  it('is named D1, D2, … and contributes a diode from its anode (top) to its cathode', () => {
    expect(nextPartName({ parts: [part('d', 'diode', 'D1', 0, 0)], wires: [] }, 'diode')).toBe('D2');
    expect(devicesOf(part('d', 'diode', 'D4', 0, 0))).toEqual([
      { kind: 'diode', name: 'D4', anode: 'net1', cathode: 'net2' },
    ]);
  });

  it('stands for an imported diode', () => {
    const device = { kind: 'diode' as const, name: 'DP', anode: 'A', cathode: 'VDD' };
    expect(partForDevice(device, { id: 'p1', x: 0, y: 0, rotation: 0, mirror: false })).toMatchObject({
      kind: 'diode',
      name: 'DP',
    });
  });
});

describe('diodes from the sheet to the solver', () => {
  it('clamps drawn on an inverter reach the netlist and change neither level nor current', () => {
    const { netlist } = sheetToNetlist(clampedInverter(), 'inv');
    expect(netlist.devices.filter((d) => d.kind === 'diode')).toEqual([
      { kind: 'diode', name: 'DN', anode: 'GND', cathode: 'Y' },
      { kind: 'diode', name: 'DP', anode: 'Y', cathode: 'VDD' },
    ]);
    const report = checkSweep(netlist);
    expect(reportRows(report).map((v) => [v.inputs.A, v.outputs.Y])).toEqual([
      ['0', '1'],
      ['1', '0'],
    ]);
    for (const v of reportRows(report)) expect(v.supplyCurrent).toBe(0);
    expect(report.findings.filter((f) => f.kind === 'static-current' || f.kind === 'short')).toEqual([]);
  });

  it('a diode drawn forward from an input to an output leaves that output undriven (Z)', () => {
    const sheet: Sheet = {
      parts: [
        part('a', 'input', 'A', 0, -2),
        part('d', 'diode', 'D1', 0, 0),
        part('y', 'output', 'Y', 0, 2),
        part('g', 'gnd', 'GND', 20, 0),
        part('v', 'vdd', 'VDD', 24, 0),
      ],
      wires: [],
    };
    const { netlist } = sheetToNetlist(sheet, 'lone');
    expect(netlist.devices).toEqual([{ kind: 'diode', name: 'D1', anode: 'A', cathode: 'Y' }]);
    const report = checkSweep(netlist);
    expect(reportRows(report).map((v) => v.outputs.Y)).toEqual(['Z', 'Z']);
    expect(reportRows(report).map((v) => v.supplyCurrent)).toEqual([0, 0]);
  });

  it('imported diodes are placed on the sheet and derive back to the same netlist', () => {
    const netlist = circuit('pad')
      .rails()
      .input('A')
      .output('Y')
      .pmos('P1', { g: 'A', d: 'Y', s: 'VDD' })
      .nmos('N1', { g: 'A', d: 'Y', s: 'GND' })
      .diode('DN', 'GND', 'A')
      .diode('DP', 'A', 'VDD')
      .build();
    const sheet = autoPlace(netlist);
    expect(sheet.parts.filter((p) => p.kind === 'diode').map((p) => p.name)).toEqual(['DN', 'DP']);
    const derived = sheetToNetlist(sheet, 'pad').netlist;
    expect(derived.devices).toEqual(netlist.devices);
    expect(derived.inputs).toEqual(['A']);
    expect(derived.outputs).toEqual(['Y']);
  });
});
