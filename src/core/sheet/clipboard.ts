/**
 * Copy and paste of sheet items. The clipboard is plain data (so it can sit in the store or the
 * system clipboard); pasting gives fresh ids and renumbers devices and instances so names stay unique. Pins,
 * rails and labels keep their names: a pasted label still joins its net, as the designer meant.
 */
import type { Sheet, SheetPart, SheetWire } from './types.ts';
import type { ItemIds } from './selection.ts';
import { isNamedOnce } from './parts/index.ts';
import { nextPartId, nextPartName, nextWireId } from './naming.ts';

export interface Clip {
  readonly parts: readonly SheetPart[];
  readonly wires: readonly SheetWire[];
}

export function copyItems(sheet: Sheet, ids: ItemIds): Clip {
  const parts = new Set(ids.parts);
  const wires = new Set(ids.wires);
  return {
    parts: sheet.parts.filter((p) => parts.has(p.id)),
    wires: sheet.wires.filter((w) => wires.has(w.id)),
  };
}

/** Pastes the clip shifted by (dx, dy); returns the new sheet and the ids of what was pasted. */
export function pasteClip(
  sheet: Sheet,
  clip: Clip,
  dx: number,
  dy: number,
): { sheet: Sheet; pasted: ItemIds } {
  let next = sheet;
  const partIds: string[] = [];
  const wireIds: string[] = [];
  for (const part of clip.parts) {
    const id = nextPartId(next);
    // Devices and instances are named one each; a pasted copy takes the next free name.
    const name = isNamedOnce(part.kind) ? nextPartName(next, part.kind) : part.name;
    next = { ...next, parts: [...next.parts, { ...part, id, name, x: part.x + dx, y: part.y + dy }] };
    partIds.push(id);
  }
  for (const wire of clip.wires) {
    const id = nextWireId(next);
    const points = wire.points.map((p) => ({ x: p.x + dx, y: p.y + dy }));
    next = { ...next, wires: [...next.wires, { id, points }] };
    wireIds.push(id);
  }
  return { sheet: next, pasted: { parts: partIds, wires: wireIds } };
}
