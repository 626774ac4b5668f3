/**
 * Which pins and wires form one net. Items are numbered: every pin first (parts in sheet order, each
 * part's pins in its spec's order), then every wire; groups are a union-find over those numbers.
 * Only the points where something can join (pins and wire ends and bends) are looked at, so the
 * cost does not grow with the drawn length of the wires (see pointIndex.ts).
 *
 * Rules (the usual ones on a schematic sheet; docs/semantics.md §1):
 * - the points of one wire are one net;
 * - a wire end or bend that lies anywhere on another wire joins it (a T);
 * - two wires that only cross, with no end or bend at the crossing, stay apart;
 * - a pin joins any wire that covers its point, and any pin at the same point.
 */
import type { Point, Sheet } from './types.ts';
import { pinPositions, type PlacedPin } from './geometry.ts';
import { spotIndex, type Cover, type SpotIndex } from './pointIndex.ts';

/** Union-find over item numbers, by size with path halving: near-constant look-ups. */
export class ItemGroups {
  private readonly parent: Int32Array;
  private readonly size: Int32Array;

  constructor(count: number) {
    this.parent = new Int32Array(count);
    this.size = new Int32Array(count).fill(1);
    for (let i = 0; i < count; i++) this.parent[i] = i;
  }

  find(a: number): number {
    const parent = this.parent;
    while (parent[a] !== a) {
      parent[a] = parent[parent[a]!]!;
      a = parent[a]!;
    }
    return a;
  }

  /** Joins the groups of a and b; true when they were apart. */
  union(a: number, b: number): boolean {
    let ra = this.find(a);
    let rb = this.find(b);
    if (ra === rb) return false;
    if (this.size[ra]! < this.size[rb]!) [ra, rb] = [rb, ra];
    this.parent[rb] = ra;
    this.size[ra]! += this.size[rb]!;
    return true;
  }
}

/** Two items that touch at a point: the reason two of them are one net. */
export interface Touch {
  readonly a: number;
  readonly b: number;
  readonly at: Point;
}

export interface SheetConnectivity {
  readonly groups: ItemGroups;
  /** Every pin, by item number. */
  readonly pins: readonly PlacedPin[];
  /** Item number of each part's first pin, by part index (its pins follow in spec order). */
  readonly firstPin: readonly number[];
  /** Item number of wire i is `wireBase + i`. */
  readonly wireBase: number;
  /** Points where three or more wire ends, segments or pins meet: drawn as junction dots. */
  readonly junctions: readonly Point[];
  /** Wire ends that touch nothing (no pin, no other wire): likely unfinished wiring. */
  readonly openEnds: readonly Point[];
  /** Every touch that joined two items, when asked for (`{ touches: true }`). */
  readonly touches: readonly Touch[];
}

function placePins(sheet: Sheet): { pins: PlacedPin[]; firstPin: number[] } {
  const pins: PlacedPin[] = [];
  const firstPin: number[] = [];
  for (const part of sheet.parts) {
    firstPin.push(pins.length);
    for (const pin of pinPositions(part)) pins.push(pin);
  }
  return { pins, firstPin };
}

/** Arms arriving at a spot: one per segment ending there, two per segment passing through. */
function armsOf(covers: readonly Cover[]): number {
  let n = 0;
  for (const c of covers) n += c.end ? 1 : 2;
  return n;
}

/** Pins by spot. */
function pinsBySpot(index: SpotIndex, pinCount: number): number[][] {
  const out: number[][] = index.spots.map(() => []);
  for (let i = 0; i < pinCount; i++) out[index.spotOf[i]!]!.push(i);
  return out;
}

export function sheetConnectivity(sheet: Sheet, options: { touches?: boolean } = {}): SheetConnectivity {
  const { pins, firstPin } = placePins(sheet);
  const wireBase = pins.length;
  const groups = new ItemGroups(wireBase + sheet.wires.length);
  const touches: Touch[] = [];
  const join = (a: number, b: number, at: Point): void => {
    if (groups.union(a, b) && options.touches) touches.push({ a, b, at });
  };
  const index = spotIndex(sheet.wires, [...pins, ...sheet.wires.flatMap((w) => w.points)]);
  const pinsAt = pinsBySpot(index, pins.length);
  let q = wireBase;
  sheet.wires.forEach((wire, w) => {
    for (let k = 0; k < wire.points.length; k++, q++) {
      const spot = index.spotOf[q]!;
      for (const c of index.covers[spot]!) join(wireBase + w, wireBase + c.wire, index.spots[spot]!);
    }
  });
  pinsAt.forEach((here, spot) => {
    const first = here[0];
    if (first === undefined) return;
    const at = index.spots[spot]!;
    for (const pin of here) join(first, pin, at);
    for (const c of index.covers[spot]!) join(first, wireBase + c.wire, at);
  });
  return {
    groups,
    pins,
    firstPin,
    wireBase,
    junctions: index.spots.filter((_, s) => armsOf(index.covers[s]!) + pinsAt[s]!.length >= 3),
    openEnds: openEndsOf(sheet, index, pinsAt),
    touches,
  };
}

/** Ends of wires where nothing else is: no pin, no other segment. */
function openEndsOf(sheet: Sheet, index: SpotIndex, pinsAt: readonly (readonly number[])[]): Point[] {
  const out: Point[] = [];
  let q = index.spotOf.length - sheet.wires.reduce((n, w) => n + w.points.length, 0);
  for (const wire of sheet.wires) {
    const n = wire.points.length;
    for (const k of n === 0 ? [] : n === 1 ? [0] : [0, n - 1]) {
      const spot = index.spotOf[q + k]!;
      const covers = index.covers[spot]!;
      if (armsOf(covers) === 1 && pinsAt[spot]!.length === 0) out.push({ ...index.spots[spot]! });
    }
    q += n;
  }
  return out;
}
