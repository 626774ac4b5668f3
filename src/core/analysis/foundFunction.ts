/**
 * The function a cell computes, read off its sweep (docs/semantics.md §4, found functions): per
 * output, a minimal sum of products in the expected-function syntax, so a cell with no expected
 * function explains itself and the text can be adopted as its expected function. An output that is
 * Z for some vectors reads `DRIVE ? (F) : Z`; one that is X for some vectors has no Boolean function,
 * and says how many vectors were undecided (a checker never passes what it could not decide).
 */
import type { CheckReport } from './report.ts';
import { reportRow, reportRowCount } from '../analysis/sweepColumns.ts';
import { coverText, minimalCover, MAX_MINIMISE_VARIABLES, type Cover } from '../logic/minimise.ts';

export interface FoundFunction {
  readonly output: string;
  /** The function in §4 syntax, or null when it is not a function of the inputs (X, or too many inputs). */
  readonly expression: string | null;
  /** Vectors whose output was X (undecided); the expression then covers only the others. */
  readonly undecided: number;
  /** False when the minimiser could not prove its cover minimal (still a correct cover). */
  readonly minimal: boolean;
  /** Why there is no expression, in words. */
  readonly note?: string;
}

interface Sets {
  readonly ones: number[];
  readonly zeros: number[];
  readonly highZ: number[];
  readonly unknown: number[];
}

function minterm(inputs: readonly string[], values: Readonly<Record<string, string>>): number | null {
  let m = 0;
  for (const name of inputs) {
    const v = values[name];
    if (v !== '0' && v !== '1') return null;
    m = (m << 1) | (v === '1' ? 1 : 0);
  }
  return m;
}

function sets(report: CheckReport, output: string): Sets {
  const s: Sets = { ones: [], zeros: [], highZ: [], unknown: [] };
  const count = reportRowCount(report);
  for (let i = 0; i < count; i++) {
    const row = reportRow(report, i);
    const m = minterm(report.inputs, row.inputs);
    if (m === null) continue; // vectors with an undriven input say nothing of the function
    const level = row.outputs[output];
    (level === '1' ? s.ones : level === '0' ? s.zeros : level === 'Z' ? s.highZ : s.unknown).push(m);
  }
  return s;
}

/** The found function of every output of a sweep report. */
export function foundFunctions(report: CheckReport): FoundFunction[] {
  return report.outputs.map((output) => foundFunction(report, output));
}

export function foundFunction(report: CheckReport, output: string): FoundFunction {
  const n = report.inputs.length;
  const s = sets(report, output);
  const undecided = s.unknown.length;
  if (n > MAX_MINIMISE_VARIABLES)
    return { output, expression: null, undecided, minimal: false, note: `${n} inputs: too many to minimise` };
  if (s.ones.length + s.zeros.length === 0)
    return {
      output,
      expression: s.highZ.length > 0 && undecided === 0 ? 'Z' : null,
      undecided,
      minimal: true,
    };
  const text = (cover: Cover): string => coverText(cover.cubes, report.inputs);
  // X and Z vectors are free for the driven value; Z vectors then get their own condition.
  const value = minimalCover(n, s.ones, [...s.highZ, ...s.unknown]);
  if (s.highZ.length === 0) return { output, expression: text(value), undecided, minimal: value.exact };
  const drive = minimalCover(n, [...s.ones, ...s.zeros], s.unknown);
  return {
    output,
    expression: `(${text(drive)}) ? (${text(value)}) : Z`,
    undecided,
    minimal: value.exact && drive.exact,
  };
}

/** `Y = !A | !B`, with the undecided vectors named: what the CLI and the library view print. */
export function foundFunctionText(f: FoundFunction): string {
  const body = f.expression ?? f.note ?? 'no function';
  const x = f.undecided === 0 ? '' : ` (X for ${f.undecided} vector${f.undecided === 1 ? '' : 's'})`;
  const approx = f.minimal || f.expression === null ? '' : ' (a cover, not proven minimal)';
  return `${f.output} = ${body}${x}${approx}`;
}
