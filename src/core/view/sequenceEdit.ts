/**
 * Pure edits of a sequence's steps for the step editor, and the one-line text form
 * `A=0 B=1; A=1 B=1` (steps split by `;`, assignments by spaces) used for pasting.
 */
import type { InputValue, InputVector } from '../model/design.ts';

export class StepTextError extends Error {
  override readonly name = 'StepTextError';
  constructor(
    message: string,
    /** 0-based character offset of the bad token in the text. */
    readonly position: number,
  ) {
    super(message);
  }
}

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

const VALUES: ReadonlySet<string> = new Set(['0', '1', 'X', 'Z']);

function parseAssignment(token: string, offset: number, inputs: ReadonlySet<string>): [string, InputValue] {
  const eq = token.indexOf('=');
  const name = eq < 0 ? token : token.slice(0, eq);
  const value = eq < 0 ? '' : token.slice(eq + 1).toUpperCase();
  if (eq < 0) throw new StepTextError(`expected NAME=VALUE, found "${token}"`, offset);
  if (!inputs.has(name)) throw new StepTextError(`"${name}" is not an input`, offset);
  if (!VALUES.has(value)) throw new StepTextError(`value of ${name} must be 0, 1, X or Z`, offset + eq + 1);
  return [name, value as InputValue];
}

/**
 * Parses the text form. A step lists only what it changes, as the design stores it; an input a step
 * leaves out keeps its value from the step before (X before its first mention, see heldSteps).
 */
export function parseSteps(text: string, inputs: readonly string[]): InputVector[] {
  const known = new Set(inputs);
  const steps: InputVector[] = [];
  for (const match of text.matchAll(/[^;]+/g)) {
    if (match[0].trim() === '') continue;
    const step: Record<string, InputValue> = {};
    for (const token of match[0].matchAll(/\S+/g)) {
      const [name, value] = parseAssignment(token[0], (match.index ?? 0) + (token.index ?? 0), known);
      step[name] = value;
    }
    steps.push(step);
  }
  return steps;
}

/** The text form of steps: each step's own assignments, in input order. */
export function formatSteps(steps: readonly InputVector[], inputs: readonly string[]): string {
  return steps
    .map((s) =>
      inputs
        .filter((n) => s[n] !== undefined)
        .map((n) => `${n}=${s[n]}`)
        .join(' '),
    )
    .join('; ');
}

/**
 * Steps as the sequence check applies them: an input a step leaves out keeps its value, X before its
 * first mention (core/analysis/check.ts). Made explicit so the strips, the sheet and the report agree.
 */
export function heldSteps(inputs: readonly string[], steps: readonly InputVector[]): InputVector[] {
  let held: Record<string, InputValue> = Object.fromEntries(inputs.map((n) => [n, 'X' as InputValue]));
  return steps.map((step) => {
    held = { ...held, ...step };
    return held;
  });
}
