/**
 * The contacts a moving selection has with what stays put, so that moving, turning and flipping keep
 * every connection (docs/semantics.md §1). Wire ends on a moved pin already follow it; this finds the
 * rest: a staying wire's end lying along a moving wire (it follows too), and a staying pin or the
 * middle of a staying wire touching something that moves (a short wire is drawn from the old spot
 * to the new one, a tether).
 */
import type { Point, Sheet } from './types.ts';
import { pinPositions, type PlacedPin, type Rect } from './geometry.ts';
import { spotIndex } from './pointIndex.ts';

export interface StayingContacts {
  /** Ends of staying wires that must follow the moving wire they lie on. */
  readonly follow: readonly Point[];
  /** Spots where a staying item touches a moving one and cannot follow it: each gets a tether. */
  readonly tether: readonly Point[];
}

const NONE: StayingContacts = { follow: [], tether: [] };

function boxAround(points: readonly Point[]): Rect | null {
  if (points.length === 0) return null;
  let [x0, y0, x1, y1] = [Infinity, Infinity, -Infinity, -Infinity];
  for (const p of points)
    [x0, y0, x1, y1] = [Math.min(x0, p.x), Math.min(y0, p.y), Math.max(x1, p.x), Math.max(y1, p.y)];
  return { x0, y0, x1, y1 };
}

const inside = (r: Rect, p: Point): boolean => p.x >= r.x0 && p.x <= r.x1 && p.y >= r.y0 && p.y <= r.y1;

/** Pins of moving parts, and the rest of the pins near the selection (the only ones that can touch it). */
function splitPins(sheet: Sheet, moving: ReadonlySet<string>): { moved: PlacedPin[]; staying: PlacedPin[] } {
  const moved = sheet.parts.filter((p) => moving.has(p.id)).flatMap(pinPositions);
  return { moved, staying: sheet.parts.filter((p) => !moving.has(p.id)).flatMap(pinPositions) };
}

export function stayingContacts(
  sheet: Sheet,
  movingParts: ReadonlySet<string>,
  movingWires: ReadonlySet<string>,
): StayingContacts {
  const { moved, staying } = splitPins(sheet, movingParts);
  const selectedWires = sheet.wires.filter((w) => movingWires.has(w.id));
  const movingPoints = [...moved, ...selectedWires.flatMap((w) => w.points)];
  const area = boxAround(movingPoints);
  if (area === null || staying.length + sheet.wires.length === selectedWires.length) return NONE;
  const near = staying.filter((p) => inside(area, p));
  const stayingVertices = sheet.wires
    .filter((w) => !movingWires.has(w.id))
    .flatMap((w) => w.points)
    .filter((p) => inside(area, p));
  // Query order: moving pins, moving wire vertices, staying pins, staying wire vertices.
  const index = spotIndex(sheet.wires, [...movingPoints, ...near, ...stayingVertices]);
  const movingPinSpots = new Set(moved.map((_, i) => index.spotOf[i]!));
  const stayingPinSpots = new Set(near.map((_, i) => index.spotOf[movingPoints.length + i]!));
  const follow: Point[] = [];
  const tether: Point[] = [];
  index.spots.forEach((spot, s) => {
    const covers = index.covers[s]!;
    const movingHere = movingPinSpots.has(s) || covers.some((c) => movingWires.has(sheet.wires[c.wire]!.id));
    if (!movingHere) return;
    let tied = stayingPinSpots.has(s);
    for (const c of covers) {
      const wire = sheet.wires[c.wire]!;
      if (movingWires.has(wire.id)) continue;
      const ends = [wire.points[0]!, wire.points[wire.points.length - 1]!];
      if (ends.some((e) => e.x === spot.x && e.y === spot.y)) follow.push(spot);
      else tied = true;
    }
    if (tied) tether.push(spot);
  });
  return { follow, tether };
}
