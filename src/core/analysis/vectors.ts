// Indexes read here are in range by construction, so `!` marks them (no run-time cost).
import type { InputValue, InputVector } from '../model/design.ts';
import { nameRecord } from '../model/records.ts';

/** Exhaustive sweeps stop here by default: 2^16 = 65,536 vectors. */
export const DEFAULT_MAX_INPUTS = 16;

/** The most inputs a sweep can be asked to take (`--max-inputs`): 2^24 = 16,777,216 vectors. */
export const MAX_SWEEP_INPUTS = 24;

export class SweepLimitError extends Error {
  override readonly name = 'SweepLimitError';
  constructor(
    /** The cell's inputs and the limit they exceed. */
    readonly inputs: number,
    readonly limit: number,
  ) {
    super(
      `${inputs} inputs exceed the exhaustive-sweep limit of ${limit} (${(2 ** limit).toLocaleString('en-US')} vectors)`,
    );
  }
}

/**
 * Rows per block of a streamed sweep, and vectors per run of the bit-parallel program: a multiple of
 * 32, the vectors one bit-plane word holds, so a block always holds whole words.
 */
export const SWEEP_BLOCK = 4096;

/** How many vectors a sweep has: 2^n, or 3^n when each input may also be left undriven. */
export function sweepSize(inputs: readonly string[], undriven = false): number {
  return (undriven ? 3 : 2) ** inputs.length;
}

export function checkSweepLimit(inputs: readonly string[], maxInputs = DEFAULT_MAX_INPUTS): void {
  if (inputs.length > maxInputs) throw new SweepLimitError(inputs.length, maxInputs);
}

const TWO_VALUES: readonly InputValue[] = ['0', '1'];
const THREE_VALUES: readonly InputValue[] = ['0', '1', 'Z'];

/**
 * Vector number k of a sweep in truth-table order: the first input is the most significant digit
 * (0, 1, then Z when undriven inputs are swept too). The record's names are set last input first,
 * the order the command line has always printed them in.
 */
export function sweepVector(inputs: readonly string[], k: number, undriven = false): InputVector {
  const values = undriven ? THREE_VALUES : TWO_VALUES;
  const base = values.length;
  const vector = nameRecord<InputValue>(); // an input may be called __proto__
  let rest = k;
  for (let i = inputs.length - 1; i >= 0; i--) {
    vector[inputs[i]!] = values[rest % base]!;
    rest = Math.floor(rest / base);
  }
  return vector;
}

/** A two-valued vector's number in truth-table order (sweepVector's inverse); 0 when an input is not 0 or 1. */
export function vectorNumber(inputs: readonly string[], vector: InputVector): number {
  let k = 0;
  for (const name of inputs) {
    const value = Object.hasOwn(vector, name) ? vector[name] : undefined;
    if (value !== '0' && value !== '1') return 0;
    k = k * 2 + (value === '1' ? 1 : 0);
  }
  return k;
}

/**
 * Every combination of the inputs in truth-table order (see sweepVector). A generator, so a 16-input
 * sweep never holds its 65,536 vectors at once.
 */
export function* sweepVectors(inputs: readonly string[], undriven = false): Generator<InputVector> {
  const total = sweepSize(inputs, undriven);
  for (let k = 0; k < total; k++) yield sweepVector(inputs, k, undriven);
}
