/**
 * Where a copy can land without touching anything: duplicate and paste never make a contact
 * (docs/semantics.md §1). The copy's box (parts, their pins and wires, plus a clear grid unit all
 * round) is tried at offsets in rings around the original, nearest first; the first spot whose box
 * meets no part, pin or wire of the sheet wins. Right of the whole drawing is always free.
 */
import type { Point, Sheet, SheetPart, SheetWire } from './types.ts';
import { partBounds, pinPositions, pointsBounds, unionRects, type Rect } from './geometry.ts';

/** Clear grid units kept between the copy and anything else. */
const CLEARANCE = 1;
/** Rings of candidate spots tried before falling back to the right of the drawing. */
const RINGS = 6;

function itemBoxes(parts: readonly SheetPart[], wires: readonly SheetWire[]): Rect[] {
  return [
    ...parts.map((p) =>
      unionRects([partBounds(p), ...pinPositions(p).map((q) => ({ x0: q.x, y0: q.y, x1: q.x, y1: q.y }))])!,
    ),
    ...wires.flatMap((w) => pointsBounds(w.points) ?? []),
  ];
}

const overlaps = (a: Rect, b: Rect): boolean => a.x0 <= b.x1 && b.x0 <= a.x1 && a.y0 <= b.y1 && b.y0 <= a.y1;

const shifted = (r: Rect, d: Point): Rect => ({
  x0: r.x0 + d.x,
  y0: r.y0 + d.y,
  x1: r.x1 + d.x,
  y1: r.y1 + d.y,
});

/** Candidate offsets in rings of cells the size of the copy, nearest (then right, then down) first. */
function candidates(width: number, height: number): Point[] {
  const out: Point[] = [];
  for (let ring = 1; ring <= RINGS; ring++) {
    const cells: Point[] = [];
    for (let i = -ring; i <= ring; i++)
      for (let j = -ring; j <= ring; j++)
        if (Math.max(Math.abs(i), Math.abs(j)) === ring) cells.push({ x: i, y: j });
    cells.sort((a, b) => Math.hypot(a.x, a.y) - Math.hypot(b.x, b.y) || b.x - a.x || b.y - a.y);
    out.push(...cells.map((c) => ({ x: c.x * width, y: c.y * height })));
  }
  return out;
}

/**
 * The offset at which items (as they lie on `sheet`, or a clip of them) can be added again without
 * touching anything on `sheet`. Null when there is nothing to place.
 */
export function freeOffset(
  sheet: Sheet,
  parts: readonly SheetPart[],
  wires: readonly SheetWire[],
): Point | null {
  const own = unionRects(itemBoxes(parts, wires));
  if (own === null) return null;
  const box = {
    x0: own.x0 - CLEARANCE,
    y0: own.y0 - CLEARANCE,
    x1: own.x1 + CLEARANCE,
    y1: own.y1 + CLEARANCE,
  };
  const taken = itemBoxes(sheet.parts, sheet.wires);
  const width = Math.ceil(box.x1 - box.x0) + 1;
  const height = Math.ceil(box.y1 - box.y0) + 1;
  for (const d of candidates(width, height)) {
    const at = shifted(box, d);
    if (!taken.some((r) => overlaps(r, at))) return d;
  }
  const all = unionRects(taken) ?? box;
  return { x: Math.ceil(all.x1 - box.x0) + 1, y: 0 };
}
