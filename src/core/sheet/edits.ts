/**
 * Edits as pure functions `(sheet, args) → sheet`. Nothing is mutated; unchanged parts and wires
 * keep their identity, which keeps history snapshots small.
 */
import type { PartKind, Point, Rotation, Sheet, SheetPart, SheetWire } from './types.ts';
import type { ItemIds } from './selection.ts';
import { makeSheetPart, partSpec, type PartProps } from './parts/index.ts';
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
  return makeSheetPart(args.kind, {
    id: nextPartId(sheet),
    name: args.name ?? nextPartName(sheet, args.kind),
    x: Math.round(args.at.x),
    y: Math.round(args.at.y),
    rotation: args.rotation ?? 0,
    mirror: args.mirror ?? false,
  });
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

/** A new name and/or new property values; each property must be one the part's kind has. */
export type PartPatch = { readonly name?: string } & PartProps;

/** Changes a part's properties; values are checked so the sheet never holds a broken part. */
export function updatePart(sheet: Sheet, partId: string, patch: PartPatch): Sheet {
  const part = sheet.parts.find((p) => p.id === partId);
  if (part === undefined) throw new SheetEditError(`no part ${partId}`);
  const { name, ...values } = patch;
  if (name !== undefined && name.trim() === '') throw new SheetEditError('a name cannot be empty');
  const spec = partSpec(part.kind);
  for (const [key, value] of Object.entries(values)) {
    const field = spec.fields.find((f) => f.key === key);
    if (field === undefined) throw new SheetEditError(`a ${spec.title} has no ${key}`);
    const problem = typeof value === 'number' ? field.quantity.check(value) : null;
    if (problem !== null) throw new SheetEditError(`${field.label} ${problem}`);
  }
  const next = makeSheetPart(
    part.kind,
    { ...part, ...(name === undefined ? {} : { name }) },
    {
      ...part,
      ...values,
    },
  );
  return { ...sheet, parts: sheet.parts.map((p) => (p.id === partId ? next : p)) };
}
