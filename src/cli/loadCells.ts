/**
 * Reads the FILE arguments into cells to check: design files hold one cell, SPICE files one or a
 * library. A file or cell that cannot be used becomes a failure entry; the others still run.
 */
import { readFileSync } from 'node:fs';
import { DesignFileError, parseDesignFile } from '../core/format/designFile.ts';
import type { Sequence } from '../core/model/design.ts';
import type { Netlist } from '../core/model/netlist.ts';
import { DEFAULT_TECHNOLOGY, withVdd, type Technology } from '../core/model/technology.ts';
import { assignPins, PinError } from '../core/netlist-io/pins.ts';
import { importSpice, SpiceImportError } from '../core/netlist-io/spiceImport.ts';
import type { CellChoice } from './args.ts';
import { UsageError } from './usage.ts';

/** One cell, ready to check; plain data so it can cross to a worker thread. */
export interface CellJob {
  readonly file: string;
  readonly cell: string;
  readonly netlist: Netlist;
  readonly technology: Technology;
  readonly expectations: Readonly<Record<string, string>>;
  /** A design file's saved sequences: `--sequence NAME` picks one, and the first drives sequence activity. */
  readonly sequences: readonly Sequence[];
  readonly notes: readonly string[];
}

export interface CellFailure {
  readonly file: string;
  /** Null when the whole file could not be read. */
  readonly cell: string | null;
  readonly message: string;
  readonly line?: number;
  readonly field?: string;
}

export type LoadedCell = { readonly job: CellJob } | { readonly failure: CellFailure };

export interface LoadedCells {
  readonly cells: readonly LoadedCell[];
  /** Report as a list of cells (a library, several files) rather than one cell object. */
  readonly asLibrary: boolean;
}

const SPICE_EXTENSIONS = /\.(sp|spi|spice|cir|net|cdl|ckt)$/i;

export function loadCells(files: readonly string[], choice: CellChoice): LoadedCells {
  const perFile = files.map((f) => readCells(f, choice));
  let cells = perFile.flatMap((r) => r.cells);
  if (choice.cell !== undefined) cells = [pickCell(cells, choice.cell, files)];
  const asLibrary = choice.cell === undefined && (files.length > 1 || perFile.some((r) => r.library));
  const perCellFlags = choice.inputs ?? choice.outputs ?? choice.sequence ?? Object.keys(choice.expect)[0];
  if (perCellFlags !== undefined && cells.length > 1) {
    throw new UsageError('--inputs, --outputs, --expect and --sequence apply to one cell: add --cell NAME');
  }
  return { cells: cells.map((c) => ('job' in c ? applyChoice(c.job, choice) : c)), asLibrary };
}

function readCells(file: string, choice: CellChoice): { cells: LoadedCell[]; library: boolean } {
  let text: string;
  try {
    text = readFileSync(file, 'utf8');
  } catch (e) {
    const reason =
      (e as NodeJS.ErrnoException).code === 'ENOENT' ? 'no such file' : String((e as Error).message);
    return {
      cells: [{ failure: { file, cell: null, message: `${file}: cannot read: ${reason}` } }],
      library: false,
    };
  }
  try {
    return isDesignFile(file, text)
      ? { cells: [designCell(file, text, choice)], library: false }
      : spiceCells(file, text, choice);
  } catch (e) {
    if (e instanceof DesignFileError) return { cells: [{ failure: designFailure(file, e) }], library: false };
    if (e instanceof SpiceImportError) {
      return { cells: [{ failure: { file, cell: null, message: e.message, line: e.line } }], library: false };
    }
    throw e;
  }
}

function isDesignFile(file: string, text: string): boolean {
  if (/\.json$/i.test(file)) return true;
  return !SPICE_EXTENSIONS.test(file) && text.trimStart().startsWith('{');
}

function designFailure(file: string, e: DesignFileError): CellFailure {
  const base = { file, cell: null, message: e.message, field: e.field };
  return e.line === undefined ? base : { ...base, line: e.line };
}

function designCell(file: string, text: string, choice: CellChoice): LoadedCell {
  const design = parseDesignFile(text, file);
  const job: CellJob = {
    file,
    cell: design.netlist.name || design.name,
    netlist: design.netlist,
    technology: choice.vdd === undefined ? design.technology : withVdd(design.technology, choice.vdd),
    expectations: design.expectations,
    sequences: design.sequences,
    notes: [],
  };
  return { job };
}

function spiceCells(
  file: string,
  text: string,
  choice: CellChoice,
): { cells: LoadedCell[]; library: boolean } {
  const imported = importSpice(text, file, { supplyNames: choice.supply, groundNames: choice.ground });
  const technology = choice.vdd === undefined ? DEFAULT_TECHNOLOGY : withVdd(DEFAULT_TECHNOLOGY, choice.vdd);
  const jobs: LoadedCell[] = imported.cells.map((c) => ({
    job: {
      file,
      cell: c.name,
      netlist: c.netlist,
      technology,
      expectations: c.expectations,
      sequences: [],
      notes: [...imported.notes, ...c.notes],
    },
  }));
  const failures: LoadedCell[] = imported.failed.map((f) => ({
    failure: { file, cell: f.name, message: f.error.message, line: f.error.line },
  }));
  // Report cells in the order the file defines them, broken ones included.
  const position = (c: LoadedCell): number => imported.order.indexOf(cellName(c) ?? '');
  const cells = [...jobs, ...failures].sort((a, b) => position(a) - position(b));
  return { cells, library: imported.isLibrary };
}

function cellName(c: LoadedCell): string | null {
  return 'job' in c ? c.job.cell : c.failure.cell;
}

function pickCell(cells: readonly LoadedCell[], name: string, files: readonly string[]): LoadedCell {
  const matches = cells.filter((c) => cellName(c)?.toLowerCase() === name.toLowerCase());
  const [only] = matches;
  if (only !== undefined && matches.length === 1) return only;
  const unreadable = cells.find((c) => 'failure' in c && c.failure.cell === null);
  if (matches.length === 0 && unreadable !== undefined) return unreadable;
  if (matches.length > 1)
    throw new UsageError(`--cell ${name}: more than one cell has that name in ${files.join(', ')}`);
  const known = cells.map(cellName).filter((n): n is string => n !== null);
  throw new UsageError(
    `--cell ${name}: no such cell in ${files.join(', ')} (cells: ${known.join(', ') || 'none'})`,
  );
}

/** Pins and expected functions from the flags, over what the file says. */
function applyChoice(job: CellJob, choice: CellChoice): LoadedCell {
  let netlist: Netlist;
  try {
    netlist = assignPins(job.netlist, {
      ...(choice.inputs === undefined ? {} : { inputs: choice.inputs }),
      ...(choice.outputs === undefined ? {} : { outputs: choice.outputs }),
    });
  } catch (e) {
    if (!(e instanceof PinError)) throw e;
    return {
      failure: {
        file: job.file,
        cell: job.cell,
        message: `--${e.field}: ${e.message}`,
        field: `--${e.field}`,
      },
    };
  }
  const expectations: Record<string, string> = { ...job.expectations };
  for (const [output, text] of Object.entries(choice.expect)) {
    const net = netlist.outputs.find((o) => o.toLowerCase() === output.toLowerCase()) ?? output;
    expectations[net] = text;
  }
  return { job: { ...job, netlist, expectations } };
}
