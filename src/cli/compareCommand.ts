/**
 * `railwise compare FILE_A FILE_B [--cell-a NAME] [--cell-b NAME]`: proves that two cells with the
 * same pins give the same output levels for every input vector, or names a vector where they differ
 * (replayed in both). Exit status 0 equivalent, 1 not (or undecided), 2 unusable input.
 */
import { CAUTION } from '../core/caution.ts';
import { brief, printable } from '../core/format/printable.ts';
import { ComparisonError, compareCells, type Comparison } from '../core/proof/compare.ts';
import type { CompareArgs } from './compareArgs.ts';
import { makeColour, terminalSafe, type Colour } from './colour.ts';
import { loadOneCell, type CellJob } from './loadCells.ts';
import { vectorText } from './proofText.ts';
import { vectorCountText } from '../core/view/vectorControl.ts';
import { failureOf } from './runCell.ts';
import { EXIT_FINDINGS, EXIT_OK, EXIT_UNUSABLE, UsageError } from './usage.ts';

export interface CompareOutput {
  readonly out: (text: string) => void;
  readonly err: (text: string) => void;
  readonly colour: boolean;
}

export function compareCommand(args: CompareArgs, io: CompareOutput): number {
  const a = loadOneCell(
    args.fileA,
    { ...args.choice, ...(args.cellA === undefined ? {} : { cell: args.cellA }) },
    '--cell-a',
  );
  const b = loadOneCell(
    args.fileB,
    { ...args.choice, ...(args.cellB === undefined ? {} : { cell: args.cellB }) },
    '--cell-b',
  );
  if ('problem' in a) return unusable(io, args, a.problem);
  if ('problem' in b) return unusable(io, args, b.problem);
  const [ja, jb] = [a.job, b.job];
  let result: Comparison;
  const started = performance.now();
  try {
    result = compareCells(ja, jb);
  } catch (e) {
    if (e instanceof ComparisonError) return unusable(io, args, `${ja.cell} and ${jb.cell}: ${e.message}`);
    throw new UsageError(failureOf(e).message);
  }
  const seconds = Math.round(performance.now() - started) / 1000;
  if (args.json) io.out(JSON.stringify(comparisonJson(result, ja, jb, seconds), null, 2));
  else io.out(terminalSafe(comparisonText(result, ja, jb, seconds, makeColour(io.colour)), io.colour));
  return result.equivalent === true ? EXIT_OK : EXIT_FINDINGS;
}

function unusable(io: CompareOutput, args: CompareArgs, message: string): number {
  io.err(`railwise: ${brief(message, 4000)}`);
  if (args.json) io.out(JSON.stringify({ error: { message: brief(message, 2000) } }, null, 2));
  return EXIT_UNUSABLE;
}

function comparisonJson(r: Comparison, a: CellJob, b: CellJob, seconds: number): object {
  return {
    equivalent: r.equivalent,
    vector: r.vector ?? null,
    outputs: r.outputs ?? null,
    ...(r.reason === undefined ? {} : { reason: brief(r.reason, 2000) }),
    seconds,
    cells: { a: { cell: a.cell, file: a.file }, b: { cell: b.cell, file: b.file } },
    caution: CAUTION,
  };
}

function comparisonText(r: Comparison, a: CellJob, b: CellJob, seconds: number, c: Colour): string {
  const name = (job: CellJob): string =>
    `${c.bold(printable(job.cell))} ${c.dim(`(${printable(job.file)})`)}`;
  const lines = [`${name(a)} against ${name(b)}`];
  const vectors = `${vectorCountText(a.netlist.inputs.length)} vectors`;
  if (r.equivalent === true)
    lines.push(
      `  ${c.bold('equivalent')}: every output has the same level for all ${vectors} (${seconds.toFixed(2)} s)`,
    );
  else if (r.equivalent === null) lines.push(`  ${c.warning('unknown')}: ${brief(r.reason ?? '')}`);
  else {
    lines.push(`  ${c.error('DIFFER')} at ${vectorText(r.vector ?? {})} (${seconds.toFixed(2)} s)`);
    for (const o of a.netlist.outputs) {
      const [la, lb] = [r.outputs?.a[o], r.outputs?.b[o]];
      if (la !== lb)
        lines.push(`    ${printable(o)}: ${la} in ${printable(a.cell)}, ${lb} in ${printable(b.cell)}`);
    }
  }
  lines.push(c.dim(CAUTION));
  return lines.join('\n');
}
