/**
 * SPICE-compatible netlist import (docs/semantics.md §6): a file holds one cell (a flat netlist, or
 * one subcircuit that the others build up) or a library (several top-level subcircuits that nothing
 * instantiates). A library run checks every subcircuit that holds devices, also those its larger
 * cells instantiate, unless only the top-level ones are asked for; `cell` picks any one subcircuit.
 * In a library a broken cell is reported apart and never stops the rest; in a single-cell file the
 * problem throws.
 */
import type { Rail } from '../model/netlist.ts';
import type { DeviceModel } from '../model/technology.ts';
import { parseSpice, type Body, type SpiceFile, type Subckt } from './spiceParse.ts';
import { buildCell, cardsNamed, type CellContext, type CellSpec, type ImportedCell } from './spiceCells.ts';
import type { FlatSource } from './spiceCellBuilder.ts';
import { SpiceImportError, UnflattenedCellError } from './spiceErrors.ts';
import type { Cell } from '../document/design.ts';
import { Hierarchy } from './spiceHierarchy.ts';
import { resolveScale } from './spiceSizes.ts';
import { parseStandIns, type StandIn } from './deviceNames.ts';
import { technologyCards } from './spiceModels.ts';
import { restoredCellNames } from './spiceRestore.ts';

export { SpiceImportError } from './spiceErrors.ts';
export type { ImportedCell } from './spiceCells.ts';

export interface SpiceImportOptions {
  /** Extra net names taken as supply rails (libraries use many spellings). */
  readonly supplyNames?: readonly string[];
  readonly groundNames?: readonly string[];
  /** Metres per unit of W and L as written (`--scale`); overrides the file's directive. */
  readonly scale?: number;
  /** What undefined subcircuits stand for, by name (`--treat-as`), over the naming rule. */
  readonly standIns?: ReadonlyMap<string, StandIn>;
  /** Read only this cell: any subcircuit the file defines, or the flat netlist's own name. */
  readonly cell?: string;
  /** In a library, only the subcircuits that nothing instantiates. */
  readonly topOnly?: boolean;
}

export interface FailedCell {
  readonly name: string;
  readonly error: SpiceImportError;
  /** The cells read, when only the checks' flattening failed. */
  readonly cells?: readonly Cell[];
}

export interface SpiceImport {
  readonly file: string;
  /** Several top-level subcircuits, each checked as its own cell. */
  readonly isLibrary: boolean;
  readonly cells: readonly ImportedCell[];
  /** Cells of a library that could not be read; empty for a single-cell file (which throws). */
  readonly failed: readonly FailedCell[];
  /** File-level notes: ignored commands, a title line, scale, cells not checked. */
  readonly notes: readonly string[];
  /** Names of the cells read or failed, in the order the file defines them. */
  readonly order: readonly string[];
  /** Every cell name the file offers to `cell`. */
  readonly available: readonly string[];
  /** Level-1 values of the cards `* railwise: technology` names: the technology's own, per type. */
  readonly technologyCards: readonly DeviceModel[];
  /** Level-1 values of every card a device of a cell read names, by card name. */
  readonly models: Readonly<Record<string, DeviceModel>>;
}

/** Net names that are rails in every file, compared lower-case with a trailing `!` dropped. */
const GROUND_NAMES = ['0', 'gnd', 'vss'];
const SUPPLY_NAMES = ['vdd', 'vcc'];

