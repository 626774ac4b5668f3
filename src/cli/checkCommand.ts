/**
 * `railwise check`: load the cells, run them (in worker threads when that pays), print the human
 * report or JSON, and return the exit status: 0 clean, 1 error findings, 2 something unusable.
 *
 * Output goes out cell by cell, and a big sweep row by row: a cell of more than STREAM_ROWS vectors
 * runs on this thread while it is written (streamCell.ts), its rows never held together and its
 * findings spooled (findingSpool.ts), so memory stays bounded whatever the sweep. The JSON is one
 * document in every case (jsonWriter.ts).
 */
import { CAUTION } from '../core/caution.ts';
import type { Summary, SweepColumns } from '../core/analysis/report.ts';
import { brief, printable } from '../core/text/printable.ts';
import { DEFAULT_POWER_SETTINGS } from '../core/power/settings.ts';
import type { CheckArgs } from './args.ts';
import { makeColour, terminalSafe, type Colour } from './colour.ts';
import { FindingSpool } from './findingSpool.ts';
import { sweepFindings } from '../core/analysis/sweepColumns.ts';
import { Indented, Later, Stream, writeJson } from './jsonWriter.ts';
import { proved, type ProofJson } from './proofCell.ts';
import { loadCells, type CellFailure, type CellJob, type CellSkip } from './loadCells.ts';
import { runCells } from './parallel.ts';
import type { CellJson, CellResult, RunOptions } from './runCell.ts';
import { SweepRowText } from './rowText.ts';
import { isStreamed, prepareStreamedCell, type CellTail } from './streamCell.ts';
import { count, formatCell, formatFailure, formatSkipped, TextDigest } from './textReport.ts';
import { EXIT_FINDINGS, EXIT_OK, EXIT_UNUSABLE, UsageError } from './usage.ts';

export interface Output {
  readonly out: (text: string) => void;
  readonly colour: boolean;
}

/** A cell already checked (or refused, or skipped), or one to run while it is written. */
type CellSource = { readonly result: CellResult } | { readonly job: CellJob };

/** What the closing totals and the exit status need of each cell. */
type Outcome =
  | { readonly cell: string; readonly summary: Summary; readonly proof?: ProofJson | undefined }
  | { readonly failure: CellFailure }
  | { readonly skipped: CellSkip };

export async function checkCommand(args: CheckArgs, io: Output): Promise<number> {
  const loaded = loadCells(args.files, args);
  if (args.transfer !== undefined && loaded.cells.length > 1)
    throw new UsageError('--transfer applies to one cell: add --cell NAME');
  const options: RunOptions = {
    allNets: args.allNets,
    undriven: args.undriven,
    sizing: args.sizing,
    found: args.found,
    load: args.load ?? DEFAULT_POWER_SETTINGS.load,
    dc: args.dc,
    prove: args.prove,
    ...(args.maxInputs === undefined ? {} : { maxInputs: args.maxInputs }),
    ...(args.transfer === undefined ? {} : { transfer: args.transfer }),
    ...(args.sequence === undefined ? {} : { sequence: args.sequence }),
    ...(args.power === undefined ? {} : { power: args.power }),
  };
  const collected = loaded.cells.flatMap((c) => ('job' in c && !isStreamed(c.job, options) ? [c.job] : []));
  const results = await runCells(collected, options, args.jobs);
  const ran = new Map(collected.map((job, i) => [job, results[i] as CellResult]));
  // Cells stay in file order: failures at load time and streamed cells sit where their cell would.
  const cells = loaded.cells.map((c): CellSource => {
    if (!('job' in c)) return { result: c };
    const result = ran.get(c.job);
    return result === undefined ? { job: c.job } : { result };
  });
  const outcomes: Outcome[] = [];
  const run = { cells, options, outcomes, notes: loaded.notes, asLibrary: loaded.asLibrary };
  if (args.json) writeJson(jsonDocument(run), io.out);
  else textReport(run, io);
  return Math.max(EXIT_OK, ...outcomes.map(exitOf));
}

