/**
 * From the text of one file to the cells to check, shared by the app and the command line (which
 * only reads files and applies its flags): design files hold one cell, SPICE files one or a library.
 * A file or cell that cannot be used becomes a failure entry; the others still load.
 */
import { DesignFileError, fieldInFile, readDesignFile } from '../format/designFile.ts';
import type { CellDesign } from '../document/design.ts';
import type { Sequence } from '../model/design.ts';
import { cellDesign } from '../hierarchy/cellDesign.ts';
import { HierarchyError } from '../hierarchy/flatten.ts';
import type { Netlist } from '../model/netlist.ts';
import type { Sheet } from '../sheet/types.ts';
import { DEFAULT_TECHNOLOGY, withVdd, type Technology } from '../model/technology.ts';
import { expressionNames } from '../expect/names.ts';
import { ExpressionError, parseExpression } from '../expect/parse.ts';
import { importSpice, SpiceImportError, type SpiceImportOptions } from './spiceImport.ts';
import { withCellModels, withTechnologyCards } from './spiceDesign.ts';

import { DESIGN_EXTENSIONS, SPICE_EXTENSIONS } from './fileKinds.ts';

/** One cell, ready to check; plain data so it can cross to a worker thread. */
export interface CellJob {
  readonly file: string;
  /** A design file names its fields (`expectations.Y`); a netlist its lines and flags. */
  readonly source: 'design' | 'netlist';
  /** Where a design file holds this cell's expected functions (`cells[2].expectations`). */
  readonly expectationsField?: string;
  readonly cell: string;
  readonly netlist: Netlist;
  readonly technology: Technology;
  readonly expectations: Readonly<Record<string, string>>;
  /** Line of the file each expected function was written on, when it came from the file. */
  readonly expectationLines: Readonly<Record<string, number>>;
  /** True when the file named the pins itself (a directive), so no other source overrides them. */
  readonly pinsNamed: boolean;
  /** A design file's saved sequences. */
  readonly sequences: readonly Sequence[];
  /** The drawing, when the file holds one (a design file, or a Railwise export's comment lines). */
  readonly sheet?: Sheet;
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

/** A cell that is deliberately not checked (a sequential cell under a library's functions). */
export interface CellSkip {
  readonly file: string;
  readonly cell: string;
  readonly reason: string;
}

export type LoadedCell =
  { readonly job: CellJob } | { readonly failure: CellFailure } | { readonly skipped: CellSkip };

export interface FileCells {
  readonly cells: readonly LoadedCell[];
  /** A library: report as a list of cells. */
  readonly library: boolean;
  /** Every cell name the file offers (for `--cell` messages). */
  readonly available: readonly string[];
}

export interface LoadOptions extends SpiceImportOptions {
  /** Supply voltage over the file's own (design files) or the default technology's (netlists). */
  readonly vdd?: number;
}

function technologyOf(base: Technology, vdd: number | undefined): Technology {
  return vdd === undefined ? base : withVdd(base, vdd);
}

export function isSpiceFileName(fileName: string): boolean {
  const lower = fileName.toLowerCase();
  return SPICE_EXTENSIONS.some((ext) => lower.endsWith(ext));
}

/** A design file by extension, or by content when the extension says nothing. */
export function isDesignText(fileName: string, text: string): boolean {
  const lower = fileName.toLowerCase();
  if (DESIGN_EXTENSIONS.some((ext) => lower.endsWith(ext))) return true;
  return !isSpiceFileName(fileName) && text.trimStart().startsWith('{');
}

export function cellsFromText(text: string, fileName: string, options: LoadOptions = {}): FileCells {
  try {
    return isDesignText(fileName, text)
      ? designCells(text, fileName, options)
      : spiceCells(text, fileName, options);
  } catch (e) {
    if (e instanceof DesignFileError) {
      const failure = { file: fileName, cell: null, message: e.message, field: e.field };
      return unreadable(e.line === undefined ? failure : { ...failure, line: e.line });
    }
    if (e instanceof SpiceImportError)
      return unreadable({ file: fileName, cell: null, message: e.message, line: e.line });
    throw e;
  }
}

function unreadable(failure: CellFailure): FileCells {
  return { cells: [{ failure }], library: false, available: [] };
}

/** Every cell of a design file, each flattened; several cells are checked as a library. */
function designCells(text: string, file: string, options: LoadOptions): FileCells {
  const { design, version } = readDesignFile(text, file);
  const available = design.cells.map((c) => c.name);
  const wanted =
    options.cell === undefined
      ? design.cells
      : design.cells.filter((c) => c.name.toLowerCase() === options.cell?.toLowerCase());
  const technology = technologyOf(design.technology, options.vdd);
  const cells = wanted.map((c): LoadedCell => {
    const at = design.cells.indexOf(c);
    let one: CellDesign;
    try {
      one = cellDesign(design, c.name);
    } catch (e) {
      if (!(e instanceof HierarchyError)) throw e;
      const field = fieldInFile(['cells', at, 'instances'], version);
      return { failure: { file, cell: c.name, message: `${file}: ${e.message}`, field } };
    }
    const job: CellJob = {
      file,
      source: 'design',
      expectationsField: fieldInFile(['cells', at, 'expectations'], version),
      cell: c.name,
      netlist: one.netlist,
      technology,
      expectations: one.expectations,
      expectationLines: {},
      pinsNamed: true,
      sequences: one.sequences,
      // The drawing derives the cell's own netlist: the flat one only when it places nothing.
      ...(c.sheet === undefined || c.instances.length > 0 ? {} : { sheet: c.sheet }),
      notes: [],
    };
    return { job };
  });
  return { cells, library: design.cells.length > 1 && options.cell === undefined, available };
}

function spiceCells(text: string, file: string, options: LoadOptions): FileCells {
  const imported = importSpice(text, file, options);
  const base = withTechnologyCards(technologyOf(DEFAULT_TECHNOLOGY, options.vdd), imported);
  const position = new Map(imported.order.map((name, i) => [name, i]));
  const cells: { at: number; cell: LoadedCell }[] = [];
  for (const c of imported.cells) {
    const job: CellJob = {
      file,
      source: 'netlist',
      cell: c.name,
      netlist: c.netlist,
      technology: withCellModels(base, [c]),
      expectations: c.expectations,
      expectationLines: c.expectationLines,
      pinsNamed: c.pinsNamed,
      sequences: [],
      ...(c.sheet === undefined ? {} : { sheet: c.sheet }),
      notes: [...imported.notes, ...c.notes],
    };
    cells.push({ at: position.get(c.name) ?? 0, cell: { job } });
  }
  for (const f of imported.failed) {
    const failure = { file, cell: f.name, message: f.error.message, line: f.error.line };
    cells.push({ at: position.get(f.name) ?? 0, cell: { failure } });
  }
  // Cells in the order the file defines them, broken ones included.
  cells.sort((a, b) => a.at - b.at);
  return { cells: cells.map((c) => c.cell), library: imported.isLibrary, available: imported.available };
}

/**
 * An expected function that cannot be used, located: the file and line of the directive that
 * wrote it (the column is in the message), or the field of the flag. Null when all parse.
 */
export function expectationProblem(job: CellJob): CellFailure | null {
  for (const [output, text] of Object.entries(job.expectations)) {
    const line = job.expectationLines[output];
    const where =
      line === undefined ? `expected function for ${output}` : `${job.file}:${line}: expect ${output}`;
    const field = job.source === 'design' ? `${job.expectationsField ?? 'expectations'}.${output}` : 'expect';
    const base = { file: job.file, cell: job.cell, ...(line === undefined ? { field } : { line }) };
    if (!job.netlist.outputs.includes(output))
      return {
        ...base,
        message: `${where}: '${output}' is not an output (outputs: ${job.netlist.outputs.join(', ') || 'none'})`,
      };
    try {
      parseExpression(text, expressionNames(job.netlist));
    } catch (e) {
      if (e instanceof ExpressionError) return { ...base, message: `${where}: ${e.message}` };
      throw e;
    }
  }
  return null;
}
