/** Orthogonal wire paths on the grid. */
import type { Point } from './types.ts';
import { samePoint } from './geometry.ts';

/**
 * An orthogonal path from a to b with at most one bend. `horizontalFirst` picks the elbow:
 * along x then y, or along y then x.
 */
export function elbowRoute(a: Point, b: Point, horizontalFirst: boolean): Point[] {
  if (a.x === b.x || a.y === b.y) return normalizePath([a, b]);
  const bend = horizontalFirst ? { x: b.x, y: a.y } : { x: a.x, y: b.y };
  return [a, bend, b];
}

function collinear(a: Point, b: Point, c: Point): boolean {
  return (a.x === b.x && b.x === c.x) || (a.y === b.y && b.y === c.y);
}

/**
 * Drops repeated points and interior points on a straight run (including a run that doubles back,
 * which the covering segment already draws), so a path is the fewest orthogonal segments.
 */
export function normalizePath(points: readonly Point[]): Point[] {
  const out: Point[] = [];
  for (const p of points) {
    const last = out[out.length - 1];
    if (last && samePoint(last, p)) continue;
    out.push(p);
    while (out.length >= 3 && collinear(out[out.length - 3]!, out[out.length - 2]!, out[out.length - 1]!)) {
      out.splice(out.length - 2, 1);
    }
  }
  return out;
}

/** True when every segment is horizontal or vertical and the path has at least two points. */
export function isOrthogonalPath(points: readonly Point[]): boolean {
  if (points.length < 2) return false;
  for (let i = 1; i < points.length; i++) {
    const a = points[i - 1]!;
    const b = points[i]!;
    if (a.x !== b.x && a.y !== b.y) return false;
  }
  return true;
}

/** Every grid point a segment passes through, ends included (segments are axis-aligned). */
export function segmentGridPoints(a: Point, b: Point): Point[] {
  const out: Point[] = [];
  const steps = Math.max(Math.abs(b.x - a.x), Math.abs(b.y - a.y));
  const sx = Math.sign(b.x - a.x);
  const sy = Math.sign(b.y - a.y);
  for (let i = 0; i <= steps; i++) out.push({ x: a.x + sx * i, y: a.y + sy * i });
  return out;
}
