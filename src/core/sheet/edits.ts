/**
 * Edits as pure functions `(sheet, args) → sheet`. Nothing is mutated; unchanged parts and wires
 * keep their identity, which keeps history snapshots small.
 */
import type { PartKind, Point, Rotation, Sheet, SheetPart, SheetWire } from './types.ts';
import type { ItemIds } from './selection.ts';
import { partSpec } from './parts/index.ts';
import { nextPartId, nextPartName, nextWireId } from './naming.ts';
import { isOrthogonalPath, normalizePath } from './routing.ts';

export const EMPTY_SHEET: Sheet = { parts: [], wires: [] };

export class SheetEditError extends Error {
  override readonly name = 'SheetEditError';
}

export interface NewPart {
  readonly kind: PartKind;
  readonly at: Point;
  readonly rotation?: Rotation;
  readonly mirror?: boolean;
  /** Defaults to the next free name for the kind. */
  readonly name?: string;
}

/** A new part with the kind's default properties, a fresh id and name. */
export function makePart(sheet: Sheet, args: NewPart): SheetPart {
  return {
    id: nextPartId(sheet),
    kind: args.kind,
    name: args.name ?? nextPartName(sheet, args.kind),
    x: Math.round(args.at.x),
    y: Math.round(args.at.y),
    rotation: args.rotation ?? 0,
    mirror: args.mirror ?? false,
    ...partSpec(args.kind).defaults,
  };
}

export function addPart(sheet: Sheet, args: NewPart): Sheet {
  return { ...sheet, parts: [...sheet.parts, makePart(sheet, args)] };
}

/** Adds an orthogonal wire; the path is normalised, and a path with no length is refused. */
export function addWire(sheet: Sheet, points: readonly Point[]): Sheet {
  const path = normalizePath(points);
  if (!isOrthogonalPath(path))
    throw new SheetEditError('a wire needs two or more points joined by straight runs');
  const wire: SheetWire = { id: nextWireId(sheet), points: path };
  return { ...sheet, wires: [...sheet.wires, wire] };
}

export function deleteItems(sheet: Sheet, ids: ItemIds): Sheet {
  const parts = new Set(ids.parts);
  const wires = new Set(ids.wires);
  return {
    parts: sheet.parts.filter((p) => !parts.has(p.id)),
    wires: sheet.wires.filter((w) => !wires.has(w.id)),
  };
}

export type PartPatch = Partial<Pick<SheetPart, 'name' | 'w' | 'l' | 'ohms' | 'farads'>>;

/** Changes a part's properties; values are checked so the sheet never holds a broken part. */
export function updatePart(sheet: Sheet, partId: string, patch: PartPatch): Sheet {
  if (!sheet.parts.some((p) => p.id === partId)) throw new SheetEditError(`no part ${partId}`);
  for (const key of ['w', 'l', 'ohms', 'farads'] as const) {
    const v = patch[key];
    if (v !== undefined && !(Number.isFinite(v) && v > 0))
      throw new SheetEditError(`${key} must be a positive number`);
  }
  if (patch.name !== undefined && patch.name.trim() === '')
    throw new SheetEditError('a name cannot be empty');
  return { ...sheet, parts: sheet.parts.map((p) => (p.id === partId ? { ...p, ...patch } : p)) };
}
