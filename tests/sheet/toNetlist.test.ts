import { describe, expect, it } from 'vitest';
import { sheetToNetlist } from '../../src/core/sheet/toNetlist.ts';
import type { Sheet } from '../../src/core/sheet/types.ts';
import { drawnInverter, part } from './fixtures.ts';
import { inverter } from '../cells.ts';

describe('sheetToNetlist', () => {
  it('derives the static CMOS inverter from a drawing', () => {
    // The inverter topology (PMOS VDD→Y, NMOS Y→GND, both gates on A) is common practice, no source.
    const expected = inverter;
    const d = sheetToNetlist(drawnInverter(), 'inv');
    expect(d.netlist).toEqual(expected);
    expect(d.issues).toEqual([]);
  });

  it('maps every wire and pin to its net and every device part to its device', () => {
    const d = sheetToNetlist(drawnInverter());
    expect(d.wireNets).toEqual({ w1: 'Y', w2: 'Y', w3: 'A', w4: 'A' });
    expect(d.pinNets.get('p1.gate')).toBe('A');
    expect(d.pinNets.get('p2.source')).toBe('GND');
    expect(d.partDevices).toEqual({ p1: 'P1', p2: 'N1' });
  });

  it('draws junction dots at T joins and where a pin sits inside a wire, not at plain corners', () => {
    const { junctions } = sheetToNetlist(drawnInverter());
    // (0,0): w2 ends on w1; (-4,0): w4 ends on w3. Corners of w3 have two arms only.
    expect(junctions).toEqual(
      expect.arrayContaining([
        { x: 0, y: 0 },
        { x: -4, y: 0 },
      ]),
    );
    expect(junctions).toHaveLength(2);
  });

  it('marks wire ends that touch nothing, and only those', () => {
    const sheet = drawnInverter();
    expect(sheetToNetlist(sheet).openEnds).toEqual([]);
    const dangling: Sheet = {
      ...sheet,
      wires: [
        ...sheet.wires,
        {
          id: 'w9',
          points: [
            { x: 4, y: 0 },
            { x: 4, y: 6 },
            { x: 9, y: 6 },
          ],
        },
      ],
    };
    expect(sheetToNetlist(dangling).openEnds).toEqual([{ x: 9, y: 6 }]);
  });

  it('keeps two wires that only cross apart (no end or bend at the crossing)', () => {
    const sheet: Sheet = {
      parts: [part('a', 'label', 'H', -2, 0), part('b', 'label', 'V', 0, -2)],
      wires: [
        {
          id: 'h',
          points: [
            { x: -2, y: 0 },
            { x: 2, y: 0 },
          ],
        },
        {
          id: 'v',
          points: [
            { x: 0, y: -2 },
            { x: 0, y: 2 },
          ],
        },
      ],
    };
    const d = sheetToNetlist(sheet);
    expect(d.wireNets).toEqual({ h: 'H', v: 'V' });
    expect(d.junctions).toEqual([]);
  });

  it('joins nets that carry equal labels (trade convention: equal net names are one net)', () => {
    const sheet: Sheet = {
      parts: [
        part('n1', 'nmos', 'N1', 0, 0),
        part('n2', 'nmos', 'N2', 10, 0),
        part('l1', 'label', 'BL', 0, -2),
        part('l2', 'label', 'BL', 10, -2),
      ],
      wires: [],
    };
    const devices = sheetToNetlist(sheet).netlist.devices;
    expect(devices.map((d) => (d.kind === 'nmos' ? d.drain : ''))).toEqual(['BL', 'BL']);
  });

  it('names unnamed nets net1, net2… and gives every unconnected pin a net of its own', () => {
    const sheet: Sheet = { parts: [part('n1', 'nmos', 'N1', 0, 0)], wires: [] };
    const [n1] = sheetToNetlist(sheet).netlist.devices;
    expect(n1).toMatchObject({ gate: 'net1', drain: 'net2', source: 'net3' });
  });

  it('prefers a rail name over a pin name over a label, and reports the clash', () => {
    const sheet: Sheet = {
      parts: [part('a', 'input', 'A', 0, 0), part('l', 'label', 'IN', 0, 0), part('g', 'nmos', 'N1', 2, 0)],
      wires: [],
    };
    const d = sheetToNetlist(sheet);
    expect(d.netlist.inputs).toEqual(['A']);
    expect(d.issues.map((i) => i.kind)).toEqual(['name-conflict']);
  });

  it('reports two devices with one name', () => {
    const sheet: Sheet = { parts: [part('a', 'nmos', 'N1', 0, 0), part('b', 'nmos', 'N1', 6, 0)], wires: [] };
    expect(sheetToNetlist(sheet).issues).toEqual([
      expect.objectContaining({ kind: 'duplicate-device', parts: ['a', 'b'] }),
    ]);
  });

  it('gives the same netlist whatever the order of parts and wires (docs/semantics.md §8 determinism)', () => {
    const sheet = drawnInverter();
    const shuffled: Sheet = { parts: [...sheet.parts].reverse(), wires: [...sheet.wires].reverse() };
    const a = sheetToNetlist(sheet).netlist;
    const b = sheetToNetlist(shuffled).netlist;
    const byName = <T extends { name: string }>(xs: readonly T[]) =>
      [...xs].sort((x, y) => x.name.localeCompare(y.name));
    expect(byName(b.devices)).toEqual(byName(a.devices));
    expect(new Set(b.rails.map((r) => r.net))).toEqual(new Set(a.rails.map((r) => r.net)));
  });

  it('does not mutate the sheet', () => {
    const sheet = drawnInverter();
    const copy = structuredClone(sheet);
    sheetToNetlist(sheet);
    expect(sheet).toEqual(copy);
  });
});

describe('connectivity of unusual wires', () => {
  /** A wire through the given points. */
  const wire = (id: string, ...xy: [number, number][]) => ({ id, points: xy.map(([x, y]) => ({ x, y })) });

  it('joins a pin in the middle of a wire a million units long, and a slanted segment only at its ends', () => {
    const sheet = {
      parts: [part('a', 'label', 'FAR', 500_000, 0), part('b', 'label', 'MID', 3, 3)],
      // A file may hold a slanted segment; it passes (1,1) and (2,2) without touching them.
      wires: [wire('long', [-500_000, 0], [700_000, 0]), wire('slant', [0, 0], [3, 3])],
    };
    const d = sheetToNetlist(sheet);
    expect(d.wireNets).toEqual({ long: 'FAR', slant: 'FAR' });
    expect(d.pinNets.get('b.net')).toBe('FAR');
    const off = sheetToNetlist({ ...sheet, parts: [part('c', 'label', 'OFF', 1, 1)] });
    expect(off.wireNets.slant).not.toBe('OFF');
  });
});
