/**
 * Pure edits of a sequence's steps for the step editor. The text form of steps is read and written
 * by core/analysis/sequenceText.ts, the one parser the command line uses too.
 */
import type { InputValue, InputVector } from '../model/design.ts';

export function insertStep(steps: readonly InputVector[], at: number, step: InputVector): InputVector[] {
  return [...steps.slice(0, at), step, ...steps.slice(at)];
}

export function removeStep(steps: readonly InputVector[], at: number): InputVector[] {
  return steps.filter((_, i) => i !== at);
}

export function setStepValue(
  steps: readonly InputVector[],
  at: number,
  input: string,
  value: InputValue,
): InputVector[] {
  return steps.map((s, i) => (i === at ? { ...s, [input]: value } : s));
}

/** Sets (or, with undefined, clears so it is held from the step before) one input of one step. */
export function setStepCell(
  steps: readonly InputVector[],
  at: number,
  input: string,
  value: InputValue | undefined,
): InputVector[] {
  if (value !== undefined) return setStepValue(steps, at, input, value);
  return steps.map((s, i) =>
    i === at ? Object.fromEntries(Object.entries(s).filter(([n]) => n !== input)) : s,
  );
}

/** A step-editor cell cycles held → 0 → 1 → Z → X → held. */
const CELL_CYCLE: readonly (InputValue | undefined)[] = [undefined, '0', '1', 'Z', 'X'];

export function nextCellValue(value: InputValue | undefined): InputValue | undefined {
  return CELL_CYCLE[(CELL_CYCLE.indexOf(value) + 1) % CELL_CYCLE.length];
}

/** Moves step `from` by `offset` places, clamped to the list. */
export function moveStep(steps: readonly InputVector[], from: number, offset: number): InputVector[] {
  const to = Math.max(0, Math.min(steps.length - 1, from + offset));
  const moving = steps[from];
  if (moving === undefined || to === from) return [...steps];
  return insertStep(removeStep(steps, from), to, moving);
}
