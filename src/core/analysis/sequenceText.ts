/**
 * The text form of a sequence, one parser for the command line (`--sequence`) and the step editor.
 * The rules are in docs/semantics.md §5:
 *
 *   - steps are separated by `;` or by line breaks: `A=0 B=1; A=1` and the same on two lines;
 *   - a step lists `NAME=VALUE` assignments separated by spaces or commas (`A=0, B=1`), VALUE one of
 *     0 1 X Z (either case); an input a step leaves out keeps its value from the step before;
 *   - `-` alone is a step that changes nothing (a clock cycle with every input held);
 *   - blank lines and a `;` at the end of a line are ignored, but `;` must end a step: `A=0;; A=1`
 *     is refused, since the second `;` ends a step with nothing in it.
 *
 * Bad text throws a SequenceTextError naming the line and column of the problem.
 */
import type { InputValue, InputVector } from '../model/design.ts';
import { nameRecord } from '../model/records.ts';
import { SequenceError } from './pass.ts';

/** How the format is shown next to a step field and in the command's help. */
export const SEQUENCE_FORMAT_HINT =
  'One step per line or separated by ";", each NAME=VALUE with VALUE 0, 1, X or Z (e.g. "A=0 B=1; A=1"); ' +
  'inputs left out keep their value; "-" is a step that changes nothing.';

/** The step that changes nothing, as written. */
export const HOLD_STEP = '-';

export class SequenceTextError extends SequenceError {
  override readonly name = 'SequenceTextError';
  /** 1-based line and column of the problem. */
  readonly line: number;
  readonly column: number;

  constructor(
    problem: string,
    /** 0-based character offset of the problem in the text. */
    readonly position: number,
    text: string,
  ) {
    const before = text.slice(0, position).split(/\r\n|\r|\n/);
    const line = before.length;
    const column = (before[before.length - 1]?.length ?? 0) + 1;
    super(`${line > 1 || /[\r\n]/.test(text) ? `line ${line}, ` : ''}column ${column}: ${problem}`);
    this.line = line;
    this.column = column;
  }
}

const VALUES: ReadonlySet<string> = new Set(['0', '1', 'X', 'Z']);

/** One step's text, with where it starts in the whole text. */
interface StepSource {
  readonly text: string;
  readonly start: number;
  /** The `;` that ended it, or -1 for a line break or the end of the text. */
  readonly semicolon: number;
}

function splitSteps(text: string): StepSource[] {
  const steps: StepSource[] = [];
  for (const m of text.matchAll(/([^;\r\n]*)(;|\r\n|\r|\n|$)/g)) {
    const start = m.index ?? 0;
    steps.push({ text: m[1] ?? '', start, semicolon: m[2] === ';' ? start + (m[1]?.length ?? 0) : -1 });
    if (m[0] === '') break;
  }
  return steps;
}

function parseStep(source: StepSource, inputs: ReadonlySet<string>, text: string): InputVector | null {
  const tokens = [...source.text.matchAll(/[^\s,]+/g)];
  const fail = (problem: string, at: number): never => {
    throw new SequenceTextError(problem, source.start + at, text);
  };
  if (tokens.length === 0) {
    if (source.semicolon >= 0 && source.text.trim() === '' && endsNothing(text, source))
      fail(`empty step: write ${HOLD_STEP} for a step that changes nothing`, source.text.length);
    return null;
  }
  if (tokens.length === 1 && tokens[0]?.[0] === HOLD_STEP) return {};
  const step = nameRecord<InputValue>(); // an input may be called __proto__
  for (const token of tokens) {
    const at = token.index ?? 0;
    const [name = '', value, extra] = token[0].split('=');
    if (value === undefined || extra !== undefined || name === '')
      fail(`expected NAME=VALUE, found "${token[0]}"`, at);
    if (!inputs.has(name)) fail(`"${name}" is not an input`, at);
    if (name in step) fail(`${name} is set twice in one step`, at);
    const upper = (value ?? '').toUpperCase();
    if (!VALUES.has(upper)) fail(`the value of ${name} must be 0, 1, X or Z`, at + name.length + 1);
    step[name] = upper as InputValue;
  }
  return step;
}

/** A `;` with nothing before it since the previous `;` on the same line ends an empty step. */
function endsNothing(text: string, source: StepSource): boolean {
  return source.start > 0 && text[source.start - 1] === ';';
}

/**
 * Reads steps as the design stores them: each lists only what it changes. Names are checked against
 * the inputs. See heldSteps for the values in force at each step.
 */
export function parseSequenceText(text: string, inputs: readonly string[]): InputVector[] {
  const known = new Set(inputs);
  const steps: InputVector[] = [];
  for (const source of splitSteps(text)) {
    const step = parseStep(source, known, text);
    if (step !== null) steps.push(step);
  }
  return steps;
}

/** The text form of steps, one per line, each step's own assignments in input order. */
export function formatSequenceText(steps: readonly InputVector[], inputs: readonly string[]): string {
  return steps
    .map((s) => {
      const set = inputs.filter((n) => s[n] !== undefined).map((n) => `${n}=${s[n]}`);
      return set.length === 0 ? HOLD_STEP : set.join(' ');
    })
    .join('\n');
}

/**
 * Steps as a sequence check applies them: an input a step leaves out keeps its value, X before its
 * first mention. Made explicit so the strips, the sheet and the report agree.
 */
export function heldSteps(inputs: readonly string[], steps: readonly InputVector[]): InputVector[] {
  let held: Record<string, InputValue> = Object.fromEntries(inputs.map((n) => [n, 'X' as InputValue]));
  return steps.map((step) => {
    held = { ...held, ...step };
    return held;
  });
}
