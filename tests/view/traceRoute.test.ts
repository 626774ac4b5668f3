import { describe, expect, it } from 'vitest';
import { traceRoute } from '../../src/core/view/traceRoute.ts';
import type { Sheet } from '../../src/core/sheet/types.ts';
import { sheetToNetlist } from '../../src/core/sheet/toNetlist.ts';
import { part } from '../sheet/fixtures.ts';

/**
 * A resistor-load inverter drawn by hand in one column: VDD, R1, N1, GND, with A to the left and the
 * Y pin to the right. Wires join pins at the positions the part specs give, read in the test.
 */
function drawnInverter(): Sheet {
  const nmos = part('p3', 'nmos', 'N1', 0, 6, { w: 1, l: 0.25 });
  const res = part('p2', 'resistor', 'R1', 0, 0, { ohms: 40e3 });
  return {
    parts: [
      part('p1', 'vdd', 'VDD', 0, -6),
      res,
      nmos,
      part('p4', 'gnd', 'GND', 0, 12),
      part('p5', 'input', 'A', -6, 6),
      part('p6', 'output', 'Y', 6, 3),
    ],
    wires: [],
  };
}

describe('trace route', () => {
  it('follows wires from the supply through each device to ground', async () => {
    const { pinPositions } = await import('../../src/core/sheet/geometry.ts');
    const base = drawnInverter();
    const pins = Object.fromEntries(
      base.parts.flatMap((p) => pinPositions(p).map((q) => [`${p.id}.${q.pin}`, { x: q.x, y: q.y }])),
    );
    const wire = (id: string, ...points: { x: number; y: number }[]) => ({ id, points });
    const yJoin = { x: pins['p3.drain']!.x, y: 3 };
    const sheet: Sheet = {
      parts: base.parts,
      wires: [
        wire('w1', pins['p1.net']!, pins['p2.a']!),
        wire('w2', pins['p2.b']!, yJoin, pins['p3.drain']!),
        wire('w3', yJoin, pins['p6.net']!),
        wire('w4', pins['p3.source']!, pins['p4.net']!),
        wire('w5', pins['p5.net']!, pins['p3.gate']!),
      ],
    };
    const derived = sheetToNetlist(sheet, 'rload');
    const deviceParts = Object.fromEntries(
      Object.entries(derived.partDevices).map(([id, name]) => [name, id]),
    );
    const route = traceRoute(sheet, { ...derived, deviceParts }, ['VDD', 'R1', 'Y', 'N1', 'GND']);
    expect(route).not.toBeNull();
    const flat = (route ?? []).flat();
    // Starts at the VDD symbol's pin, ends at the GND symbol's pin, passes the Y junction, skips the branch to the Y pin.
    expect(flat[0]).toEqual(pins['p1.net']);
    expect(flat[flat.length - 1]).toEqual(pins['p4.net']);
    expect(flat).toContainEqual(yJoin);
    expect(flat).not.toContainEqual(pins['p6.net']);
    // Every leg is orthogonal: the trace runs on drawn copper, never diagonally.
    for (const line of route ?? [])
      for (let i = 0; i + 1 < line.length; i++)
        expect(line[i]!.x === line[i + 1]!.x || line[i]!.y === line[i + 1]!.y).toBe(true);
  });

  it('gives null when a device of the chain is not drawn', () => {
    expect(
      traceRoute({ parts: [], wires: [] }, { wireNets: {}, pinNets: new Map(), deviceParts: {} }, [
        'VDD',
        'P1',
        'GND',
      ]),
    ).toBeNull();
  });
});
