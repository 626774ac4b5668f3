/**
 * Placement maths for sheet parts. Coordinates are grid units with y pointing down (screen
 * convention); a part's symbol is defined at rotation 0, unmirrored, around its origin.
 */
import type { Point, Rotation, SheetPart } from './types.ts';
import { partShape } from './parts/index.ts';
import { toWorld } from './placement.ts';

export { toWorld, turnDirection, type Placement } from './placement.ts';

export interface Rect {
  readonly x0: number;
  readonly y0: number;
  readonly x1: number;
  readonly y1: number;
}

export interface PlacedPin {
  readonly partId: string;
  readonly pin: string;
  readonly x: number;
  readonly y: number;
}

export function pinPositions(part: SheetPart): PlacedPin[] {
  return partShape(part).pins.map((pin) => {
    const w = toWorld(part, pin);
    return { partId: part.id, pin: pin.name, x: w.x, y: w.y };
  });
}

export function pinPosition(part: SheetPart, pinName: string): Point | null {
  const pin = partShape(part).pins.find((p) => p.name === pinName);
  return pin ? toWorld(part, pin) : null;
}

/** The world box of a part's body (its local box transformed). */
export function partBounds(part: SheetPart): Rect {
  const b = partShape(part).box;
  const a = toWorld(part, { x: b.x0, y: b.y0 });
  const c = toWorld(part, { x: b.x1, y: b.y1 });
  return normalizeRect(a, c);
}

export function normalizeRect(a: Point, b: Point): Rect {
  return { x0: Math.min(a.x, b.x), y0: Math.min(a.y, b.y), x1: Math.max(a.x, b.x), y1: Math.max(a.y, b.y) };
}

export function rectContainsPoint(r: Rect, p: Point, margin = 0): boolean {
  return p.x >= r.x0 - margin && p.x <= r.x1 + margin && p.y >= r.y0 - margin && p.y <= r.y1 + margin;
}

export function rectContainsRect(outer: Rect, inner: Rect): boolean {
  return inner.x0 >= outer.x0 && inner.x1 <= outer.x1 && inner.y0 >= outer.y0 && inner.y1 <= outer.y1;
}

export function unionRects(rects: readonly Rect[]): Rect | null {
  if (rects.length === 0) return null;
  return rects.reduce((u, r) => ({
    x0: Math.min(u.x0, r.x0),
    y0: Math.min(u.y0, r.y0),
    x1: Math.max(u.x1, r.x1),
    y1: Math.max(u.y1, r.y1),
  }));
}

export function pointsBounds(points: readonly Point[]): Rect | null {
  return unionRects(points.map((p) => ({ x0: p.x, y0: p.y, x1: p.x, y1: p.y })));
}

export function pointKey(p: Point): string {
  return `${p.x},${p.y}`;
}

export function samePoint(a: Point, b: Point): boolean {
  return a.x === b.x && a.y === b.y;
}

export function nextRotation(r: Rotation, quarterTurns = 1): Rotation {
  return ((((r + quarterTurns) % 4) + 4) % 4) as Rotation;
}

/** Distance from p to the segment a–b (any orientation). */
export function distanceToSegment(p: Point, a: Point, b: Point): number {
  const dx = b.x - a.x;
  const dy = b.y - a.y;
  const len2 = dx * dx + dy * dy;
  const t = len2 === 0 ? 0 : Math.max(0, Math.min(1, ((p.x - a.x) * dx + (p.y - a.y) * dy) / len2));
  return Math.hypot(p.x - (a.x + t * dx), p.y - (a.y + t * dy));
}

export function snapPoint(p: Point): Point {
  return { x: Math.round(p.x) + 0, y: Math.round(p.y) + 0 };
}