interface Run {
  readonly cells: readonly CellSource[];
  readonly options: RunOptions;
  readonly outcomes: Outcome[];
  readonly notes: readonly string[];
  readonly asLibrary: boolean;
}

function exitOf(o: Outcome): number {
  if ('failure' in o) return EXIT_UNUSABLE;
  if ('skipped' in o) return EXIT_OK;
  return o.summary.errors > 0 || unproved(o) ? EXIT_FINDINGS : EXIT_OK;
}

/** A cell with a proof some property of which does not hold (a counterexample, or undecided). */
function unproved(o: Outcome): boolean {
  return 'summary' in o && o.proof !== undefined && !proved(o.proof);
}

function failureJson(f: CellFailure): object {
  return {
    cell: f.cell,
    file: f.file,
    error: {
      message: brief(f.message, 2000),
      ...(f.line === undefined ? {} : { line: f.line }),
      ...(f.field === undefined ? {} : { field: f.field }),
    },
  };
}

function jsonDocument(run: Run): unknown {
  if (!run.asLibrary) {
    const [only] = run.cells;
    return only === undefined ? { error: { message: 'no cells found' } } : cellValue(only, run);
  }
  return {
    cells: new Stream<unknown>((emit) => run.cells.forEach((c) => emit(cellValue(c, run)))),
    summary: new Later(() => librarySummary(run.outcomes)),
    ...(run.notes.length > 0 ? { notes: run.notes } : {}),
    caution: CAUTION,
  };
}

/** One cell's JSON: as collected, or written while its rows are solved. */
function cellValue(source: CellSource, run: Run): unknown {
  if ('result' in source) {
    const r = source.result;
    if ('failure' in r) return (run.outcomes.push(r), failureJson(r.failure));
    if ('skipped' in r)
      return (
        run.outcomes.push(r),
        { cell: r.skipped.cell, file: r.skipped.file, skipped: r.skipped.reason }
      );
    run.outcomes.push({ cell: r.json.cell, summary: r.json.summary, proof: r.json.proof });
    return printedCell(r.json);
  }
  const prepared = prepareStreamedCell(source.job, run.options);
  if ('failure' in prepared) return (run.outcomes.push(prepared), failureJson(prepared.failure));
  const { sizing, transfer, proof, technology, ...names } = prepared.head;
  const spool = new FindingSpool();
  let tail: CellTail | null = null;
  const done = (): CellTail =>
    tail ?? { structural: [], summary: { vectors: 0, errors: 0, warnings: 0 }, notes: [] };
  let text: SweepRowText | null = null;
  return {
    ...names,
    vectors: new Stream<Indented>((emit) => {
      tail = prepared.rows((block) => {
        text ??= new SweepRowText(block);
        for (const f of sweepFindings(block)) spool.add(f);
        for (let i = 0; i < block.count; i++) emit(rowJson(text, block, i));
      });
      run.outcomes.push({ cell: names.cell, summary: tail.summary, proof });
    }),
    findings: new Stream<unknown>((emit) => {
      done().structural.forEach(emit);
      spool.replay(emit);
    }),
    summary: new Later(() => done().summary),
    notes: new Later(() => done().notes),
    technology,
    power: run.options.power === undefined ? undefined : new Later(() => done().power),
    sizing,
    transfer,
    proof,
    caution: CAUTION,
  };
}

function rowJson(text: SweepRowText, block: SweepColumns, i: number): Indented {
  return new Indented((indent) => text.text(block, i, indent));
}

/** A collected cell as printed: a sweep's columns become its `vectors`, written row by row. */
export function printedCell(json: CellJson): object {
  const { sweep } = json;
  if (sweep === undefined) return json;
  const text = new SweepRowText(sweep);
  const vectors = new Stream<Indented>((emit) => {
    for (let i = 0; i < sweep.count; i++) emit(rowJson(text, sweep, i));
  });
  // The same keys in the same order, `sweep` printed in its place as `vectors`.
  return Object.fromEntries(
    Object.entries(json).map(([k, v]) => (k === 'sweep' ? ['vectors', vectors] : [k, v])),
  );
}

