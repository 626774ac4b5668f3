import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { followEnds, mirrorItems, moveItems, rotateItems } from '../../src/core/sheet/transform.ts';
import { isOrthogonalPath } from '../../src/core/sheet/routing.ts';
import { sheetToNetlist } from '../../src/core/sheet/toNetlist.ts';
import { pinPositions } from '../../src/core/sheet/geometry.ts';
import type { Point } from '../../src/core/sheet/types.ts';
import type { Sheet } from '../../src/core/sheet/types.ts';
import { drawnInverter, part } from './fixtures.ts';

describe('moving, turning and flipping with wires that follow', () => {
  it('moves a part and drags the ends of its wires along, orthogonally', () => {
    const sheet = drawnInverter();
    const moved = moveItems(sheet, { parts: ['p6'], wires: [] }, 0, 2);
    const w2 = moved.wires.find((w) => w.id === 'w2')!;
    expect(w2.points[w2.points.length - 1]).toEqual({ x: 4, y: 2 });
    expect(isOrthogonalPath(w2.points)).toBe(true);
    expect(sheetToNetlist(moved).netlist).toEqual(sheetToNetlist(sheet).netlist);
  });

  it('moving everything moves wires whole and keeps the netlist', () => {
    const sheet = drawnInverter();
    const all = { parts: sheet.parts.map((p) => p.id), wires: sheet.wires.map((w) => w.id) };
    const moved = moveItems(sheet, all, 7, -3);
    expect(moved.wires[0]!.points).toEqual([
      { x: 7, y: -4 },
      { x: 7, y: -2 },
    ]);
    expect(sheetToNetlist(moved).netlist).toEqual(sheetToNetlist(sheet).netlist);
  });

  it('four quarter turns bring a selection back where it was', () => {
    const sheet = drawnInverter();
    const ids = { parts: sheet.parts.map((p) => p.id), wires: sheet.wires.map((w) => w.id) };
    let s = sheet;
    for (let i = 0; i < 4; i++) s = rotateItems(s, ids);
    expect(s).toEqual(sheet);
  });

  it('a turned or flipped whole cell is the same circuit', () => {
    const sheet = drawnInverter();
    const ids = { parts: sheet.parts.map((p) => p.id), wires: sheet.wires.map((w) => w.id) };
    const expected = sheetToNetlist(sheet).netlist;
    expect(sheetToNetlist(rotateItems(sheet, ids)).netlist).toEqual(expected);
    expect(sheetToNetlist(mirrorItems(sheet, ids)).netlist).toEqual(expected);
  });

  it('flipping a part puts its pins where a mirror image would', () => {
    const sheet = drawnInverter();
    const flipped = mirrorItems(sheet, { parts: ['p1'], wires: [] });
    const before = pinPositions(sheet.parts[0]!);
    const after = pinPositions(flipped.parts[0]!);
    // About the part's own origin x = 0: gate from x = -2 to x = +2; channel pins stay.
    expect(after.map((p) => [p.x, p.y])).toEqual(before.map((p) => [-p.x + 0, p.y]));
  });

  it('never mutates its input', () => {
    const sheet = drawnInverter();
    const copy = structuredClone(sheet);
    moveItems(sheet, { parts: ['p1'], wires: ['w1'] }, 3, 3);
    rotateItems(sheet, { parts: ['p1'], wires: [] });
    expect(sheet).toEqual(copy);
  });

  it('property: a wire whose ends follow any moves stays orthogonal with the moved ends', () => {
    const pt = fc.record({ x: fc.integer({ min: -20, max: 20 }), y: fc.integer({ min: -20, max: 20 }) });
    // Random orthogonal paths: alternate horizontal and vertical steps from a start point.
    const path = fc
      .tuple(
        pt,
        fc.array(
          fc.integer({ min: -6, max: 6 }).filter((n) => n !== 0),
          { minLength: 1, maxLength: 6 },
        ),
      )
      .map(([start, steps]) => {
        const pts: Point[] = [start];
        steps.forEach((s, i) => {
          const last = pts[pts.length - 1]!;
          pts.push(i % 2 === 0 ? { x: last.x + s, y: last.y } : { x: last.x, y: last.y + s });
        });
        return pts;
      });
    fc.assert(
      fc.property(path, pt, pt, fc.boolean(), (points, d1, d2, both) => {
        const first = points[0]!;
        const last = points[points.length - 1]!;
        const moves = new Map<string, Point>([
          [`${first.x},${first.y}`, { x: first.x + d1.x, y: first.y + d1.y }],
        ]);
        if (both) moves.set(`${last.x},${last.y}`, { x: last.x + d2.x, y: last.y + d2.y });
        const out = followEnds({ id: 'w', points }, moves).points;
        const newFirst = moves.get(`${first.x},${first.y}`)!;
        expect(out.length < 2 || isOrthogonalPath(out)).toBe(true);
        expect(out.some((p) => p.x === newFirst.x && p.y === newFirst.y)).toBe(true);
      }),
    );
  });
});

describe('parts attached by touching pins', () => {
  it('a rail and a label sitting on a moved device pin travel with it, and the netlist holds', () => {
    const sheet: Sheet = {
      parts: [
        part('n', 'nmos', 'N1', 0, 0),
        part('g', 'gnd', 'GND', 0, 2),
        part('l', 'label', 'IN', -2, 0, { rotation: 2 }),
      ],
      wires: [],
    };
    const moved = moveItems(sheet, { parts: ['n'], wires: [] }, 5, 3);
    expect(moved.parts.map((p) => [p.id, p.x, p.y])).toEqual([
      ['n', 5, 3],
      ['g', 5, 5],
      ['l', 3, 3],
    ]);
    expect(sheetToNetlist(moved).netlist).toEqual(sheetToNetlist(sheet).netlist);
    const turned = rotateItems(sheet, { parts: ['n'], wires: [] });
    expect(sheetToNetlist(turned).netlist).toEqual(sheetToNetlist(sheet).netlist);
  });

  it('moving a label alone leaves the device where it is', () => {
    const sheet: Sheet = {
      parts: [part('n', 'nmos', 'N1', 0, 0), part('l', 'label', 'IN', -2, 0)],
      wires: [],
    };
    const moved = moveItems(sheet, { parts: ['l'], wires: [] }, 0, 4);
    expect(moved.parts[0]).toEqual(sheet.parts[0]);
  });
});
