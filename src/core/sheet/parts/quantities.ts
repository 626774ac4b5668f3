/**
 * The quantities a part's fields hold: how a typed value is read, written back for editing, shown
 * on the sheet, and checked. Units are the model's: µm for W and L, ohms, farads.
 */
import { engineering } from '../../units/engineering.ts';
import { formatSpiceNumber, spiceValue } from '../../units/spiceNumber.ts';

export type ReadResult =
  { readonly ok: true; readonly value: number } | { readonly ok: false; readonly error: string };

export interface Quantity {
  /** Printed after the field's label: "W (µm)". */
  readonly unit: string;
  /** Typed text → a checked value, or the reason it is refused. */
  readonly read: (text: string) => ReadResult;
  /** A value as edit text that reads back to exactly the same number. */
  readonly editText: (value: number) => string;
  /** A value as the sheet and the SVG export show it. */
  readonly show: (value: number) => string;
  /** Why a value cannot be stored, or null when it can. */
  readonly check: (value: number) => string | null;
}

function positive(value: number): string | null {
  return Number.isFinite(value) && value > 0 ? null : 'must be more than zero';
}

function reader(parse: (text: string) => number | null, hint: string, check: Quantity['check']) {
  return (text: string): ReadResult => {
    const value = text.trim() === '' ? null : parse(text);
    if (value === null || !Number.isFinite(value)) return { ok: false, error: hint };
    const problem = check(value);
    return problem === null ? { ok: true, value } : { ok: false, error: problem };
  };
}

/** Below 0.01 µm nothing is a transistor; plain numbers only, as W and L are always µm. */
function checkLength(value: number): string | null {
  return positive(value) ?? (value < 0.01 ? 'below 0.01 µm is not a transistor' : null);
}

/** Transistor W and L in µm, typed as plain numbers. */
export const MICROMETRES: Quantity = {
  unit: 'µm',
  read: reader((t) => Number(t.trim()), 'a number of µm, e.g. 0.5', checkLength),
  editText: String,
  show: String,
  check: checkLength,
};

/** A SPICE-style number with an optional scale suffix (10k, 4.7p; common practice, no source). */
function siQuantity(unit: string): Quantity {
  return {
    unit,
    read: reader(spiceValue, 'a number, with a suffix if you like (10k, 4.7p)', positive),
    // `1meg`, never `1M`, which reads back as milli.
    editText: (v) => formatSpiceNumber(v),
    show: (v) => engineering(v, unit),
    check: positive,
  };
}

export const OHMS: Quantity = siQuantity('Ω');
export const FARADS: Quantity = siQuantity('F');
