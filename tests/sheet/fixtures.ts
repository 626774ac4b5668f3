/**
 * Hand-drawn sheets for the tests, placed as a designer would draw them on the grid.
 * Coordinates follow the part specs: MOS gate at (-2,0), upper channel pin (0,-2), lower (0,2).
 */
import type { PartPlacement, Sheet, SheetPart } from '../../src/core/sheet/types.ts';
import { makeSheetPart, type PartProps } from '../../src/core/sheet/parts/index.ts';

/** A part at (x, y), unturned unless `extra` says otherwise; missing sizes take the kind's defaults. */
export function part(
  id: string,
  kind: SheetPart['kind'],
  name: string,
  x: number,
  y: number,
  extra: Partial<Pick<PartPlacement, 'rotation' | 'mirror'>> & PartProps = {},
): SheetPart {
  const { rotation = 0, mirror = false, ...props } = extra;
  return makeSheetPart(kind, { id, name, x, y, rotation, mirror }, props);
}

/**
 * The static CMOS inverter: PMOS P1 at (0,-3) with source to VDD, NMOS N1 at (0,3) with source to
 * GND, drains joined by a wire through (0,0) to output Y, gates joined to input A.
 */
export function drawnInverter(): Sheet {
  return {
    parts: [
      part('p1', 'pmos', 'P1', 0, -3, { w: 2, l: 0.25 }),
      part('p2', 'nmos', 'N1', 0, 3, { w: 1, l: 0.25 }),
      part('p3', 'vdd', 'VDD', 0, -5),
      part('p4', 'gnd', 'GND', 0, 5),
      part('p5', 'input', 'A', -6, 0),
      part('p6', 'output', 'Y', 4, 0),
    ],
    wires: [
      // drain to drain
      {
        id: 'w1',
        points: [
          { x: 0, y: -1 },
          { x: 0, y: 1 },
        ],
      },
      // output pin to the drain wire (a T at (0,0))
      {
        id: 'w2',
        points: [
          { x: 0, y: 0 },
          { x: 4, y: 0 },
        ],
      },
      // gate to gate with bends, and the input pin on to it
      {
        id: 'w3',
        points: [
          { x: -2, y: -3 },
          { x: -4, y: -3 },
          { x: -4, y: 3 },
          { x: -2, y: 3 },
        ],
      },
      {
        id: 'w4',
        points: [
          { x: -6, y: 0 },
          { x: -4, y: 0 },
        ],
      },
    ],
  };
}
