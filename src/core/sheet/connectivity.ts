/**
 * Which pins and wires form one net. Joins happen only at wire ends, bends and pins, so only those
 * points are looked at: each segment finds the ones lying on it by binary search in its row or
 * column. The work grows with the number of segments and points, never with how long a wire is (a
 * wire a million grid units long costs what a short one does).
 *
 * Rules (the usual ones on a schematic sheet):
 * - the points of one wire are one net;
 * - a wire end or bend that lies anywhere on another wire joins it (a T);
 * - two wires that only cross, with no end or bend at the crossing, stay apart;
 * - a pin joins any wire that covers its point, and any pin at the same point.
 */
import type { Sheet } from './types.ts';
import { pinPositions, pointKey, type PlacedPin } from './geometry.ts';
import type { Point } from './types.ts';

export class UnionFind {
  private readonly parent = new Map<string, string>();
  private readonly size = new Map<string, number>();

  find(a: string): string {
    let root = a;
    for (let p = this.parent.get(root); p !== undefined && p !== root; p = this.parent.get(root)) root = p;
    if (!this.parent.has(a)) this.parent.set(a, a);
    // Path compression keeps later look-ups near constant.
    for (let x = a; x !== root;) {
      const next = this.parent.get(x) as string;
      this.parent.set(x, root);
      x = next;
    }
    return root;
  }

  /** Union by size: the smaller tree hangs under the larger, so trees stay shallow. */
  union(a: string, b: string): void {
    const ra = this.find(a);
    const rb = this.find(b);
    if (ra === rb) return;
    const sa = this.size.get(ra) ?? 1;
    const sb = this.size.get(rb) ?? 1;
    const [big, small] = sa >= sb ? [ra, rb] : [rb, ra];
    this.parent.set(small, big);
    this.size.set(big, sa + sb);
  }
}

export const pinKey = (partId: string, pin: string): string => `pin:${partId}.${pin}`;
export const wireKey = (wireId: string): string => `wire:${wireId}`;

export interface SheetConnectivity {
  readonly groups: UnionFind;
  readonly pins: readonly PlacedPin[];
  /** Points where three or more wire ends, segments or pins meet: drawn as junction dots. */
  readonly junctions: readonly { readonly x: number; readonly y: number }[];
  /** Wire ends that touch nothing (no pin, no other wire): likely unfinished wiring. */
  readonly openEnds: readonly { readonly x: number; readonly y: number }[];
}

/** Points sorted along one row (by x) or one column (by y), for range look-ups. */
class Line {
  readonly at: number[] = [];
  add(v: number): void {
    this.at.push(v);
  }
  /** Every value from lo to hi, both included (the list is sorted first). */
  *within(lo: number, hi: number): Generator<number> {
    let i = lowerBound(this.at, lo);
    while (i < this.at.length && (this.at[i] as number) <= hi) yield this.at[i++] as number;
  }
}

function lowerBound(sorted: readonly number[], v: number): number {
  let [lo, hi] = [0, sorted.length];
  while (lo < hi) {
    const mid = (lo + hi) >>> 1;
    if ((sorted[mid] as number) < v) lo = mid + 1;
    else hi = mid;
  }
  return lo;
}

function linesOf(points: Iterable<Point>): { rows: Map<number, Line>; columns: Map<number, Line> } {
  const rows = new Map<number, Line>();
  const columns = new Map<number, Line>();
  const seen = new Set<string>();
  for (const p of points) {
    const k = pointKey(p);
    if (seen.has(k)) continue;
    seen.add(k);
    if (!rows.has(p.y)) rows.set(p.y, new Line());
    if (!columns.has(p.x)) columns.set(p.x, new Line());
    rows.get(p.y)?.add(p.x);
    columns.get(p.x)?.add(p.y);
  }
  for (const line of [...rows.values(), ...columns.values()]) line.at.sort((a, b) => a - b);
  return { rows, columns };
}

/**
 * At each wire end, bend and pin point: the wires covering it, and how many segment ends arrive
 * there (an interior point of a segment counts two arms, an end one). A segment that is neither
 * horizontal nor vertical (the editor never draws one) covers only its two ends.
 */
function indexWires(
  sheet: Sheet,
  pins: readonly Point[],
): { covering: Map<string, Set<string>>; arms: Map<string, number> } {
  const covering = new Map<string, Set<string>>();
  const arms = new Map<string, number>();
  const { rows, columns } = linesOf([...sheet.wires.flatMap((w) => w.points), ...pins]);
  const touch = (wire: string, p: Point, end: boolean): void => {
    const k = pointKey(p);
    let set = covering.get(k);
    if (!set) covering.set(k, (set = new Set()));
    set.add(wire);
    arms.set(k, (arms.get(k) ?? 0) + (end ? 1 : 2));
  };
  for (const wire of sheet.wires) {
    for (let i = 1; i < wire.points.length; i++) {
      const [a, b] = [wire.points[i - 1] as Point, wire.points[i] as Point];
      if (a.x === b.x && a.y === b.y) touch(wire.id, a, true);
      else if (a.y === b.y) {
        for (const x of rows.get(a.y)?.within(Math.min(a.x, b.x), Math.max(a.x, b.x)) ?? [])
          touch(wire.id, { x, y: a.y }, x === a.x || x === b.x);
      } else if (a.x === b.x) {
        for (const y of columns.get(a.x)?.within(Math.min(a.y, b.y), Math.max(a.y, b.y)) ?? [])
          touch(wire.id, { x: a.x, y }, y === a.y || y === b.y);
      } else {
        touch(wire.id, a, true);
        touch(wire.id, b, true);
      }
    }
  }
  return { covering, arms };
}

export function sheetConnectivity(sheet: Sheet): SheetConnectivity {
  const groups = new UnionFind();
  const pins = sheet.parts.flatMap(pinPositions);
  const { covering, arms } = indexWires(sheet, pins);
  const pinsAt = new Map<string, PlacedPin[]>();
  for (const pin of pins) {
    const k = pointKey(pin);
    groups.find(pinKey(pin.partId, pin.pin));
    const here = pinsAt.get(k);
    if (here) here.push(pin);
    else pinsAt.set(k, [pin]);
  }
  for (const wire of sheet.wires) {
    groups.find(wireKey(wire.id));
    for (const p of wire.points) {
      for (const other of covering.get(pointKey(p)) ?? []) groups.union(wireKey(wire.id), wireKey(other));
    }
  }
  for (const [k, here] of pinsAt) {
    const first = pinKey(here[0]!.partId, here[0]!.pin);
    for (const pin of here) groups.union(first, pinKey(pin.partId, pin.pin));
    for (const w of covering.get(k) ?? []) groups.union(first, wireKey(w));
  }
  // A crossing of two straight wires (four arms, no end or bend there) is not a join.
  const vertices = new Set(sheet.wires.flatMap((w) => w.points.map(pointKey)));
  const junctions: { x: number; y: number }[] = [];
  for (const [k, n] of arms) {
    const total = n + (pinsAt.get(k)?.length ?? 0);
    if (total < 3 || !(pinsAt.has(k) || vertices.has(k))) continue;
    const [x, y] = k.split(',').map(Number) as [number, number];
    junctions.push({ x, y });
  }
  const openEnds = sheet.wires
    .flatMap((w) => [w.points[0]!, w.points[w.points.length - 1]!])
    .filter((p) => {
      const k = pointKey(p);
      return arms.get(k) === 1 && !pinsAt.has(k) && (covering.get(k)?.size ?? 0) === 1;
    })
    .map((p) => ({ x: p.x, y: p.y }));
  return { groups, pins, junctions, openEnds };
}
