/**
 * Wires as long as the sheet allows (a million grid units) cost what short ones do: connectivity
 * looks only at ends, bends and pins, and the hit-test index keeps long segments apart. Behaviour
 * of our own sheet model (the joining rules are the usual ones of a schematic; common practice,
 * no source).
 */
import { describe, expect, it } from 'vitest';
import { sheetConnectivity } from '../../src/core/sheet/connectivity.ts';
import { buildIndex, hitTest } from '../../src/core/sheet/hitTest.ts';
import type { Sheet } from '../../src/core/sheet/types.ts';

const FAR = 1_000_000;

/** A long horizontal wire, a vertical one ending on it near its far end (a T), and one crossing it. */
const sheet: Sheet = {
  parts: [],
  wires: [
    {
      id: 'long',
      points: [
        { x: -FAR, y: 0 },
        { x: FAR, y: 0 },
      ],
    },
    {
      id: 'tee',
      points: [
        { x: FAR - 1, y: 0 },
        { x: FAR - 1, y: -5 },
      ],
    },
    {
      id: 'cross',
      points: [
        { x: 7, y: -FAR },
        { x: 7, y: FAR },
      ],
    },
    {
      id: 'slant',
      points: [
        { x: -FAR, y: -FAR },
        { x: FAR, y: FAR },
      ],
    },
  ],
};

describe('wires a million grid units long', () => {
  it('join where an end lies on them, and stay apart where they only cross', () => {
    const { groups, junctions, wireBase } = sheetConnectivity(sheet);
    const group = (id: string) => groups.find(wireBase + sheet.wires.findIndex((w) => w.id === id));
    expect(group('tee')).toBe(group('long'));
    expect(group('cross')).not.toBe(group('long'));
    // The T has three arms (two of the long wire, one of the tee): a junction dot.
    expect(junctions).toEqual([{ x: FAR - 1, y: 0 }]);
  });

  it('keep the hit-test index small and are still found anywhere along their length', () => {
    const index = buildIndex(sheet);
    expect(index.buckets.size).toBeLessThan(20);
    expect(hitTest(index, { x: 123_456, y: 0.1 })).toMatchObject({ type: 'wire', wireId: 'long' });
    expect(hitTest(index, { x: 7, y: -654_321 })).toMatchObject({ type: 'wire', wireId: 'cross' });
    expect(hitTest(index, { x: 500, y: 500 })).toMatchObject({ type: 'wire', wireId: 'slant' });
    expect(hitTest(index, { x: 123_456, y: 3 })).toBeNull();
  });
});
