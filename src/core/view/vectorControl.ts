// Indexes read here are in range by construction, so `!` marks them (no run-time cost).
/**
 * Stepping through input combinations. Combination k sets input i (of n) to bit (n − 1 − i) of k:
 * the first input is the most significant, the order a truth table is written in (common practice,
 * no source) and the order the sweep reports its vectors. Combination numbers are exact integers
 * (bigint) whatever the width of the cell: a 65-input cell has 2^65 of them.
 */
import type { InputValue, InputVector } from '../model/design.ts';
import { wholeNumber } from './plural.ts';

export function vectorOfIndex(inputs: readonly string[], index: bigint | number): InputVector {
  const k = BigInt(index);
  const n = BigInt(inputs.length);
  return Object.fromEntries(inputs.map((name, i) => [name, (k >> (n - 1n - BigInt(i))) & 1n ? '1' : '0']));
}

/** The combination number of a vector (0-based), or null when an input is X, Z or missing. */
export function indexOfVector(inputs: readonly string[], vector: InputVector): bigint | null {
  let index = 0n;
  for (const name of inputs) {
    const v = vector[name];
    if (v !== '0' && v !== '1') return null;
    index = index * 2n + (v === '1' ? 1n : 0n);
  }
  return index;
}

/** The next (step +1) or previous (step −1) combination, wrapping; an X or Z vector restarts at 0. */
export function stepVector(inputs: readonly string[], vector: InputVector, step: 1 | -1): InputVector {
  const count = 1n << BigInt(inputs.length);
  const index = indexOfVector(inputs, vector);
  if (index === null) return vectorOfIndex(inputs, 0n);
  return vectorOfIndex(inputs, (index + BigInt(step) + count) % count);
}

/** Combinations written in full up to this many inputs (1,048,576); beyond, as a power of two. */
const EXACT_DIGITS_INPUTS = 20;

/** How many combinations n inputs have, exactly: "4", "1024", "65,536", "2^65". */
export function vectorCountText(inputs: number): string {
  return inputs <= EXACT_DIGITS_INPUTS ? wholeNumber(2 ** inputs) : `2^${inputs}`;
}

/**
 * Where a vector stands among all, counted from 1 as a designer counts rows: "vector 3 of 4",
 * "vector 36,893,488,147,419,103,233 of 2^65"; "a vector with an input at X or Z" otherwise.
 */
export function vectorPositionText(inputs: readonly string[], vector: InputVector): string {
  const index = indexOfVector(inputs, vector);
  if (index === null) return 'a vector with an input at X or Z';
  return `vector ${wholeNumber(index + 1n)} of ${vectorCountText(inputs.length)}`;
}

/** 0 ↔ 1; an X or Z input becomes 0, so one click always gives a driven level. */
export function toggledValue(value: InputValue | undefined): InputValue {
  return value === '0' ? '1' : '0';
}

export function toggleInput(vector: InputVector, name: string): InputVector {
  return { ...vector, [name]: toggledValue(vector[name]) };
}

/** The order a step-editor cell cycles through: driven levels first, then undriven, then unknown. */
const CYCLE: readonly InputValue[] = ['0', '1', 'Z', 'X'];

export function cycledValue(value: InputValue | undefined): InputValue {
  const at = value === undefined ? -1 : CYCLE.indexOf(value);
  return CYCLE[(at + 1) % CYCLE.length]!;
}

/** Every input named, missing ones at 0: what the live solve and the sequence runner receive. */
export function completeVector(inputs: readonly string[], vector: InputVector): InputVector {
  return Object.fromEntries(inputs.map((name) => [name, vector[name] ?? '0']));
}
