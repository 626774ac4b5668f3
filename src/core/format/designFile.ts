/**
 * Reading and writing Railwise design files: JSON text → migrated → validated → Design, and back.
 * Text in, text out: the caller (browser or command line) reads and writes the bytes.
 */
import type { z } from 'zod';
import type { Cell, Design } from '../document/design.ts';
import {
  CURRENT_DESIGN_VERSION,
  documentVersion,
  migrateToCurrent,
  pathInVersion,
  type RawDocument,
} from './migrations.ts';
import { DESIGN_FORMAT_TAG } from './schema.ts';
import { designFileV2Schema, type DesignFileV2 } from './cellsSchema.ts';
import { designSizer } from '../hierarchy/flatten.ts';
import { printable } from '../text/printable.ts';

export { CURRENT_DESIGN_VERSION } from './migrations.ts';

/** A design file that cannot be used. `field` is the path of the offending value ('' for the whole file). */
export class DesignFileError extends Error {
  override readonly name = 'DesignFileError';
  constructor(
    readonly file: string,
    readonly field: string,
    detail: string,
    /** 1-based line of a JSON syntax error, when known. */
    readonly line?: number,
  ) {
    // Names and JSON excerpts in the detail come from the file: shown escaped, never raw.
    super(
      printable(
        `${file}${line === undefined ? '' : `:${line}`}: ${field === '' ? '' : `field ${field}: `}${detail}`,
      ),
    );
  }
}

export function parseDesignFile(text: string, fileName: string): Design {
  return readDesignFile(text, fileName).design;
}

/** The design and the version the file was written in (its fields are spelled as that version's). */
export function readDesignFile(text: string, fileName: string): { design: Design; version: number } {
  const raw = parseJson(text, fileName);
  const version = documentVersion(raw);
  if (version === null) {
    throw new DesignFileError(
      fileName,
      'format',
      `not a Railwise design file (expected "format": "${DESIGN_FORMAT_TAG}")`,
    );
  }
  if (version > CURRENT_DESIGN_VERSION) {
    throw new DesignFileError(
      fileName,
      'version',
      `written by a newer Railwise (version ${version}); this build reads up to version ${CURRENT_DESIGN_VERSION}`,
    );
  }
  const result = designFileV2Schema.safeParse(migrateToCurrent(raw, version));
  if (!result.success) throw schemaError(fileName, raw, version, result.error);
  const { name, technology, open, cells, notes } = result.data;
  const design: Design = {
    name,
    technology,
    cells: cells.map(cellOfFile),
    open,
    ...(notes === undefined ? {} : { notes }),
  };
  refuseLoops(design, fileName);
  return { design, version };
}

/** A cell as the file has it; its netlist takes the cell's name. */
function cellOfFile(c: DesignFileV2['cells'][number]): Cell {
  const { name, netlist, instances, expectations, sequences, sheet, globals } = c;
  return {
    name,
    netlist: netlist.name === name ? netlist : { ...netlist, name },
    instances,
    expectations,
    sequences,
    ...(sheet === undefined ? {} : { sheet }),
    ...(globals === undefined ? {} : { globals }),
  };
}

/** A cell that places itself, directly or through others, is refused with the chain named. */
function refuseLoops(design: Design, fileName: string): void {
  const cells = new Map(design.cells.map((c) => [c.name, c]));
  const sizer = designSizer(cells);
  for (const [i, cell] of design.cells.entries()) {
    const problem = sizer.problem(cell);
    if (problem?.kind === 'cycle')
      throw new DesignFileError(fileName, `cells[${i}].instances`, problem.message);
  }
}

/**
 * Stable key order and two-space indentation, so saved files diff well under version control;
 * `compact` (no whitespace, half the characters, a fraction of the time) for text only Railwise
 * reads back, such as the browser's autosave.
 */
export function serializeDesign(design: Design, layout: 'readable' | 'compact' = 'readable'): string {
  const doc = {
    format: DESIGN_FORMAT_TAG,
    version: CURRENT_DESIGN_VERSION,
    name: design.name,
    technology: design.technology,
    open: design.open,
    cells: design.cells.map((c) => ({
      name: c.name,
      netlist: c.netlist,
      instances: c.instances,
      expectations: c.expectations,
      sequences: c.sequences,
      ...(c.sheet === undefined ? {} : { sheet: c.sheet }),
      ...(c.globals === undefined ? {} : { globals: c.globals }),
    })),
    ...(design.notes === undefined ? {} : { notes: design.notes }),
  };
  return layout === 'compact' ? JSON.stringify(doc) : `${JSON.stringify(doc, null, 2)}\n`;
}

function parseJson(text: string, fileName: string): RawDocument {
  let value: unknown;
  try {
    value = JSON.parse(text.replace(/^\uFEFF/, ''));
  } catch (e) {
    const message = e instanceof Error ? e.message : String(e);
    throw new DesignFileError(fileName, '', `not valid JSON: ${message}`, jsonErrorLine(text, message));
  }
  if (typeof value !== 'object' || value === null || Array.isArray(value)) {
    throw new DesignFileError(fileName, '', 'a design file holds one JSON object');
  }
  return value as RawDocument;
}

/** Engines word syntax errors differently: some give a character position, some a line. */
function jsonErrorLine(text: string, message: string): number | undefined {
  const line = /line (\d+)/.exec(message);
  if (line) return Number(line[1]);
  const pos = /position (\d+)/.exec(message);
  if (!pos) return undefined;
  return text.slice(0, Number(pos[1])).split('\n').length;
}

/** Names the first offending field as the file spells it, e.g. `netlist.devices[3].w`, plus the device's name. */
function schemaError(
  fileName: string,
  raw: RawDocument,
  version: number,
  error: z.ZodError,
): DesignFileError {
  const [first, ...rest] = error.issues;
  if (first === undefined) return new DesignFileError(fileName, '', 'invalid design');
  // A migrated file holds its fields elsewhere than the current version: report paths as the file has them.
  const path = pathInVersion(first.path, version);
  const field = fieldText(path);
  const named = namedElement(path, raw);
  const more = rest.length > 0 ? ` (and ${rest.length} more problem${rest.length > 1 ? 's' : ''})` : '';
  return new DesignFileError(fileName, field, `${first.message}${named}${more}`);
}

/** A field of the current version as a file of `version` spells it: `cells[1].netlist.devices[3].w`. */
export function fieldInFile(path: readonly PropertyKey[], version: number): string {
  return fieldText(pathInVersion(path, version));
}

function fieldText(path: readonly PropertyKey[]): string {
  return path
    .map((k, i) => (typeof k === 'number' ? `[${k}]` : i === 0 ? String(k) : `.${String(k)}`))
    .join('');
}

/** ` (in M7)` when the path runs through an array element that has a name. */
function namedElement(path: readonly PropertyKey[], root: unknown): string {
  let node: unknown = root;
  let name = '';
  for (const key of path) {
    node =
      typeof node === 'object' && node !== null ? (node as Record<PropertyKey, unknown>)[key] : undefined;
    const n =
      typeof key === 'number' && typeof node === 'object' && node !== null
        ? (node as { name?: unknown }).name
        : undefined;
    if (typeof n === 'string' && n !== '') name = n;
  }
  return name === '' ? '' : ` (in ${name})`;
}
