// Indexes read here are in range by construction, so `!` marks them (no run-time cost).
import type { InputValue, InputVector } from '../model/design.ts';
import { nameRecord } from '../model/records.ts';

/** Exhaustive sweeps stop here by default: 2^16 = 65,536 vectors. */
export const DEFAULT_MAX_INPUTS = 16;

export class SweepLimitError extends Error {
  override readonly name = 'SweepLimitError';
}

/** How many vectors a sweep has: 2^n, or 3^n when each input may also be left undriven. */
export function sweepSize(inputs: readonly string[], undriven = false): number {
  return (undriven ? 3 : 2) ** inputs.length;
}

export function checkSweepLimit(inputs: readonly string[], maxInputs = DEFAULT_MAX_INPUTS): void {
  if (inputs.length > maxInputs) {
    throw new SweepLimitError(
      `${inputs.length} inputs exceed the exhaustive-sweep limit of ${maxInputs} (${2 ** maxInputs} vectors)`,
    );
  }
}

/**
 * Every combination of the inputs in truth-table order: the first input is the most significant
 * digit (0, 1, then Z when undriven inputs are swept too). A generator, so a 16-input sweep never
 * holds its 65,536 vectors at once.
 */
export function* sweepVectors(inputs: readonly string[], undriven = false): Generator<InputVector> {
  const values: readonly InputValue[] = undriven ? ['0', '1', 'Z'] : ['0', '1'];
  const base = values.length;
  const total = sweepSize(inputs, undriven);
  for (let k = 0; k < total; k++) {
    const vector = nameRecord<InputValue>(); // an input may be called __proto__
    let rest = k;
    for (let i = inputs.length - 1; i >= 0; i--) {
      vector[inputs[i]!] = values[rest % base]!;
      rest = Math.floor(rest / base);
    }
    yield vector;
  }
}