function textReport(run: Run, io: Output): void {
  const c = makeColour(io.colour);
  const say = (text: string): void => io.out(terminalSafe(text, io.colour));
  for (const source of run.cells) say(`${cellText(source, run, c)}\n`);
  for (const n of run.notes) say(`${c.dim(`note: ${brief(n)}`)}\n`);
  if (run.asLibrary) say(`${libraryTotals(run.outcomes)}\n`);
  say(c.dim(CAUTION));
}

function cellText(source: CellSource, run: Run, c: Colour): string {
  if ('result' in source) {
    const r = source.result;
    if ('failure' in r) return (run.outcomes.push(r), formatFailure(r.failure, c));
    if ('skipped' in r) return (run.outcomes.push(r), formatSkipped(r.skipped, c));
    run.outcomes.push({ cell: r.json.cell, summary: r.json.summary, proof: r.json.proof });
    return formatCell(TextDigest.of(r.json), c);
  }
  const prepared = prepareStreamedCell(source.job, run.options);
  if ('failure' in prepared) return (run.outcomes.push(prepared), formatFailure(prepared.failure, c));
  const digest = new TextDigest();
  const tail = prepared.rows((block) => digest.addBlock(block));
  run.outcomes.push({ cell: prepared.head.cell, summary: tail.summary, proof: prepared.head.proof });
  return formatCell(digest.view(prepared.head, tail), c);
}

export function librarySummary(outcomes: readonly Outcome[]): Record<string, number> {
  const checked = outcomes.flatMap((o) => ('summary' in o ? [o.summary] : []));
  const skipped = outcomes.filter((o) => 'skipped' in o).length;
  const proofs = outcomes.some((o) => 'summary' in o && o.proof !== undefined);
  return {
    cells: outcomes.length,
    passed: checked.filter((s) => s.errors === 0).length,
    failed: checked.filter((s) => s.errors > 0).length,
    unusable: outcomes.length - checked.length - skipped,
    ...(skipped > 0 ? { skipped } : {}),
    ...(proofs ? { unproved: outcomes.filter(unproved).length } : {}),
    errors: sum(checked.map((s) => s.errors)),
    warnings: sum(checked.map((s) => s.warnings)),
  };
}

/** The closing lines a CI log is read by: counts, then which cells need attention. */
function libraryTotals(outcomes: readonly Outcome[]): string {
  const s = librarySummary(outcomes);
  const failing = outcomes.flatMap((o) => ('summary' in o && o.summary.errors > 0 ? [o.cell] : []));
  const unusable = outcomes.flatMap((o) => ('failure' in o ? [o.failure.cell ?? o.failure.file] : []));
  const notProved = outcomes.flatMap((o) => ('summary' in o && unproved(o) ? [o.cell] : []));
  const list = (names: readonly string[]): string => names.map(printable).join(', ');
  return [
    `${count(s['cells'] ?? 0, 'cell')}: ${s['passed']} pass, ${s['failed']} with errors, ${s['unusable']} unusable${s['skipped'] ? `, ${s['skipped']} skipped` : ''}; ${count(s['errors'] ?? 0, 'error')}, ${count(s['warnings'] ?? 0, 'warning')}`,
    ...(failing.length > 0 ? [`  with errors: ${list(failing)}`] : []),
    ...(unusable.length > 0 ? [`  unusable: ${list(unusable)}`] : []),
    ...(notProved.length > 0 ? [`  not proved: ${list(notProved)}`] : []),
  ].join('\n');
}

function sum(values: readonly number[]): number {
  return values.reduce((a, b) => a + (b ?? 0), 0);
}
