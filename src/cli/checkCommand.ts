/**
 * `railwise check`: load the cells, run them (in worker threads when that pays), print the human
 * report or JSON, and return the exit status: 0 clean, 1 error findings, 2 something unusable.
 */
import { DEFAULT_POWER_SETTINGS } from '../core/power/settings.ts';
import type { CheckArgs } from './args.ts';
import { makeColour } from './colour.ts';
import { loadCells, type CellFailure, type CellSkip } from './loadCells.ts';
import { runCells } from './parallel.ts';
import type { CellJson, CellResult, RunOptions } from './runCell.ts';
import { CAUTION } from '../core/caution.ts';
import { count, formatCell, formatFailure, formatSkipped } from './textReport.ts';
import { EXIT_FINDINGS, EXIT_OK, EXIT_UNUSABLE, UsageError } from './usage.ts';

export interface Output {
  readonly out: (text: string) => void;
  readonly colour: boolean;
}

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
    ...(args.transfer === undefined ? {} : { transfer: args.transfer }),
    ...(args.sequence === undefined ? {} : { sequence: args.sequence }),
    ...(args.power === undefined ? {} : { power: args.power }),
  };
  const jobs = loaded.cells.flatMap((c) => ('job' in c ? [c.job] : []));
  const ran = await runCells(jobs, options, args.jobs);
  // Keep the cells in file order: failures at load time sit where their cell would.
  let next = 0;
  const results: CellResult[] = loaded.cells.map((c) => ('job' in c ? (ran[next++] as CellResult) : c));
  const status = Math.max(EXIT_OK, ...results.map(exitOf));
  if (args.json)
    io.out(
      JSON.stringify(loaded.asLibrary ? libraryJson(results, loaded.notes) : singleJson(results), null, 2),
    );
  else io.out(humanReport(results, loaded.asLibrary, loaded.notes, makeColour(io.colour)));
  return status;
}

function exitOf(r: CellResult): number {
  if ('failure' in r) return EXIT_UNUSABLE;
  if ('skipped' in r) return EXIT_OK;
  return r.json.summary.errors > 0 ? EXIT_FINDINGS : EXIT_OK;
}

function skippedJson(s: CellSkip): object {
  return { cell: s.cell, file: s.file, skipped: s.reason };
}

function resultJson(r: CellResult): object {
  return 'json' in r ? r.json : 'failure' in r ? failureJson(r.failure) : skippedJson(r.skipped);
}

function failureJson(f: CellFailure): object {
  return {
    cell: f.cell,
    file: f.file,
    error: {
      message: f.message,
      ...(f.line === undefined ? {} : { line: f.line }),
      ...(f.field === undefined ? {} : { field: f.field }),
    },
  };
}

function singleJson(results: readonly CellResult[]): object {
  const [only] = results;
  if (only === undefined) return { error: { message: 'no cells found' } };
  return resultJson(only);
}

export function librarySummary(results: readonly CellResult[]): Record<string, number> {
  const checked = results.flatMap((r) => ('json' in r ? [r.json] : []));
  const skipped = results.filter((r) => 'skipped' in r).length;
  return {
    cells: results.length,
    passed: checked.filter((j) => j.summary.errors === 0).length,
    failed: checked.filter((j) => j.summary.errors > 0).length,
    unusable: results.length - checked.length - skipped,
    ...(skipped > 0 ? { skipped } : {}),
    errors: sum(checked.map((j) => j.summary.errors)),
    warnings: sum(checked.map((j) => j.summary.warnings)),
  };
}

function libraryJson(results: readonly CellResult[], notes: readonly string[]): object {
  const cells = results.map(resultJson);
  return {
    cells,
    summary: librarySummary(results),
    ...(notes.length > 0 ? { notes } : {}),
    caution: CAUTION,
  };
}

function humanReport(
  results: readonly CellResult[],
  asLibrary: boolean,
  notes: readonly string[],
  c: ReturnType<typeof makeColour>,
): string {
  const blocks = results.map((r) =>
    'json' in r
      ? formatCell(r.json as CellJson, c)
      : 'failure' in r
        ? formatFailure(r.failure, c)
        : formatSkipped(r.skipped, c),
  );
  const s = librarySummary(results);
  const total = asLibrary ? [libraryTotals(results, s)] : [];
  const runNotes = notes.map((n) => c.dim(`note: ${n}`));
  return [...blocks, ...runNotes, ...total, c.dim(CAUTION)].join('\n\n');
}

/** The closing lines a CI log is read by: counts, then which cells need attention. */
function libraryTotals(results: readonly CellResult[], s: Record<string, number>): string {
  const failing = results.flatMap((r) => ('json' in r && r.json.summary.errors > 0 ? [r.json.cell] : []));
  const unusable = results.flatMap((r) => ('failure' in r ? [r.failure.cell ?? r.failure.file] : []));
  return [
    `${count(s['cells'] ?? 0, 'cell')}: ${s['passed']} pass, ${s['failed']} with errors, ${s['unusable']} unusable${s['skipped'] ? `, ${s['skipped']} skipped` : ''}; ${count(s['errors'] ?? 0, 'error')}, ${count(s['warnings'] ?? 0, 'warning')}`,
    ...(failing.length > 0 ? [`  with errors: ${failing.join(', ')}`] : []),
    ...(unusable.length > 0 ? [`  unusable: ${unusable.join(', ')}`] : []),
  ].join('\n');
}

function sum(values: readonly number[]): number {
  return values.reduce((a, b) => a + (b ?? 0), 0);
}
