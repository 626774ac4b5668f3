import type { InputValue, InputVector } from '../model/design.ts';

/**
 * Every 0/1 combination of the inputs in truth-table order: the first input is the most significant
 * bit, so vector k has input i at bit (n − 1 − i) of k. A generator, so a 16-input sweep never holds
 * its 65,536 vectors at once.
 */
export function* sweepVectors(inputs: readonly string[]): Generator<InputVector> {
  const n = inputs.length;
  for (let k = 0; k < 2 ** n; k++) {
    const vector: Record<string, InputValue> = {};
    for (let i = 0; i < n; i++) vector[inputs[i]] = (k >> (n - 1 - i)) & 1 ? '1' : '0';
    yield vector;
  }
}
