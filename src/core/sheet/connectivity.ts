/**
 * Which pins and wires form one net. Coordinates are integers, so a wire is indexed by every grid
 * point it covers and joins are exact look-ups, linear in the drawn length.
 *
 * Rules (the usual ones on a schematic sheet):
 * - the points of one wire are one net;
 * - a wire end or bend that lies anywhere on another wire joins it (a T);
 * - two wires that only cross, with no end or bend at the crossing, stay apart;
 * - a pin joins any wire that covers its point, and any pin at the same point.
 */
import type { Sheet } from './types.ts';
import { pinPositions, pointKey, type PlacedPin } from './geometry.ts';
import { segmentGridPoints } from './routing.ts';

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

/** Grid point → wires covering it, and how many segment ends arrive there. */
function indexWires(sheet: Sheet): { covering: Map<string, Set<string>>; arms: Map<string, number> } {
  const covering = new Map<string, Set<string>>();
  const arms = new Map<string, number>();
  const bump = (k: string, n: number): void => void arms.set(k, (arms.get(k) ?? 0) + n);
  for (const wire of sheet.wires) {
    for (let i = 1; i < wire.points.length; i++) {
      const pts = segmentGridPoints(wire.points[i - 1]!, wire.points[i]!);
      pts.forEach((p, j) => {
        const k = pointKey(p);
        let set = covering.get(k);
        if (!set) covering.set(k, (set = new Set()));
        set.add(wire.id);
        // An interior point of a segment has two arms; an end of a segment has one.
        bump(k, j === 0 || j === pts.length - 1 ? 1 : 2);
      });
    }
  }
  return { covering, arms };
}

export function sheetConnectivity(sheet: Sheet): SheetConnectivity {
  const groups = new UnionFind();
  const { covering, arms } = indexWires(sheet);
  const pins = sheet.parts.flatMap(pinPositions);
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
