/**
 * Undo steps as patches, so the history can be kept across a reload without storing a whole sheet
 * per step: a patch turns one document into another by the ids of the parts and wires that
 * differ, plus the document fields that changed. Documents share unchanged items by identity, so a
 * patch is found by comparing objects, in one pass over the items.
 */
import type { SheetPart, SheetWire } from '../core/sheet/types.ts';
import type { SheetDocument } from './document.ts';

/** Items to put (added or changed), ids to drop, and the full order when it is not the natural one. */
export interface ListPatch<T> {
  readonly put: readonly T[];
  readonly drop: readonly string[];
  readonly order?: readonly string[];
}

type DocFields = Omit<SheetDocument, 'sheet'>;

export interface DocPatch {
  readonly parts?: ListPatch<SheetPart>;
  readonly wires?: ListPatch<SheetWire>;
  readonly fields?: Partial<DocFields>;
  /** Optional fields `from` has and `to` lacks (notes dismissed, a cell left for its parent). */
  readonly drop?: readonly OptionalField[];
}

interface Item {
  readonly id: string;
}

/** The list `from` becomes with a patch: drops removed, puts replaced in place or added at the end. */
function applyList<T extends Item>(from: readonly T[], patch: ListPatch<T>): T[] {
  const dropped = new Set(patch.drop);
  const put = new Map(patch.put.map((item) => [item.id, item]));
  const kept = from.filter((item) => !dropped.has(item.id)).map((item) => put.get(item.id) ?? item);
  const present = new Set(kept.map((item) => item.id));
  const list = [...kept, ...patch.put.filter((item) => !present.has(item.id))];
  if (patch.order === undefined) return list;
  const byId = new Map(list.map((item) => [item.id, item]));
  return patch.order.flatMap((id) => byId.get(id) ?? []);
}

function listPatch<T extends Item>(from: readonly T[], to: readonly T[]): ListPatch<T> | undefined {
  if (from === to) return undefined;
  const before = new Map(from.map((item) => [item.id, item]));
  const present = new Set(to.map((item) => item.id));
  const put = to.filter((item) => before.get(item.id) !== item);
  const drop = from.filter((item) => !present.has(item.id)).map((item) => item.id);
  if (put.length === 0 && drop.length === 0 && from.length === to.length && from.every((x, i) => x === to[i]))
    return undefined;
  const natural = applyList(from, { put, drop });
  const inOrder = natural.length === to.length && natural.every((item, i) => item.id === to[i]!.id);
  return inOrder ? { put, drop } : { put, drop, order: to.map((item) => item.id) };
}

/** The fields of a design's other cells and of the open cell's place among them: optional. */
const OPTIONAL = ['notes', 'instances', 'globals', 'cells', 'openAt', 'designName', 'context'] as const;
type OptionalField = (typeof OPTIONAL)[number];
const FIELDS = ['name', 'technology', 'expectations', 'sequences', ...OPTIONAL] as const;

/** The patch that turns `from` into `to`. */
export function docPatch(from: SheetDocument, to: SheetDocument): DocPatch {
  const fields: Partial<Record<(typeof FIELDS)[number], unknown>> = {};
  for (const key of FIELDS) if (from[key] !== to[key] && to[key] !== undefined) fields[key] = to[key];
  const drop = OPTIONAL.filter((key) => from[key] !== undefined && to[key] === undefined);
  const parts = listPatch(from.sheet.parts, to.sheet.parts);
  const wires = listPatch(from.sheet.wires, to.sheet.wires);
  return {
    ...(parts ? { parts } : {}),
    ...(wires ? { wires } : {}),
    ...(Object.keys(fields).length > 0 ? { fields: fields as Partial<DocFields> } : {}),
    ...(drop.length > 0 ? { drop } : {}),
  };
}

export function applyDocPatch(from: SheetDocument, patch: DocPatch): SheetDocument {
  const next: Record<string, unknown> = { ...from, ...patch.fields };
  for (const key of patch.drop ?? []) delete next[key];
  return {
    ...(next as Omit<SheetDocument, 'sheet'>),
    sheet: {
      parts: patch.parts ? applyList(from.sheet.parts, patch.parts) : from.sheet.parts,
      wires: patch.wires ? applyList(from.sheet.wires, patch.wires) : from.sheet.wires,
    },
  };
}
