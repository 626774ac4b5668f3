import { describe, expect, it } from 'vitest';
import { buildIndex, hitTest, itemsInRect } from '../../src/core/sheet/hitTest.ts';
import { drawnInverter, part } from './fixtures.ts';

describe('hit testing without a canvas', () => {
  const sheet = drawnInverter();
  const index = buildIndex(sheet);

  it('finds a pin first, within its radius', () => {
    expect(hitTest(index, { x: -2.2, y: -3.1 })).toEqual({
      type: 'pin',
      partId: 'p1',
      pin: 'gate',
      at: { x: -2, y: -3 },
    });
  });

  it('finds a wire segment near the pointer', () => {
    expect(hitTest(index, { x: 2, y: 0.2 })).toEqual({ type: 'wire', wireId: 'w2', segment: 0 });
    expect(hitTest(index, { x: -4.1, y: 1.5 })).toEqual({ type: 'wire', wireId: 'w3', segment: 1 });
  });

  it('finds a part body, and nothing on empty sheet', () => {
    expect(hitTest(index, { x: -0.5, y: 3.4 })).toEqual({ type: 'part', partId: 'p2' });
    expect(hitTest(index, { x: 30, y: 30 })).toBeNull();
  });

  it('works far from the origin (negative buckets)', () => {
    const far = buildIndex({
      parts: [part('q', 'nmos', 'N9', -100, -57)],
      wires: [],
    });
    expect(hitTest(far, { x: -100.2, y: -57 })).toEqual({ type: 'part', partId: 'q' });
  });

  it('box-selects parts and wires lying wholly inside', () => {
    expect(itemsInRect(sheet, { x0: -3, y0: -7, x1: 5, y1: 1 })).toEqual({
      parts: ['p1', 'p3'],
      wires: ['w1', 'w2'],
    });
  });
});