export function importSpice(text: string, fileName: string, options: SpiceImportOptions = {}): SpiceImport {
  const file = parseSpice(text, fileName);
  const notes = [...file.notes];
  const ctx = cellContext(file, fileName, options, notes);
  const flatTop = file.top.elements.some((e) => e.kind !== 'source');
  const available = [...(flatTop ? [baseName(fileName)] : []), ...file.subckts.map((s) => s.name)];
  const result = (isLibrary: boolean, specs: readonly CellSpec[]): SpiceImport => {
    const built = buildEach(specs, ctx, isLibrary);
    const order = specs.map((s) => s.name);
    const models = cardsNamed(ctx);
    return {
      file: fileName,
      isLibrary,
      ...built,
      notes,
      order,
      available,
      technologyCards: ctx.technology,
      models,
    };
  };
  const shared = topLevelSources(file.top);
  const used = instantiatedNames(file);
  const roots = file.subckts.filter((s) => !used.has(s.name.toLowerCase()));
  const [only] = roots;
  if (options.cell !== undefined) {
    const single = !flatTop && roots.length === 1 ? only : undefined;
    return result(false, pickSpec(file, options.cell, { flatTop, fileName, shared, single }));
  }
  if (flatTop) {
    notes.push(...unusedNotes(file, used));
    return result(false, [flatSpec(fileName, file)]);
  }
  if (only === undefined) {
    const detail = 'no devices found: the file holds no elements and no .subckt that could be a cell';
    throw new SpiceImportError(fileName, file.subckts[0]?.line ?? 1, detail);
  }
  if (roots.length === 1) {
    const body = withTopDirectives(only, file.top);
    return result(false, [subcktSpec(only, shared, body)]);
  }
  notes.push(...strayDirectiveNotes(file.top));
  const cells = libraryCells(file, roots, options.topOnly === true, ctx.hierarchy, notes);
  return result(
    true,
    cells.map((s) => subcktSpec(s, shared)),
  );
}

function subcktSpec(s: Subckt, shared: readonly FlatSource[], body: Body = s): CellSpec {
  return { name: s.name, body, ports: s.ports, sharedSources: shared, line: s.line };
}

function flatSpec(fileName: string, file: SpiceFile): CellSpec {
  return { name: baseName(fileName), body: file.top, ports: null, sharedSources: [], line: 1 };
}

interface PickContext {
  readonly flatTop: boolean;
  readonly fileName: string;
  readonly shared: readonly FlatSource[];
  /** The one top-level subcircuit of a single-cell file: it takes the top-level directives. */
  readonly single: Subckt | undefined;
}

/** `cell` asks for one cell by name: any subcircuit, or the flat netlist itself (none: empty). */
function pickSpec(file: SpiceFile, name: string, p: PickContext): CellSpec[] {
  const sub = file.subcktByName.get(name.toLowerCase());
  if (sub !== undefined)
    return [subcktSpec(sub, p.shared, sub === p.single ? withTopDirectives(sub, file.top) : sub)];
  if (p.flatTop && baseName(p.fileName).toLowerCase() === name.toLowerCase())
    return [flatSpec(p.fileName, file)];
  return [];
}

/**
 * The cells of a library, in file order: every subcircuit that holds devices, directly or through
 * instances (or only the top-level ones); the others are named in a note.
 */
function libraryCells(
  file: SpiceFile,
  roots: readonly Subckt[],
  topOnly: boolean,
  hierarchy: Hierarchy,
  notes: string[],
): Subckt[] {
  const rootSet = new Set(roots);
  const candidates = topOnly ? file.subckts.filter((s) => rootSet.has(s)) : file.subckts;
  // A body with an unreadable line is a cell to report, whatever else it holds.
  const holdsDevices = (s: Subckt): boolean => s.error !== undefined || hierarchy.deviceCount(s) !== 0;
  const empty = candidates.filter((s) => !holdsDevices(s));
  if (empty.length > 0)
    notes.push(`subcircuits with no devices are not checked: ${empty.map((s) => s.name).join(', ')}`);
  if (topOnly && roots.length < file.subckts.length)
    notes.push(
      `${file.subckts.length - roots.length} subcircuits that other cells instantiate are not checked on their own (top-level cells only)`,
    );
  return candidates.filter(holdsDevices);
}

function instantiatedNames(file: SpiceFile): Set<string> {
  const names = new Set<string>();
  for (const body of [file.top, ...file.subckts])
    for (const e of body.elements) if (e.kind === 'instance') names.add(e.subckt.toLowerCase());
  return names;
}

