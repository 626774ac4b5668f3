/**
 * The points of a sheet where something can join (pins, wire ends and bends), numbered as spots:
 * equal points share a spot. Which wire segments pass through each spot is found without walking
 * the wires grid point by grid point: the points are sorted by row and by column once, and each
 * segment looks up the points between its ends by binary search. Cost: O((segments + points) ·
 * log points + hits), whatever the drawn length of the wires (a wire a million grid units long costs
 * what a short one does); no map is keyed by a point.
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

/** Coordinates as two typed arrays: sorting and grouping read numbers, not objects. */
interface Coords {
  readonly x: Float64Array;
  readonly y: Float64Array;
}

function coordsOf(points: readonly Point[]): Coords {
  const x = new Float64Array(points.length);
  const y = new Float64Array(points.length);
  points.forEach((p, i) => {
    x[i] = p.x;
    y[i] = p.y;
  });
  return { x, y };
}

/** Point indices sorted by `first`, then `second`. */
function sortedOrder(first: Float64Array, second: Float64Array): Int32Array {
  const order = new Int32Array(first.length);
  for (let i = 0; i < order.length; i++) order[i] = i;
  return order.sort((a, b) => first[a]! - first[b]! || second[a]! - second[b]!);
}

/** Ranges of a sorted order that share one coordinate: a row or a column of points. */
function linesOf(across: Float64Array, order: Int32Array): Map<number, [number, number]> {
  const lines = new Map<number, [number, number]>();
  for (let i = 0; i < order.length;) {
    const v = across[order[i]!]!;
    let j = i + 1;
    while (j < order.length && across[order[j]!] === v) j++;
    lines.set(v, [i, j]);
    i = j;
  }
  return lines;
}

/** First position in order[from, to) whose coordinate `along` is ≥ v. */
function lowerBound(along: Float64Array, order: Int32Array, [from, to]: [number, number], v: number): number {
  let lo = from;
  let hi = to;
  while (lo < hi) {
    const mid = (lo + hi) >> 1;
    if (along[order[mid]!]! < v) lo = mid + 1;
    else hi = mid;
  }
  return lo;
}

/** The spot at (x, y), found in x's column of the (x, y) order; null when no query point is there. */
function spotAt(
  c: Coords,
  xy: Int32Array,
  spotOf: Int32Array,
  column: [number, number] | undefined,
  y: number,
): number | null {
  if (column === undefined) return null;
  const j = lowerBound(c.y, xy, column, y);
  return j < column[1] && c.y[xy[j]!] === y ? spotOf[xy[j]!]! : null;
}

function numberSpots(c: Coords, order: Int32Array): { spotOf: Int32Array; spots: Point[] } {
  const spotOf = new Int32Array(order.length);
  const spots: Point[] = [];
  let lx = Number.NaN;
  let ly = Number.NaN;
  for (const q of order) {
    const x = c.x[q]!;
    const y = c.y[q]!;
    if (x !== lx || y !== ly) {
      spots.push({ x, y });
      lx = x;
      ly = y;
    }
    spotOf[q] = spots.length - 1;
  }
  return { spotOf, spots };
}

export function spotIndex(wires: readonly SheetWire[], points: readonly Point[]): SpotIndex {
  const c = coordsOf(points);
  const xy = sortedOrder(c.x, c.y);
  const yx = sortedOrder(c.y, c.x);
  const { spotOf, spots } = numberSpots(c, xy);
  const rows = linesOf(c.y, yx);
  const columns = linesOf(c.x, xy);
  const covers: Cover[][] = spots.map(() => []);
  wires.forEach((wire, w) => {
    for (let i = 1; i < wire.points.length; i++) {
      const a = wire.points[i - 1]!;
      const b = wire.points[i]!;
      const horizontal = a.y === b.y;
      if (!horizontal && a.x !== b.x) {
        // A slanted segment (the editor never draws one) covers only its two ends.
        for (const end of [a, b]) {
          const spot = spotAt(c, xy, spotOf, columns.get(end.x), end.y);
          if (spot !== null) covers[spot]!.push({ wire: w, end: true });
        }
        continue;
      }
      const range = horizontal ? rows.get(a.y) : columns.get(a.x);
      if (range === undefined) continue;
      const [order, along, from, to] = horizontal ? [yx, c.x, a.x, b.x] : [xy, c.y, a.y, b.y];
      const [lo, hi] = from < to ? [from, to] : [to, from];
      let previous = -1;
      for (let j = lowerBound(along, order, range, lo); j < range[1]; j++) {
        const q = order[j]!;
        const v = along[q]!;
        if (v > hi) break;
        const spot = spotOf[q]!;
        if (spot === previous) continue; // equal points are one spot
        previous = spot;
        covers[spot]!.push({ wire: w, end: v === from || v === to });
        if (lo === hi) break; // a segment of no length is one point, found once
      }
    }
  });
  return { spotOf, spots, covers };
}
