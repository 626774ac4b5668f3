import { describe, expect, it } from 'vitest';
import { freeOffset } from '../../src/core/sheet/freeSpace.ts';
import { partBounds } from '../../src/core/sheet/geometry.ts';
import type { Sheet } from '../../src/core/sheet/types.ts';
import { drawnInverter, part } from './fixtures.ts';

/** Where duplicate and paste put a copy (docs/semantics.md §1): clear of every part and wire. */
describe('free space for a copy', () => {
  it('puts a copy of the whole inverter beside it, touching nothing', () => {
    const sheet = drawnInverter();
    const d = freeOffset(sheet, sheet.parts, sheet.wires)!;
    const shifted = sheet.parts.map((p) => partBounds({ ...p, x: p.x + d.x, y: p.y + d.y }));
    for (const b of shifted)
      for (const a of sheet.parts.map(partBounds))
        expect(a.x1 < b.x0 || b.x1 < a.x0 || a.y1 < b.y0 || b.y1 < a.y0).toBe(true);
    expect(d.y).toBe(0); // the nearest free spot is to the right
    expect(d.x).toBeGreaterThan(0);
  });

  it('goes past a crowded neighbourhood, right of everything drawn', () => {
    const crowd: Sheet = {
      parts: Array.from({ length: 15 * 15 }, (_, i) =>
        part(`p${i}`, 'nmos', `N${i}`, (i % 15) * 5, Math.floor(i / 15) * 5),
      ),
      wires: [],
    };
    const one = [crowd.parts[112]!]; // the middle of the crowd
    const d = freeOffset(crowd, one, [])!;
    const b = partBounds({ ...one[0]!, x: one[0]!.x + d.x, y: one[0]!.y + d.y });
    for (const a of crowd.parts.map(partBounds))
      expect(a.x1 < b.x0 || b.x1 < a.x0 || a.y1 < b.y0 || b.y1 < a.y0).toBe(true);
  });

  it('has nothing to place for an empty clip', () => {
    expect(freeOffset(drawnInverter(), [], [])).toBeNull();
  });
});
