/**
 * Where a toggle changed the overlay (sheet units): the tiles (paintTiles.ts) met by the segments
 * and level marks of the nets whose paint changed and by the transistor marks whose state changed,
 * with neighbouring tiles of a row joined into one rectangle. The canvas clears and draws only
 * these (editor/canvas/viewCache.ts), so a toggle that moves a few nets redraws a few small areas.
 */
import type { Rect } from '../sheet/geometry.ts';
import type { PaintLayout } from './overlayPaint.ts';
import { deviceBox, markBox, PAINT_TILE, segmentBox, tileSpan } from './paintTiles.ts';

/** The layout nets and devices whose paint changed (paintSolved.ts `PaintChange`). */
export interface ChangedParts {
  readonly nets: readonly number[];
  readonly devices: readonly number[];
}

/** Each layout net's boxes: its segments' and its marks', worked out once per layout. */
const netBoxes = new WeakMap<PaintLayout, readonly Rect[][]>();

function boxesOfNets(layout: PaintLayout): readonly Rect[][] {
  let boxes = netBoxes.get(layout);
  if (boxes !== undefined) return boxes;
  const made = layout.nets.map((): Rect[] => []);
  for (const s of layout.segments) made[s.net]!.push(segmentBox(s.points));
  for (const m of layout.marks) made[m.net]!.push(markBox(m));
  netBoxes.set(layout, (boxes = made));
  return boxes;
}

/** The tiles the boxes meet, by row, each column once. */
function tilesOf(boxes: Iterable<Rect>): Map<number, Set<number>> {
  const rows = new Map<number, Set<number>>();
  for (const box of boxes) {
    const { tx0, ty0, tx1, ty1 } = tileSpan(box);
    for (let ty = ty0; ty <= ty1; ty++) {
      let row = rows.get(ty);
      if (row === undefined) rows.set(ty, (row = new Set()));
      for (let tx = tx0; tx <= tx1; tx++) row.add(tx);
    }
  }
  return rows;
}

/** Each row's runs of neighbouring tiles as one rectangle. */
function runsOf(rows: Map<number, Set<number>>): Rect[] {
  const areas: Rect[] = [];
  for (const [ty, columns] of rows) {
    const sorted = [...columns].sort((a, b) => a - b);
    for (let i = 0; i < sorted.length;) {
      let j = i;
      while (j + 1 < sorted.length && sorted[j + 1] === sorted[j]! + 1) j++;
      areas.push({
        x0: sorted[i]! * PAINT_TILE,
        y0: ty * PAINT_TILE,
        x1: (sorted[j]! + 1) * PAINT_TILE,
        y1: (ty + 1) * PAINT_TILE,
      });
      i = j + 1;
    }
  }
  return areas;
}

/** The areas to paint again after a change; every changed shape lies inside one of them. */
export function changedAreas(layout: PaintLayout, changed: ChangedParts): Rect[] {
  const boxes = boxesOfNets(layout);
  const all: Rect[] = changed.nets.flatMap((i) => boxes[i] ?? []);
  for (const j of changed.devices) {
    const d = layout.devices[j];
    if (d !== undefined) all.push(deviceBox(d));
  }
  return runsOf(tilesOf(all));
}
