/**
 * Where a toggle changed the overlay (sheet units): the tiles (paintTiles.ts) met by the segments
 * and level marks of the nets whose paint changed and by the transistor marks whose state changed,
 * with neighbouring tiles of a row joined into one rectangle. The canvas clears and draws only
 * these (editor/canvas/viewCache.ts), so a toggle that moves a few nets redraws a few small areas.
 */
import type { Rect } from '../sheet/geometry.ts';
import type { PaintLayout } from './overlayPaint.ts';
import { addTiles, deviceBox, markBox, segmentBox, tileRun } from './paintTiles.ts';

/** The layout nets and devices whose paint changed (paintSolved.ts `PaintChange`). */
export interface ChangedParts {
  readonly nets: readonly number[];
  readonly devices: readonly number[];
}

/** Each layout net's tiles (those its segments and marks meet), worked out once per layout. */
const netTiles = new WeakMap<PaintLayout, readonly (readonly number[])[]>();

function tilesOfNets(layout: PaintLayout): readonly (readonly number[])[] {
  let tiles = netTiles.get(layout);
  if (tiles !== undefined) return tiles;
  const sets = layout.nets.map(() => new Set<number>());
  for (const s of layout.segments) addTiles(segmentBox(s.points), sets[s.net]!);
  for (const m of layout.marks) addTiles(markBox(m), sets[m.net]!);
  netTiles.set(layout, (tiles = sets.map((set) => [...set])));
  return tiles;
}

/** Sorted tile numbers as rectangles, one per run of neighbours in a row. */
function runsOf(sorted: readonly number[]): Rect[] {
  const areas: Rect[] = [];
  for (let i = 0; i < sorted.length;) {
    let j = i;
    while (j + 1 < sorted.length && sorted[j + 1] === sorted[j]! + 1) j++;
    areas.push(tileRun(sorted[i]!, sorted[j]!));
    i = j + 1;
  }
  return areas;
}

/** The areas to paint again after a change; every changed shape lies inside one of them. */
export function changedAreas(layout: PaintLayout, changed: ChangedParts): Rect[] {
  const tiles = tilesOfNets(layout);
  const keys = new Set<number>();
  for (const i of changed.nets) for (const key of tiles[i] ?? []) keys.add(key);
  for (const j of changed.devices) {
    const d = layout.devices[j];
    if (d !== undefined) addTiles(deviceBox(d), keys);
  }
  return runsOf([...keys].sort((a, b) => a - b));
}
