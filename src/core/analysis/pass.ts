/**
 * One pass over the vectors of a sweep or the steps of a sequence: each is solved once and handed to
 * every reader that wants it (the check's rows, power counters, level strips), so an analysis that
 * needs several of them never solves a vector twice (docs/semantics.md §5).
 */
import type { InputValue, InputVector } from '../model/design.ts';
import type { Simulator, SolveResult } from '../solver/simulator.ts';
import { sweepSize, sweepVectors } from './vectors.ts';

/**
 * A reader of solved vectors. `add` is called once per vector, in order, before the next one is
 * solved: a sweep recycles the result's arrays, so read what you need there and keep no reference.
 */
export interface SolveObserver {
  add(result: SolveResult, index: number): void;
}

/** Called with (done, total) as vectors are solved; return false to stop early. */
export type PassProgress = (done: number, total: number) => boolean | void;

/** Every input combination, each solved from an unknown state; returns how many were solved. */
export function sweepPass(
  simulator: Simulator,
  observers: readonly SolveObserver[],
  options: { readonly undrivenInputs?: boolean; readonly onProgress?: PassProgress } = {},
): number {
  const inputs = simulator.compiled.netlist.inputs;
  const total = sweepSize(inputs, options.undrivenInputs);
  let done = 0;
  for (const vector of sweepVectors(inputs, options.undrivenInputs)) {
    const result = simulator.solveFresh(vector, { recycle: true });
    for (const observer of observers) observer.add(result, done);
    done++;
    if (options.onProgress?.(done, total) === false) break;
  }
  return done;
}

export class SequenceError extends Error {
  override readonly name: string = 'SequenceError';
}

/**
 * Steps applied in order, stored charge carried from each to the next. An input a step leaves out
 * keeps its value from the step before, X before its first mention. Returns how many were solved.
 */
export function sequencePass(
  simulator: Simulator,
  steps: readonly InputVector[],
  observers: readonly SolveObserver[],
  onProgress?: PassProgress,
): number {
  const inputs = simulator.compiled.netlist.inputs;
  let held: Record<string, InputValue> = Object.fromEntries(inputs.map((n) => [n, 'X' as InputValue]));
  let previous: SolveResult | null = null;
  let done = 0;
  for (const [i, step] of steps.entries()) {
    for (const name of Object.keys(step)) {
      if (!inputs.includes(name))
        throw new SequenceError(`step ${i + 1} sets '${name}', which is not an input`);
    }
    held = { ...held, ...step };
    previous = previous === null ? simulator.solveFresh(held) : simulator.solveNext(held, previous);
    for (const observer of observers) observer.add(previous, i);
    done++;
    if (onProgress?.(done, steps.length) === false) break;
  }
  return done;
}
