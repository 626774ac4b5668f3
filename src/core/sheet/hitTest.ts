/**
 * What is under a point, and what lies inside a box: pure geometry over the document, so the
 * canvas is never asked. An index buckets parts and wire segments by grid cell; it is rebuilt
 * from the sheet whenever the sheet changes (cheap: linear in parts and segments). A segment that
 * would fill more than MAX_CELLS_PER_SEGMENT buckets is kept in a short list tested on every query
 * instead, so the index never grows with how long (or how slanted) a wire is.
 */
import type { Point, Sheet, SheetPart, SheetWire } from './types.ts';
import {
  distanceToSegment,
  partBounds,
  pinPositions,
  pointsBounds,
  rectContainsPoint,
  rectContainsRect,
  type PlacedPin,
  type Rect,
} from './geometry.ts';

export type Hit =
  | { readonly type: 'pin'; readonly partId: string; readonly pin: string; readonly at: Point }
  | { readonly type: 'wire'; readonly wireId: string; readonly segment: number }
  | { readonly type: 'part'; readonly partId: string };

export interface HitOptions {
  /** How close (grid units) a pointer must be to a pin. */
  readonly pinRadius: number;
  /** How close to a wire segment. */
  readonly wireRadius: number;
}

const DEFAULTS: HitOptions = { pinRadius: 0.45, wireRadius: 0.35 };

/** Bucket size in grid units: a few symbols wide, so a query touches a handful of buckets. */
const CELL = 8;

/** Beyond this many buckets a segment goes to the index's list of long wires. */
const MAX_CELLS_PER_SEGMENT = 64;

export interface SheetIndex {
  readonly sheet: Sheet;
  readonly buckets: ReadonlyMap<string, { parts: SheetPart[]; wires: SheetWire[]; pins: PlacedPin[] }>;
  /** Wires with a segment too long to bucket: tested on every query. */
  readonly long: readonly SheetWire[];
}

function cellCount(r: Rect): number {
  const across = Math.floor(r.x1 / CELL) - Math.floor(r.x0 / CELL) + 1;
  const down = Math.floor(r.y1 / CELL) - Math.floor(r.y0 / CELL) + 1;
  return across * down;
}

function cellsOf(r: Rect): string[] {
  const out: string[] = [];
  for (let cx = Math.floor(r.x0 / CELL); cx <= Math.floor(r.x1 / CELL); cx++) {
    for (let cy = Math.floor(r.y0 / CELL); cy <= Math.floor(r.y1 / CELL); cy++) out.push(`${cx},${cy}`);
  }
  return out;
}

export function buildIndex(sheet: Sheet): SheetIndex {
  const buckets = new Map<string, { parts: SheetPart[]; wires: SheetWire[]; pins: PlacedPin[] }>();
  const bucket = (k: string) => {
    let b = buckets.get(k);
    if (!b) buckets.set(k, (b = { parts: [], wires: [], pins: [] }));
    return b;
  };
  for (const part of sheet.parts) {
    for (const k of cellsOf(partBounds(part))) bucket(k).parts.push(part);
    for (const pin of pinPositions(part))
      bucket(cellsOf({ x0: pin.x, y0: pin.y, x1: pin.x, y1: pin.y })[0]!).pins.push(pin);
  }
  const long = new Set<SheetWire>();
  for (const wire of sheet.wires) {
    for (let i = 1; i < wire.points.length; i++) {
      const box = pointsBounds([wire.points[i - 1] as Point, wire.points[i] as Point]);
      if (box === null) continue;
      if (cellCount(box) > MAX_CELLS_PER_SEGMENT) long.add(wire);
      else for (const k of cellsOf(box)) bucket(k).wires.push(wire);
    }
    if (wire.points.length === 1)
      for (const k of cellsOf(pointsBounds(wire.points) as Rect)) bucket(k).wires.push(wire);
  }
  return { sheet, buckets, long: [...long] };
}

function near(index: SheetIndex, p: Point, radius: number) {
  const keys = cellsOf({ x0: p.x - radius, y0: p.y - radius, x1: p.x + radius, y1: p.y + radius });
  const parts = new Set<SheetPart>();
  const wires = new Set<SheetWire>(index.long);
  const pins: PlacedPin[] = [];
  for (const k of keys) {
    const b = index.buckets.get(k);
    if (!b) continue;
    b.parts.forEach((x) => parts.add(x));
    b.wires.forEach((x) => wires.add(x));
    pins.push(...b.pins);
  }
  return { parts, wires, pins };
}

/**
 * The topmost thing under `p`: a pin first (so wiring can start from it), then a wire, then a
 * part body. Later parts are drawn on top, so they win.
 */
export function hitTest(index: SheetIndex, p: Point, options: Partial<HitOptions> = {}): Hit | null {
  const o = { ...DEFAULTS, ...options };
  const { parts, wires, pins } = near(index, p, Math.max(o.pinRadius, o.wireRadius));
  let bestPin: PlacedPin | null = null;
  let bestD = o.pinRadius;
  for (const pin of pins) {
    const d = Math.hypot(pin.x - p.x, pin.y - p.y);
    if (d <= bestD) [bestPin, bestD] = [pin, d];
  }
  if (bestPin)
    return { type: 'pin', partId: bestPin.partId, pin: bestPin.pin, at: { x: bestPin.x, y: bestPin.y } };
  const wireHit = nearestWire([...wires], p, o.wireRadius);
  if (wireHit) return wireHit;
  const order = new Map(index.sheet.parts.map((q, i) => [q.id, i]));
  const under = [...parts].filter((q) => rectContainsPoint(partBounds(q), p, 0.15));
  under.sort((a, b) => (order.get(b.id) ?? 0) - (order.get(a.id) ?? 0));
  return under[0] ? { type: 'part', partId: under[0].id } : null;
}

function nearestWire(wires: readonly SheetWire[], p: Point, radius: number): Hit | null {
  let best: Hit | null = null;
  let bestD = radius;
  for (const wire of wires) {
    for (let i = 1; i < wire.points.length; i++) {
      const d = distanceToSegment(p, wire.points[i - 1]!, wire.points[i]!);
      if (d <= bestD) [best, bestD] = [{ type: 'wire', wireId: wire.id, segment: i - 1 }, d];
    }
  }
  return best;
}

/** Parts whose body and wires whose every point lie inside the box. */
export function itemsInRect(sheet: Sheet, box: Rect): { parts: string[]; wires: string[] } {
  const parts = sheet.parts.filter((p) => rectContainsRect(box, partBounds(p))).map((p) => p.id);
  const wires = sheet.wires.filter((w) => w.points.every((q) => rectContainsPoint(box, q))).map((w) => w.id);
  return { parts, wires };
}
