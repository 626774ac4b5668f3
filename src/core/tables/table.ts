import type { GroupShape } from './shape.ts';

/**
 * Groups with more controls than this get no table: 2^12 = 4,096 entries, each one evaluation of
 * the group. Past it a consumer falls back to the scalar engine (the sweep) or to a structural
 * encoding (the proofs).
 */
export const MAX_TABLE_CONTROLS = 12;
/** Tables with controls also at X have 3^k entries: at most 3^8 = 6,561. */
export const MAX_TERNARY_CONTROLS = 8;
/** At most this many element evaluations (entries × the group's elements) go into one table. */
export const MAX_TABLE_WORK = 1 << 22;

/** Bits of a table's `states` byte per entry and net. */
export const STATE_LEVEL = 3; // mask: LEVEL_0, LEVEL_1, LEVEL_X, LEVEL_Z of solver/levels.ts
/** The voltage is exactly 0 or exactly VDD (and the net is driven): a level later tables are keyed on. */
export const STATE_EXACT = 4;
/** The net has a conducting path to a source (a Z net has none; an X net may have one). */
export const STATE_DRIVEN = 8;

/** Control values of a ternary entry: digit d of control i is (entry / 3^i) % 3. */
export const TRIT_0 = 0;
export const TRIT_1 = 1;
export const TRIT_X = 2;

/**
 * A group's behaviour for every assignment of its controls, as the engine evaluates it in sweep mode
 * (unknown starting charge). Binary tables have 2^k entries, entry bit i = control i at VDD (else at
 * 0 V); ternary tables have 3^k, digit i of the entry in base 3 = TRIT_0, TRIT_1 or TRIT_X (NaN).
 * Per entry e and group net i (position in `shape.nets`), at e × nets + i: `states` (level and the
 * STATE_* bits), `flags` (the engine's FLAG_* bits) and `volts` (NaN where unknown).
 */
export interface GroupTable {
  readonly kind: 'table';
  readonly shape: GroupShape;
  readonly ternary: boolean;
  readonly entries: number;
  readonly states: Uint8Array;
  readonly flags: Uint8Array;
  readonly volts: Float64Array;
  /** Per entry: 1 when some element of the group carries current (a static current path). */
  readonly current: Uint8Array;
  /**
   * Per entry: 1 when every net sits exactly at 0 or VDD or floats with unknown charge, no net is
   * flagged and no element carries current: nothing the scalar engine would report.
   */
  readonly clean: Uint8Array;
  /** The same test over the observed nets only (outputs and nets feeding gates). */
  readonly cleanObserved: Uint8Array;
}

/** Why a group has no table. */
export interface NoTable {
  readonly kind: 'none';
  readonly shape: GroupShape;
  readonly reason: string;
}

/**
 * The binary entry of a table for the voltages in `volts`, or -1 when some control is not exactly
 * at 0 V or VDD (the table does not describe the group then).
 */
export function binaryEntry(shape: GroupShape, volts: Float64Array, vdd: number): number {
  let entry = 0;
  const { controls } = shape;
  for (let i = 0; i < controls.length; i++) {
    const v = volts[controls[i]!];
    if (v === vdd) entry |= 1 << i;
    else if (v !== 0) return -1;
  }
  return entry;
}

/**
 * The ternary entry for the voltages in `volts` (NaN reads X), or -1 when some control holds a
 * voltage other than 0, VDD or NaN.
 */
export function ternaryEntry(shape: GroupShape, volts: Float64Array, vdd: number): number {
  let entry = 0;
  let weight = 1;
  const { controls } = shape;
  for (let i = 0; i < controls.length; i++) {
    const v = volts[controls[i]!];
    if (v === vdd) entry += weight;
    else if (Number.isNaN(v)) entry += TRIT_X * weight;
    else if (v !== 0) return -1;
    weight *= 3;
  }
  return entry;
}
