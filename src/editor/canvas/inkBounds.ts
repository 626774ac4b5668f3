/**
 * Where each item leaves ink (its body, pins and widest text), remembered per item object: items
 * are immutable and keep their identity while unchanged, so a repaint knows what to draw in an area
 * and which areas an edit touched by comparing objects, without measuring anything twice.
 */
import type { Point, Sheet, SheetPart, SheetWire } from '../../core/sheet/types.ts';
import { partBounds, pinPositions, pointsBounds, unionRects, type Rect } from '../../core/sheet/geometry.ts';
import { partSpec } from '../../core/sheet/parts/index.ts';
import { TEXT_SIZE } from '../../core/sheet/parts/text.ts';

/** Text width per character, as a fraction of the font size (bold sans-serif, generous). */
const CHAR_WIDTH = 0.62;
/** Stroke and marks reach a little past the geometry. */
const INK_MARGIN = 0.4;

const partInks = new WeakMap<SheetPart, Rect>();
const wireInks = new WeakMap<SheetWire, Rect>();

const grow = (r: Rect, d: number): Rect => ({ x0: r.x0 - d, y0: r.y0 - d, x1: r.x1 + d, y1: r.y1 + d });

export function overlaps(a: Rect, b: Rect): boolean {
  return a.x0 <= b.x1 && b.x0 <= a.x1 && a.y0 <= b.y1 && b.y0 <= a.y1;
}

/** A rectangle grown to take in another; mutable, for summing many without a copy each. */
interface Extent {
  x0: number;
  y0: number;
  x1: number;
  y1: number;
}

function takeIn(e: Extent, x0: number, y0: number, x1: number, y1: number): void {
  e.x0 = Math.min(e.x0, x0);
  e.y0 = Math.min(e.y0, y0);
  e.x1 = Math.max(e.x1, x1);
  e.y1 = Math.max(e.y1, y1);
}

/** Body, pins and texts; measured once per part object (every part of a sheet on its first paint). */
export function partInk(part: SheetPart): Rect {
  let ink = partInks.get(part);
  if (ink === undefined) {
    const extent: Extent = { ...partBounds(part) };
    for (const p of pinPositions(part)) takeIn(extent, p.x, p.y, p.x, p.y);
    for (const t of partSpec(part.kind).texts(part)) {
      const size = TEXT_SIZE[t.style];
      const width = t.text.length * size * CHAR_WIDTH;
      const x0 = t.align === 'start' ? t.x : t.align === 'end' ? t.x - width : t.x - width / 2;
      takeIn(extent, x0, t.y - size / 2, x0 + width, t.y + size / 2);
    }
    ink = grow(extent, INK_MARGIN);
    partInks.set(part, ink);
  }
  return ink;
}

export function wireInk(wire: SheetWire): Rect {
  let ink = wireInks.get(wire);
  if (ink === undefined) {
    ink = grow(pointsBounds(wire.points) ?? { x0: 0, y0: 0, x1: 0, y1: 0 }, INK_MARGIN);
    wireInks.set(wire, ink);
  }
  return ink;
}

export function pointInk(p: Point): Rect {
  return grow({ x0: p.x, y0: p.y, x1: p.x, y1: p.y }, INK_MARGIN);
}

const sheetInks = new WeakMap<Sheet, Rect | null>();

/** Everything drawn, with a margin: nothing outside needs painting. Remembered per sheet (three layers ask). */
export function sheetInk(sheet: Sheet): Rect | null {
  if (!sheetInks.has(sheet))
    sheetInks.set(sheet, unionRects([...sheet.parts.map(partInk), ...sheet.wires.map(wireInk)]));
  return sheetInks.get(sheet) ?? null;
}

/** The parts and wires whose ink meets an area. */
export function itemsMeeting(sheet: Sheet, area: Rect): { parts: SheetPart[]; wires: SheetWire[] } {
  return {
    parts: sheet.parts.filter((p) => overlaps(partInk(p), area)),
    wires: sheet.wires.filter((w) => overlaps(wireInk(w), area)),
  };
}

/** Past this many changed items a repaint of everything is as quick as one area at a time. */
const MAX_CHANGED = 64;

function changedInk<T extends { readonly id: string }>(
  before: readonly T[],
  after: readonly T[],
  ink: (item: T) => Rect,
): Rect[] | null {
  if (before === after) return [];
  const old = new Map(before.map((item) => [item.id, item]));
  const areas: Rect[] = [];
  for (const item of after) {
    const was = old.get(item.id);
    old.delete(item.id);
    if (was === item) continue;
    areas.push(ink(item));
    if (was !== undefined) areas.push(ink(was));
    if (areas.length > 2 * MAX_CHANGED) return null;
  }
  for (const gone of old.values()) areas.push(ink(gone));
  return areas.length > 2 * MAX_CHANGED ? null : areas;
}

function changedPoints(before: readonly Point[], after: readonly Point[]): Rect[] {
  if (before === after) return [];
  const key = (p: Point): string => `${p.x},${p.y}`;
  const a = new Set(before.map(key));
  const b = new Set(after.map(key));
  return [...before.filter((p) => !b.has(key(p))), ...after.filter((p) => !a.has(key(p)))].map(pointInk);
}

/** The areas an edit touched (old and new ink of every changed item and mark), or 'all' for many. */
export function changedAreas(
  before: { sheet: Sheet; marks: readonly (readonly Point[])[] },
  after: { sheet: Sheet; marks: readonly (readonly Point[])[] },
): Rect[] | 'all' {
  const parts = changedInk(before.sheet.parts, after.sheet.parts, partInk);
  const wires = changedInk(before.sheet.wires, after.sheet.wires, wireInk);
  if (parts === null || wires === null) return 'all';
  const marks = after.marks.flatMap((m, i) => changedPoints(before.marks[i] ?? [], m));
  return [...parts, ...wires, ...marks];
}
