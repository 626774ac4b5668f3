/**
 * What the properties form accepts: each field's text is read into a value or an error message.
 * The fields, their units and their checks come from the part's spec; only the name rule (unique
 * device names, net-name spelling) is the form's own. Pure, so the rules are tested without a page.
 */
import type { SheetPart, Sheet } from '../core/sheet/types.ts';
import { isDevicePart, partProp, partSpec, type PartPropKey } from '../core/sheet/parts/index.ts';
import type { PartPatch } from '../core/sheet/edits.ts';
import { NET_NAME_PATTERN } from '../core/sheet/naming.ts';

export type FieldKey = 'name' | PartPropKey;

export interface FormField {
  readonly key: FieldKey;
  /** With its unit: "W (µm)". */
  readonly label: string;
}

export type FieldResult =
  { readonly ok: true; readonly value: string | number } | { readonly ok: false; readonly error: string };

const DEVICE_NAME = /^[A-Za-z_][A-Za-z0-9_.[\]]*$/;

function readName(text: string, part: SheetPart, sheet: Sheet): FieldResult {
  const name = text.trim();
  if (name === '') return { ok: false, error: 'a name is needed' };
  if (isDevicePart(part.kind)) {
    if (!DEVICE_NAME.test(name))
      return { ok: false, error: 'letters, digits and _ only, starting with a letter' };
    if (sheet.parts.some((p) => p.id !== part.id && p.name === name && isDevicePart(p.kind))) {
      return { ok: false, error: `${name} is already used by another device` };
    }
    return { ok: true, value: name };
  }
  return NET_NAME_PATTERN.test(name)
    ? { ok: true, value: name }
    : { ok: false, error: 'a net name starts with a letter or _, no spaces' };
}

function fieldSpec(part: SheetPart, key: PartPropKey) {
  return partSpec(part.kind).fields.find((f) => f.key === key);
}

export function readField(key: FieldKey, text: string, part: SheetPart, sheet: Sheet): FieldResult {
  if (key === 'name') return readName(text, part, sheet);
  const field = fieldSpec(part, key);
  return field
    ? field.quantity.read(text)
    : { ok: false, error: `a ${partSpec(part.kind).title} has no ${key}` };
}

/** The fields a part kind shows, with their labels: the name, then the spec's fields in order. */
export function fieldsFor(part: SheetPart): FormField[] {
  return [
    { key: 'name', label: isDevicePart(part.kind) ? 'Name' : 'Net name' },
    ...partSpec(part.kind).fields.map((f) => ({ key: f.key, label: `${f.label} (${f.quantity.unit})` })),
  ];
}

/** The part's current value of a field. */
export function fieldValue(part: SheetPart, key: FieldKey): string | number | undefined {
  return key === 'name' ? part.name : partProp(part, key);
}

/**
 * The text a field shows for a part, as its quantity writes it: ohms and farads as SPICE numbers
 * that read back to exactly the same value (`1meg`, not `1M`, which reads as milli), so leaving a
 * field untouched never changes the part.
 */
export function fieldText(part: SheetPart, key: FieldKey): string {
  const value = fieldValue(part, key);
  if (value === undefined || typeof value === 'string') return value ?? '';
  const field = key === 'name' ? undefined : fieldSpec(part, key);
  return field ? field.quantity.editText(value) : String(value);
}

/** The edit that sets one field. */
export function fieldPatch(key: FieldKey, value: string | number): PartPatch {
  return key === 'name' ? { name: String(value) } : { [key]: Number(value) };
}
