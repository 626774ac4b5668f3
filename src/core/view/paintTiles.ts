// Indexes read here are in range by construction, so `!` marks them (no run-time cost).
/**
 * The overlay's layout filed by square tiles of the sheet, so that painting an area (a toggle's
 * changed nets, the part of the sheet on screen) visits the segments, marks and transistor marks
 * there instead of every one on the sheet. Built once per layout.
 */
import type { Rect } from '../sheet/geometry.ts';
import type { PaintLayout } from './overlayPaint.ts';

/** A tile's side, in grid units: a few transistors across. */
export const PAINT_TILE = 8;
/** Beyond this many tiles a segment (a long bus with corners) is kept in a list every query reads. */
export const MAX_TILES_PER_SEGMENT = 64;
/** How far a level mark's text reaches from its anchor (bold, 0.55 units high; generous). */
export const MARK_REACH = { x: 3, y: 1 };
/** A transistor mark's radius, with its stroke. */
export const DEVICE_REACH = 0.45;

/** What lies in one tile, by position in the layout's lists. */
interface Tile {
  readonly segments: number[];
  readonly marks: number[];
  readonly devices: number[];
}

/** The layout entries an area meets, each once, in layout order. */
export interface ShapesIn {
  readonly segments: readonly number[];
  readonly marks: readonly number[];
  readonly devices: readonly number[];
}

export function segmentBox(points: readonly number[]): Rect {
  let x0 = Infinity;
  let y0 = Infinity;
  let x1 = -Infinity;
  let y1 = -Infinity;
  for (let i = 0; i + 1 < points.length; i += 2) {
    const x = points[i]!;
    const y = points[i + 1]!;
    if (x < x0) x0 = x;
    if (x > x1) x1 = x;
    if (y < y0) y0 = y;
    if (y > y1) y1 = y;
  }
  return { x0, y0, x1, y1 };
}

export function markBox(m: { readonly x: number; readonly y: number }): Rect {
  return { x0: m.x - 0.5, y0: m.y - MARK_REACH.y / 2, x1: m.x + MARK_REACH.x, y1: m.y + MARK_REACH.y };
}

export function deviceBox(d: { readonly x: number; readonly y: number }): Rect {
  return { x0: d.x - DEVICE_REACH, y0: d.y - DEVICE_REACH, x1: d.x + DEVICE_REACH, y1: d.y + DEVICE_REACH };
}

/** The tile rows and columns a box meets. */
function tileSpan(box: Rect): { tx0: number; ty0: number; tx1: number; ty1: number } {
  return {
    tx0: Math.floor(box.x0 / PAINT_TILE),
    ty0: Math.floor(box.y0 / PAINT_TILE),
    tx1: Math.floor(box.x1 / PAINT_TILE),
    ty1: Math.floor(box.y1 / PAINT_TILE),
  };
}

/** Tiles either side of the origin a tile number holds (sheets stay far below it). */
const HALF = 2 ** 20;
const ROW = 2 * HALF;

/**
 * A tile's number, row by row: sorted numbers list a row's tiles left to right, and neighbours in
 * a row differ by one.
 */
const tileKey = (tx: number, ty: number): number => (ty + HALF) * ROW + tx + HALF;

/** The tiles from `first` to `last`, two numbers of one row, as one rectangle (sheet units). */
export function tileRun(first: number, last: number): Rect {
  const ty = Math.floor(first / ROW) - HALF;
  return {
    x0: ((first % ROW) - HALF) * PAINT_TILE,
    y0: ty * PAINT_TILE,
    x1: ((last % ROW) - HALF + 1) * PAINT_TILE,
    y1: (ty + 1) * PAINT_TILE,
  };
}

/** Adds the numbers of the tiles a box meets. */
export function addTiles(box: Rect, into: Set<number>): void {
  const { tx0, ty0, tx1, ty1 } = tileSpan(box);
  for (let ty = ty0; ty <= ty1; ty++) for (let tx = tx0; tx <= tx1; tx++) into.add(tileKey(tx, ty));
}

type Kind = keyof Tile;

class TileIndex {
  readonly tiles = new Map<number, Tile>();
  /** Segments spanning more than MAX_TILES_PER_SEGMENT tiles. */
  readonly long: number[] = [];

  file(kind: Kind, item: number, box: Rect): void {
    const { tx0, ty0, tx1, ty1 } = tileSpan(box);
    if (kind === 'segments' && (tx1 - tx0 + 1) * (ty1 - ty0 + 1) > MAX_TILES_PER_SEGMENT) {
      this.long.push(item);
      return;
    }
    for (let tx = tx0; tx <= tx1; tx++)
      for (let ty = ty0; ty <= ty1; ty++) {
        const key = tileKey(tx, ty);
        let tile = this.tiles.get(key);
        if (tile === undefined) this.tiles.set(key, (tile = { segments: [], marks: [], devices: [] }));
        tile[kind].push(item);
      }
  }
}

const indexes = new WeakMap<PaintLayout, TileIndex>();

function indexOf(layout: PaintLayout): TileIndex {
  let index = indexes.get(layout);
  if (index !== undefined) return index;
  index = new TileIndex();
  layout.segments.forEach((s, i) => index.file('segments', i, segmentBox(s.points)));
  layout.marks.forEach((m, i) => index.file('marks', i, markBox(m)));
  layout.devices.forEach((d, i) => index.file('devices', i, deviceBox(d)));
  indexes.set(layout, index);
  return index;
}

/**
 * The entries whose tiles meet `area` (a superset of what meets it, never missing any); null when
 * the area spans more tiles than the sheet has, where walking every entry costs less.
 */
export function shapesIn(layout: PaintLayout, area: Rect): ShapesIn | null {
  const index = indexOf(layout);
  const { tx0, ty0, tx1, ty1 } = tileSpan(area);
  if ((tx1 - tx0 + 1) * (ty1 - ty0 + 1) > index.tiles.size) return null;
  const found = { segments: new Set(index.long), marks: new Set<number>(), devices: new Set<number>() };
  for (let tx = tx0; tx <= tx1; tx++)
    for (let ty = ty0; ty <= ty1; ty++) {
      const tile = index.tiles.get(tileKey(tx, ty));
      if (tile === undefined) continue;
      for (const kind of ['segments', 'marks', 'devices'] as const)
        for (const item of tile[kind]) found[kind].add(item);
    }
  const sorted = (s: Set<number>): number[] => [...s].sort((a, b) => a - b);
  return { segments: sorted(found.segments), marks: sorted(found.marks), devices: sorted(found.devices) };
}
