import { describe, expect, it } from 'vitest';
import { autoPlace } from '../../src/core/sheet/autoPlace.ts';
import { sheetToNetlist } from '../../src/core/sheet/toNetlist.ts';
import { partBounds } from '../../src/core/sheet/geometry.ts';
import { STARTERS } from '../../src/core/starters/index.ts';
import { circuit } from '../../src/core/model/builder.ts';
import type { Netlist } from '../../src/core/model/netlist.ts';

/** Net-for-net comparison: the same devices on the same nets, the same rails and pins. */
function sameCircuit(a: Netlist, b: Netlist): void {
  expect(a.devices).toEqual(b.devices);
  expect([...a.rails].sort((x, y) => x.net.localeCompare(y.net))).toEqual(
    [...b.rails].sort((x, y) => x.net.localeCompare(y.net)),
  );
  expect(a.inputs).toEqual(b.inputs);
  expect(a.outputs).toEqual(b.outputs);
}

describe('auto-placement of a netlist', () => {
  it.each(STARTERS.map((s) => [s.id, s.design.netlist] as const))(
    '%s: the drawing derives back to the same netlist',
    (_, netlist) => {
      sameCircuit(sheetToNetlist(autoPlace(netlist), netlist.name).netlist, netlist);
    },
  );

  it('puts the pull-up network above the output row and the pull-down below (common practice, no source)', () => {
    const nor2 = circuit('nor2')
      .rails()
      .input('A', 'B')
      .output('Y')
      .pmos('P1', { g: 'A', d: 'm', s: 'VDD' })
      .pmos('P2', { g: 'B', d: 'Y', s: 'm' })
      .nmos('N1', { g: 'A', d: 'Y', s: 'GND' })
      .nmos('N2', { g: 'B', d: 'Y', s: 'GND' })
      .build();
    const sheet = autoPlace(nor2);
    const y = (name: string) => sheet.parts.find((p) => p.name === name && p.kind !== 'label')!.y;
    expect(Math.max(y('P1'), y('P2'))).toBeLessThan(0);
    expect(Math.min(y('N1'), y('N2'))).toBeGreaterThan(0);
    // The series stack: P1 nearest the supply is drawn above P2, in the same column.
    expect(y('P1')).toBeLessThan(y('P2'));
    const x = (name: string) => sheet.parts.find((p) => p.name === name)!.x;
    expect(x('P1')).toBe(x('P2'));
  });

  it('puts inputs left of every device and outputs right of them', () => {
    const netlist = STARTERS.find((s) => s.id === 'aoi21')!.design.netlist;
    const sheet = autoPlace(netlist);
    const devices = sheet.parts.filter((p) => p.kind === 'nmos' || p.kind === 'pmos');
    const inputs = sheet.parts.filter((p) => p.kind === 'input');
    const outputs = sheet.parts.filter((p) => p.kind === 'output');
    expect(Math.max(...inputs.map((p) => p.x))).toBeLessThan(
      Math.min(...devices.map((p) => partBounds(p).x0)),
    );
    expect(Math.min(...outputs.map((p) => p.x))).toBeGreaterThan(
      Math.max(...devices.map((p) => partBounds(p).x1)),
    );
  });

  it('wires the output pin to its net when the row is clear', () => {
    const nand2 = STARTERS.find((s) => s.id === 'nand2')!.design.netlist;
    const sheet = autoPlace(nand2);
    const out = sheet.parts.find((p) => p.kind === 'output')!;
    const wire = sheet.wires.find((w) => w.points.some((p) => p.x === out.x && p.y === out.y));
    expect(wire).toBeDefined();
    expect(sheetToNetlist(sheet).wireNets[wire!.id]).toBe('Y');
  });

  it('never overlaps two device bodies', () => {
    for (const s of STARTERS) {
      const boxes = autoPlace(s.design.netlist)
        .parts.filter((p) => ['nmos', 'pmos', 'resistor', 'capacitor'].includes(p.kind))
        .map(partBounds);
      for (let i = 0; i < boxes.length; i++) {
        for (let j = i + 1; j < boxes.length; j++) {
          const [a, b] = [boxes[i]!, boxes[j]!];
          const overlap = a.x0 < b.x1 && b.x0 < a.x1 && a.y0 < b.y1 && b.y0 < a.y1;
          expect(overlap, `${s.id}: devices ${i} and ${j}`).toBe(false);
        }
      }
    }
  });
});
