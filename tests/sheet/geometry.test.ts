import { describe, expect, it } from 'vitest';
import { partBounds, pinPositions, toWorld } from '../../src/core/sheet/geometry.ts';
import { part } from './fixtures.ts';

describe('placement maths (y points down, quarter turns clockwise)', () => {
  const at = (rotation: 0 | 1 | 2 | 3, mirror = false) => ({ x: 10, y: 20, rotation, mirror });

  it('turns a point a quarter clockwise per step: right → down → left → up', () => {
    expect(toWorld(at(0), { x: 1, y: 0 })).toEqual({ x: 11, y: 20 });
    expect(toWorld(at(1), { x: 1, y: 0 })).toEqual({ x: 10, y: 21 });
    expect(toWorld(at(2), { x: 1, y: 0 })).toEqual({ x: 9, y: 20 });
    expect(toWorld(at(3), { x: 1, y: 0 })).toEqual({ x: 10, y: 19 });
  });

  it('mirrors before turning', () => {
    expect(toWorld(at(0, true), { x: 1, y: 0 })).toEqual({ x: 9, y: 20 });
    expect(toWorld(at(1, true), { x: 1, y: 0 })).toEqual({ x: 10, y: 19 });
  });

  it('places MOS pins: gate left, channel pins above and below', () => {
    const pins = pinPositions(part('a', 'nmos', 'N1', 5, 5));
    expect(pins.map((p) => [p.pin, p.x, p.y])).toEqual([
      ['gate', 3, 5],
      ['drain', 5, 3],
      ['source', 5, 7],
    ]);
  });

  it('turned bounds stay a proper box', () => {
    const b = partBounds(part('a', 'nmos', 'N1', 0, 0, { rotation: 1 }));
    expect(b.x0).toBeLessThan(b.x1);
    expect(b.y0).toBeLessThan(b.y1);
    // The gate side (-2..0.4 across x) now spans y after a quarter turn.
    expect([b.y0, b.y1]).toEqual([-2, 0.4]);
  });
});
