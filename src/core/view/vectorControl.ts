/**
 * Stepping through input combinations. Combination k sets input i (of n) to bit (n − 1 − i) of k:
 * the first input is the most significant, the order a truth table is written in (common practice,
 * no source) and the order the sweep reports its vectors.
 */
import type { InputValue, InputVector } from '../model/design.ts';

export function vectorOfIndex(inputs: readonly string[], index: number): InputVector {
  const n = inputs.length;
  return Object.fromEntries(inputs.map((name, i) => [name, (index >> (n - 1 - i)) & 1 ? '1' : '0']));
}

/** The combination number of a vector, or null when an input is X, Z or missing. */
export function indexOfVector(inputs: readonly string[], vector: InputVector): number | null {
  let index = 0;
  for (const name of inputs) {
    const v = vector[name];
    if (v !== '0' && v !== '1') return null;
    index = index * 2 + (v === '1' ? 1 : 0);
  }
  return index;
}

/** The next (step +1) or previous (step −1) combination, wrapping; an X or Z vector restarts at 0. */
export function stepVector(inputs: readonly string[], vector: InputVector, step: 1 | -1): InputVector {
  const count = 2 ** inputs.length;
  const index = indexOfVector(inputs, vector);
  if (index === null) return vectorOfIndex(inputs, 0);
  return vectorOfIndex(inputs, (index + step + count) % count);
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
  return CYCLE[(at + 1) % CYCLE.length];
}

/** Every input named, missing ones at 0: what the live solve and the sequence runner receive. */
export function completeVector(inputs: readonly string[], vector: InputVector): InputVector {
  return Object.fromEntries(inputs.map((name) => [name, vector[name] ?? '0']));
}
