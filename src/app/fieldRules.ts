/**
 * What the properties form accepts: each field's text is read into a value or an error message.
 * Pure, so the rules are tested without a page.
 */
import type { SheetPart, Sheet } from '../core/sheet/types.ts';
import { isDevicePart } from '../core/sheet/parts/index.ts';
import { NET_NAME_PATTERN } from '../core/sheet/naming.ts';
import { formatSpiceNumber, spiceValue } from '../core/netlist-io/spiceNumber.ts';

export type FieldKey = 'name' | 'w' | 'l' | 'ohms' | 'farads';

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

/** A positive number; W and L are in µm (plain numbers), ohms and farads take SI suffixes (10k, 5f). */
function readPositive(text: string, key: Exclude<FieldKey, 'name'>): FieldResult {
  const value = key === 'w' || key === 'l' ? Number(text.trim()) : spiceValue(text);
  if (value === null || !Number.isFinite(value) || text.trim() === '') {
    return {
      ok: false,
      error:
        key === 'w' || key === 'l'
          ? 'a number of µm, e.g. 0.5'
          : 'a number, with a suffix if you like (10k, 4.7p)',
    };
  }
  if (value <= 0) return { ok: false, error: 'must be more than zero' };
  if ((key === 'w' || key === 'l') && value < 0.01)
    return { ok: false, error: 'below 0.01 µm is not a transistor' };
  return { ok: true, value };
}

export function readField(key: FieldKey, text: string, part: SheetPart, sheet: Sheet): FieldResult {
  return key === 'name' ? readName(text, part, sheet) : readPositive(text, key);
}

/** The fields a part kind shows, with their labels. */
export function fieldsFor(part: SheetPart): { key: FieldKey; label: string }[] {
  const name = { key: 'name' as const, label: isDevicePart(part.kind) ? 'Name' : 'Net name' };
  switch (part.kind) {
    case 'nmos':
    case 'pmos':
      return [name, { key: 'w', label: 'W (µm)' }, { key: 'l', label: 'L (µm)' }];
    case 'resistor':
      return [name, { key: 'ohms', label: 'Resistance (Ω)' }];
    case 'capacitor':
      return [name, { key: 'farads', label: 'Capacitance (F)' }];
    default:
      return [name];
  }
}

/**
 * The text a field shows for a part. Ohms and farads are written as SPICE numbers that read back to
 * exactly the same value (`1meg`, not `1M`, which reads as milli), so leaving a field untouched never
 * changes the part.
 */
export function fieldText(part: SheetPart, key: FieldKey): string {
  const v = part[key];
  if (v === undefined) return '';
  if (key === 'ohms' || key === 'farads') return formatSpiceNumber(v as number);
  return String(v);
}