function unusedNotes(file: SpiceFile, used: ReadonlySet<string>): string[] {
  const unused = file.subckts.filter((s) => !used.has(s.name.toLowerCase())).map((s) => s.name);
  return unused.length > 0 ? [`subcircuits defined but not used: ${unused.join(', ')}`] : [];
}

/** Pin and expect directives at the top of a library belong to no cell. */
function strayDirectiveNotes(top: Body): string[] {
  return top.directives
    .filter((d) => !FILE_DIRECTIVES.has(d.key))
    .map((d) => `line ${d.line}: a "${d.key}" directive outside any .subckt of a library is ignored`);
}

/** Directives that speak for the whole file wherever they stand. */
const FILE_DIRECTIVES = new Set(['supply', 'ground', 'treat-as', 'technology']);

/** Every cell of a library; one that cannot be built is set aside with its error. */
function buildEach(
  specs: readonly CellSpec[],
  ctx: CellContext,
  isLibrary: boolean,
): { cells: ImportedCell[]; failed: FailedCell[] } {
  const cells: ImportedCell[] = [];
  const failed: FailedCell[] = [];
  for (const spec of specs) {
    try {
      cells.push(buildCell(spec, ctx));
    } catch (e) {
      // In a single-cell file a line that cannot be read is the file's problem; a hierarchy that
      // cannot be flattened is the cell's (its cells are still a design).
      if (!(e instanceof SpiceImportError) || (!isLibrary && !(e instanceof UnflattenedCellError))) throw e;
      const placed = e instanceof UnflattenedCellError ? { cells: e.cells } : {};
      failed.push({ name: spec.name, error: e, ...placed });
    }
  }
  return { cells, failed };
}

/** Rail names, scale, stand-ins and the technology's cards: what holds for every cell of the file. */
function cellContext(
  file: SpiceFile,
  fileName: string,
  options: SpiceImportOptions,
  notes: string[],
): CellContext & { readonly technology: readonly DeviceModel[] } {
  const bare = (n: string): string => n.toLowerCase().replace(/!$/, '');
  const directives = [file.top, ...file.subckts].flatMap((b) => b.directives);
  const directiveNames = (key: string): string[] =>
    directives.filter((d) => d.key === key).flatMap((d) => d.value.split(/[\s,]+/));
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
  const standIns = new Map<string, StandIn>();
  for (const d of directives.filter((x) => x.key === 'treat-as')) {
    const { map, bad } = parseStandIns(d.value);
    if (bad !== null)
      throw new SpiceImportError(
        fileName,
        d.line,
        `treat-as: "${bad}" should read NAME=nmos|pmos|diode|short`,
      );
    map.forEach((kind, name) => standIns.set(name, kind));
  }
  options.standIns?.forEach((kind, name) => standIns.set(name.toLowerCase(), kind));
  const scale = resolveScale(file, options.scale, notes);
  const hierarchy = new Hierarchy(file, fileName);
  const cards = technologyCards(file, fileName, directives);
  notes.push(...cards.notes);
  return {
    file,
    fileName,
    railRole,
    isGlobal,
    scale,
    standIns,
    hierarchy,
    technologyCards: cards.names,
    technology: cards.models,
    cellNames: restoredCellNames(file.subckts, notes),
    globalSpelling: new Map(),
    bodies: new Map(),
    finished: new Map(),
    uses: new Map(),
  };
}

function topLevelSources(top: Body): FlatSource[] {
  return top.elements.flatMap((e) =>
    e.kind === 'source' ? [{ name: e.name, line: e.line, plus: e.plus, minus: e.minus, volts: e.volts }] : [],
  );
}

/** Directives at the top of a single-subcircuit file (`expect`, `inputs`) belong to its cell. */
function withTopDirectives(sub: Subckt, top: Body): Subckt {
  return top.directives.length === 0 ? sub : { ...sub, directives: [...top.directives, ...sub.directives] };
}

function baseName(fileName: string): string {
  const base = fileName.split(/[\\/]/).pop() ?? fileName;
  return base.replace(/\.[^.]+$/, '') || 'cell';
}
