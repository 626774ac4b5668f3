/**
 * Reads the FILE arguments into cells to check (the core's `cellsFromText` does the reading) and
 * applies the flags: `--cell`, pins, expected functions and a library's published functions. A
 * file or cell that cannot be used becomes a failure entry; the others still run.
 */
import { readFileSync } from 'node:fs';
import type { Netlist } from '../core/model/netlist.ts';
import { recordOf } from '../core/model/records.ts';
import { assignPins, PinError, withInputsReadByExpectations } from '../core/netlist-io/pins.ts';
import {
  cellsFromText,
  expectationProblem,
  type CellJob,
  type FileCells,
  type LoadedCell,
  type LoadOptions,
} from '../core/netlist-io/cellFiles.ts';
import type { CellChoice } from './args.ts';
import { binaryRefusal } from '../core/format/binaryText.ts';
import { UsageError } from './usage.ts';
import { libraryFunctions, type FunctionSource } from './functionsFrom.ts';

export type { CellFailure, CellJob, CellSkip, LoadedCell } from '../core/netlist-io/cellFiles.ts';

export interface LoadedCells {
  readonly cells: readonly LoadedCell[];
  /** Report as a list of cells (a library, several files) rather than one cell object. */
  readonly asLibrary: boolean;
  /** Notes about the run as a whole (cells a function library names that no file holds). */
  readonly notes: readonly string[];
}

export function loadCells(files: readonly string[], choice: CellChoice): LoadedCells {
  const functions: FunctionSource | null =
    choice.functionsFrom === undefined ? null : libraryFunctions(choice.functionsFrom);
  const options = loadOptions(choice, functions);
  const perFile = files.map((f) => readCells(f, options));
  let cells = perFile.flatMap((r) => r.cells);
  if (choice.cell !== undefined) cells = [pickCell(cells, perFile, choice.cell, files)];
  const asLibrary = choice.cell === undefined && (files.length > 1 || perFile.some((r) => r.library));
  const perCellFlags = choice.inputs ?? choice.outputs ?? choice.sequence ?? Object.keys(choice.expect)[0];
  if (perCellFlags !== undefined && cells.length > 1) {
    throw new UsageError('--inputs, --outputs, --expect and --sequence apply to one cell: add --cell NAME');
  }
  const notes: string[] = [];
  if (functions !== null) cells = functions.apply(cells, notes, choice.cell === undefined);
  return { cells: cells.map((c) => ('job' in c ? applyChoice(c.job, choice) : c)), asLibrary, notes };
}

/**
 * The one cell of a file for commands that take a single cell (export, compare): a library needs
 * `flag` NAME. A cell that cannot be used comes back as its problem.
 */
export function loadOneCell(
  file: string,
  choice: CellChoice,
  flag = '--cell',
): { job: CellJob } | { problem: string } {
  const loaded = loadCells([file], choice);
  if (loaded.cells.length > 1) {
    const names = loaded.cells.map(cellName).join(', ');
    throw new UsageError(`${file} is a library: pick one cell with ${flag} NAME (cells: ${names})`);
  }
  const [cell] = loaded.cells;
  if (cell === undefined) throw new UsageError(`${file}: no cell found`);
  if ('failure' in cell) return { problem: cell.failure.message };
  if ('skipped' in cell) return { problem: `${cell.skipped.cell}: ${cell.skipped.reason}` };
  return { job: cell.job };
}

function loadOptions(choice: CellChoice, functions: FunctionSource | null): LoadOptions {
  return {
    supplyNames: [...choice.supply, ...(functions?.supplyNames ?? [])],
    groundNames: [...choice.ground, ...(functions?.groundNames ?? [])],
    standIns: choice.treatAs,
    topOnly: choice.topOnly,
    ...(choice.vdd === undefined ? {} : { vdd: choice.vdd }),
    ...(choice.scale === undefined ? {} : { scale: choice.scale }),
    ...(choice.cell === undefined ? {} : { cell: choice.cell }),
  };
}

function readCells(file: string, options: LoadOptions): FileCells {
  let text: string;
  try {
    text = readFileSync(file, 'utf8');
  } catch (e) {
    const reason =
      (e as NodeJS.ErrnoException).code === 'ENOENT' ? 'no such file' : String((e as Error).message);
    return {
      cells: [{ failure: { file, cell: null, message: `${file}: cannot read: ${reason}` } }],
      library: false,
      available: [],
    };
  }
  const binary = binaryRefusal(file, text);
  if (binary !== null)
    return {
      cells: [{ failure: { file, cell: null, message: binary, line: 1 } }],
      library: false,
      available: [],
    };
  return cellsFromText(text, file, options);
}

function cellName(c: LoadedCell): string | null {
  return 'job' in c ? c.job.cell : 'failure' in c ? c.failure.cell : c.skipped.cell;
}

function pickCell(
  cells: readonly LoadedCell[],
  perFile: readonly FileCells[],
  name: string,
  files: readonly string[],
): LoadedCell {
  const matches = cells.filter((c) => cellName(c)?.toLowerCase() === name.toLowerCase());
  const [only] = matches;
  if (only !== undefined && matches.length === 1) return only;
  const unreadable = cells.find((c) => 'failure' in c && c.failure.cell === null);
  if (matches.length === 0 && unreadable !== undefined) return unreadable;
  if (matches.length > 1)
    throw new UsageError(`--cell ${name}: more than one cell has that name in ${files.join(', ')}`);
  const known = perFile.flatMap((f) => f.available);
  throw new UsageError(
    `--cell ${name}: no such cell in ${files.join(', ')} (cells: ${known.join(', ') || 'none'})`,
  );
}

/**
 * Pins and expected functions from the flags, over what the file says; then every one checked.
 * When neither the flags nor the file name pins, a port the expected functions read but do not
 * describe is an input (`withInputsReadByExpectations`).
 */
function applyChoice(job: CellJob, choice: CellChoice): LoadedCell {
  let netlist: Netlist;
  const pinsGiven = choice.inputs !== undefined || choice.outputs !== undefined;
  try {
    netlist = assignPins(job.netlist, {
      ...(choice.inputs === undefined ? {} : { inputs: choice.inputs }),
      ...(choice.outputs === undefined ? {} : { outputs: choice.outputs }),
    });
    if (!pinsGiven && !job.pinsNamed)
      netlist = withInputsReadByExpectations(netlist, { ...job.expectations, ...choice.expect });
  } catch (e) {
    if (!(e instanceof PinError)) throw e;
    const failure = {
      file: job.file,
      cell: job.cell,
      message: `--${e.field}: ${e.message}`,
      field: `--${e.field}`,
    };
    return { failure };
  }
  const expectations = recordOf(Object.entries(job.expectations));
  const expectationLines = recordOf(Object.entries(job.expectationLines));
  for (const [output, text] of Object.entries(choice.expect)) {
    const net = netlist.outputs.find((o) => o.toLowerCase() === output.toLowerCase()) ?? output;
    expectations[net] = text;
    delete expectationLines[net];
  }
  const ready = { ...job, netlist, expectations, expectationLines };
  const problem = expectationProblem(ready);
  return problem === null ? { job: ready } : { failure: problem };
}
