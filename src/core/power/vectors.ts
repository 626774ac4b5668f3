import type { InputVector } from '../model/design.ts';

/**
 * Every 0/1 combination of the inputs in truth-table order: the first input is the most significant
 * bit, so vector k has input i at bit (n − 1 − i) of k.
 */
export function sweepVectors(inputs: readonly string[]): InputVector[] {
  const n = inputs.length;
  return Array.from({ length: 2 ** n }, (_, k) =>
    Object.fromEntries(inputs.map((name, i) => [name, (k >> (n - 1 - i)) & 1 ? '1' : '0'])),
  );
}
