/**
 * The points of a sheet where something can join (pins, wire ends and bends), numbered as spots:
 * equal points share a spot. Which wire segments pass through each spot is found without walking
 * the wires grid point by grid point: the points are sorted by row and by column once, and each
 * segment looks up the points between its ends by binary search. Cost: O((segments + points) ·
 * log points + hits), whatever the drawn length of the wires; no map is keyed by a point.
 */
import type { Point, SheetWire } from './types.ts';

/** One segment through a spot: which wire, and whether the spot is an end of that segment. */
export interface Cover {
  readonly wire: number;
  readonly end: boolean;
}

export interface SpotIndex {
  /** Spot of each query point, by its position in the list given. */
  readonly spotOf: Int32Array;
  /** One point per spot. */
  readonly spots: readonly Point[];
  /** Segments through each spot (empty where none). */
  readonly covers: readonly (readonly Cover[])[];
}

const byXY = (pts: readonly Point[]) => (a: number, b: number) =>
  pts[a]!.x - pts[b]!.x || pts[a]!.y - pts[b]!.y;
const byYX = (pts: readonly Point[]) => (a: number, b: number) =>
  pts[a]!.y - pts[b]!.y || pts[a]!.x - pts[b]!.x;

function sortedOrder(points: readonly Point[], compare: (a: number, b: number) => number): Int32Array {
  return Int32Array.from(points.keys()).sort(compare);
}

/** Ranges of a sorted order that share one coordinate (`across`): a row or a column of points. */
function linesOf(
  points: readonly Point[],
  order: Int32Array,
  across: 'x' | 'y',
): Map<number, [number, number]> {
  const lines = new Map<number, [number, number]>();
  for (let i = 0; i < order.length;) {
    const v = points[order[i]!]![across];
    let j = i + 1;
    while (j < order.length && points[order[j]!]![across] === v) j++;
    lines.set(v, [i, j]);
    i = j;
  }
  return lines;
}

/** First position in order[from, to) whose coordinate `along` is ≥ v. */
function lowerBound(
  points: readonly Point[],
  order: Int32Array,
  along: 'x' | 'y',
  [from, to]: [number, number],
  v: number,
): number {
  let lo = from;
  let hi = to;
  while (lo < hi) {
    const mid = (lo + hi) >> 1;
    if (points[order[mid]!]![along] < v) lo = mid + 1;
    else hi = mid;
  }
  return lo;
}

function numberSpots(points: readonly Point[], order: Int32Array): { spotOf: Int32Array; spots: Point[] } {
  const spotOf = new Int32Array(points.length);
  const spots: Point[] = [];
  let last: Point | null = null;
  for (const q of order) {
    const p = points[q]!;
    if (last === null || last.x !== p.x || last.y !== p.y) spots.push((last = { x: p.x, y: p.y }));
    spotOf[q] = spots.length - 1;
  }
  return { spotOf, spots };
}

export function spotIndex(wires: readonly SheetWire[], points: readonly Point[]): SpotIndex {
  const xy = sortedOrder(points, byXY(points));
  const yx = sortedOrder(points, byYX(points));
  const { spotOf, spots } = numberSpots(points, xy);
  const rows = linesOf(points, yx, 'y');
  const columns = linesOf(points, xy, 'x');
  const covers: Cover[][] = spots.map(() => []);
  wires.forEach((wire, w) => {
    for (let i = 1; i < wire.points.length; i++) {
      const a = wire.points[i - 1]!;
      const b = wire.points[i]!;
      const horizontal = a.y === b.y;
      if (!horizontal && a.x !== b.x) continue; // not orthogonal: covers nothing
      const [order, along, range] = horizontal
        ? [yx, 'x' as const, rows.get(a.y)]
        : [xy, 'y' as const, columns.get(a.x)];
      if (range === undefined) continue;
      const lo = Math.min(a[along], b[along]);
      const hi = Math.max(a[along], b[along]);
      let previous = -1;
      for (let j = lowerBound(points, order, along, range, lo); j < range[1]; j++) {
        const q = order[j]!;
        const v = points[q]![along];
        if (v > hi) break;
        const spot = spotOf[q]!;
        if (spot === previous) continue; // equal points are one spot
        previous = spot;
        covers[spot]!.push({ wire: w, end: v === a[along] || v === b[along] });
        if (lo === hi) break; // a segment of no length is one point, found once
      }
    }
  });
  return { spotOf, spots, covers };
}
