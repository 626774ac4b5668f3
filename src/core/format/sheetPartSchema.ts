/**
 * The sheet part of a design file, built from the part specs so a new part kind needs no change
 * here. Read tolerantly: a property its kind has may be missing (files written before every part
 * carried its size) and takes the kind's default, as the netlist derivation always did; a property
 * its kind does not have is dropped, like any unknown key.
 */
import { z } from 'zod';
import {
  makeSheetPart,
  PART_KINDS,
  partSpec,
  type PartKind,
  type PartProps,
  type SheetPart,
} from '../sheet/parts/index.ts';
import type { PartPlacement } from '../sheet/types.ts';
import { coordinate, partField } from './quantity.ts';

const placement = {
  name: z.string(),
  x: coordinate,
  y: coordinate,
  rotation: z.union([z.literal(0), z.literal(1), z.literal(2), z.literal(3)]),
  mirror: z.boolean(),
};

/** A kind's record: its placement and its own properties, each in its physical range (or text) or absent. */
function kindSchema(kind: PartKind) {
  const spec = partSpec(kind);
  const props: Record<string, z.ZodOptional<z.ZodType<number> | z.ZodString>> = Object.fromEntries([
    ...spec.fields.map((f) => [f.key, partField(f.key).optional()]),
    ...(spec.textProps ?? []).map((key) => [key, z.string().min(1).optional()]),
  ]);
  return z.object({ id: z.string().min(1), kind: z.literal(kind), ...placement }).extend(props);
}

const [first, ...rest] = PART_KINDS.map(kindSchema);

/** What a record holds once checked; zod cannot type a shape built at run time more closely. */
type CheckedPart = PartPlacement & PartProps & { readonly kind: PartKind };

export const sheetPartSchema: z.ZodType<SheetPart> = z
  .discriminatedUnion('kind', [first!, ...rest])
  .transform((p) => {
    const part = p as unknown as CheckedPart;
    return makeSheetPart(part.kind, part, part);
  });
