/**
 * SPICE-compatible netlist import (docs/semantics.md §6): a file holds one cell (a flat netlist, or one
 * subcircuit that the others build up) or a library (several top-level subcircuits that nothing
 * instantiates, each its own cell). In a library a broken cell is reported apart and never stops
 * the rest; in a single-cell file the problem throws.
 */
import type { Rail } from '../model/netlist.ts';
import { parseSpice, type Body, type SpiceFile, type Subckt } from './spiceParse.ts';
import { buildCell, type CellContext, type CellSpec, type ImportedCell } from './spiceCells.ts';
import type { FlatSource } from './spiceFlatten.ts';
import { SpiceImportError } from './spiceErrors.ts';

export { SpiceImportError } from './spiceErrors.ts';
export type { ImportedCell } from './spiceCells.ts';

export interface SpiceImportOptions {
  /** Extra net names taken as supply rails (libraries use many spellings). */
  readonly supplyNames?: readonly string[];
  readonly groundNames?: readonly string[];
}

export interface FailedCell {
  readonly name: string;
  readonly error: SpiceImportError;
}

export interface SpiceImport {
  readonly file: string;
  /** Several top-level subcircuits, each checked as its own cell. */
  readonly isLibrary: boolean;
  readonly cells: readonly ImportedCell[];
  /** Cells of a library that could not be read; empty for a single-cell file (which throws). */
  readonly failed: readonly FailedCell[];
  /** File-level notes: ignored commands, a title line, unused subcircuits. */
  readonly notes: readonly string[];
  /** Names of all cells, read or failed, in the order the file defines them. */
  readonly order: readonly string[];
}

/** Net names that are rails in every file, compared lower-case with a trailing `!` dropped. */
const GROUND_NAMES = ['0', 'gnd', 'vss'];
const SUPPLY_NAMES = ['vdd', 'vcc'];

export function importSpice(text: string, fileName: string, options: SpiceImportOptions = {}): SpiceImport {
  const file = parseSpice(text, fileName);
  const ctx = cellContext(file, fileName, options);
  const notes = [...file.notes];
  const single = (spec: CellSpec): SpiceImport => {
    const cells = [buildCell(spec, ctx)];
    return { file: fileName, isLibrary: false, cells, failed: [], notes, order: [spec.name] };
  };
  if (file.top.elements.some((e) => e.kind !== 'source')) {
    notes.push(...unusedNotes(file));
    return single({ name: baseName(fileName), body: file.top, ports: null, sharedSources: [] });
  }
  const roots = file.subckts.filter((s) => !file.subckts.some((o) => o !== s && instantiated(o, s)));
  const [only] = roots;
  if (only === undefined) {
    const detail = 'no devices found: the file holds no elements and no .subckt that could be a cell';
    throw new SpiceImportError(fileName, file.subckts[0]?.line ?? 1, detail);
  }
  const shared = topLevelSources(file.top);
  if (roots.length === 1) {
    const body = withTopDirectives(only, file.top);
    return single({ name: only.name, body, ports: only.ports, sharedSources: shared });
  }
  notes.push(...strayDirectiveNotes(file.top));
  const specs = roots.map((s): CellSpec => ({
    name: s.name,
    body: s,
    ports: s.ports,
    sharedSources: shared,
  }));
  const order = specs.map((spec) => spec.name);
  return { file: fileName, isLibrary: true, ...buildEach(specs, ctx), notes, order };
}

function unusedNotes(file: SpiceFile): string[] {
  const used = (s: Subckt): boolean =>
    instantiated(file.top, s) || file.subckts.some((o) => instantiated(o, s));
  const unused = file.subckts.filter((s) => !used(s)).map((s) => s.name);
  return unused.length > 0 ? [`subcircuits defined but not used: ${unused.join(', ')}`] : [];
}

/** Pin and expect directives at the top of a library belong to no cell. */
function strayDirectiveNotes(top: Body): string[] {
  return top.directives
    .filter((d) => d.key !== 'supply' && d.key !== 'ground')
    .map((d) => `line ${d.line}: a "${d.key}" directive outside any .subckt of a library is ignored`);
}

/** Every cell of a library; one that cannot be built is set aside with its error. */
function buildEach(
  specs: readonly CellSpec[],
  ctx: CellContext,
): { cells: ImportedCell[]; failed: FailedCell[] } {
  const cells: ImportedCell[] = [];
  const failed: FailedCell[] = [];
  for (const spec of specs) {
    try {
      cells.push(buildCell(spec, ctx));
    } catch (e) {
      if (!(e instanceof SpiceImportError)) throw e;
      failed.push({ name: spec.name, error: e });
    }
  }
  return { cells, failed };
}

function instantiated(body: Body, sub: Subckt): boolean {
  const lower = sub.name.toLowerCase();
  return body.elements.some((e) => e.kind === 'instance' && e.subckt.toLowerCase() === lower);
}

/** `* railwise: supply …` and `ground …` lines anywhere in the file name rails for all cells. */
function cellContext(file: SpiceFile, fileName: string, options: SpiceImportOptions): CellContext {
  const bare = (n: string): string => n.toLowerCase().replace(/!$/, '');
  const directiveNames = (key: string): string[] =>
    [file.top, ...file.subckts].flatMap((b) =>
      b.directives.filter((d) => d.key === key).flatMap((d) => d.value.split(/[\s,]+/)),
    );
  const ground = new Set(
    [...GROUND_NAMES, ...(options.groundNames ?? []), ...directiveNames('ground')].map(bare),
  );
  const supply = new Set(
    [...SUPPLY_NAMES, ...(options.supplyNames ?? []), ...directiveNames('supply')].map(bare),
  );
  const railRole = (net: string): Rail['role'] | null => {
    const b = bare(net);
    return ground.has(b) ? 'ground' : supply.has(b) ? 'supply' : null;
  };
  const globals = new Set([
    ...file.globals,
    ...topLevelSources(file.top)
      .flatMap((s) => [s.plus, s.minus])
      .map((n) => n.toLowerCase()),
  ]);
  const isGlobal = (lower: string): boolean =>
    railRole(lower) !== null || globals.has(lower) || lower.endsWith('!');
  return { file, fileName, railRole, isGlobal };
}

function topLevelSources(top: Body): FlatSource[] {
  return top.elements.flatMap((e) =>
    e.kind === 'source' ? [{ name: e.name, line: e.line, plus: e.plus, minus: e.minus, volts: e.volts }] : [],
  );
}

/** Directives at the top of a single-subcircuit file (`expect`, `inputs`) belong to its cell. */
function withTopDirectives(sub: Body, top: Body): Body {
  return top.directives.length === 0 ? sub : { ...sub, directives: [...top.directives, ...sub.directives] };
}

function baseName(fileName: string): string {
  const base = fileName.split(/[\\/]/).pop() ?? fileName;
  return base.replace(/\.[^.]+$/, '') || 'cell';
}
