/**
 * The document slice: what the designer edits and what undo restores. The netlist is never
 * stored here; it is derived from the sheet on every change, so the two cannot disagree.
 */
import type { Cell, CellDesign, Design } from '../core/document/design.ts';
import type { Sheet } from '../core/sheet/types.ts';
import { sheetToNetlist, type DerivedNetlist, type SheetIssue } from '../core/sheet/toNetlist.ts';
import { autoPlace } from '../core/sheet/autoPlace.ts';
import { samePlainData } from '../core/model/plainData.ts';
import { cellsByName, designOfCell } from '../core/hierarchy/cellDesign.ts';
import { drawInstances, refreshSymbols } from '../core/hierarchy/instanceParts.ts';
import { flattened, openCellOf, seenFrom } from './documentCells.ts';
import type { SheetDocument } from './sheetDocument.ts';
import { nameRecord, recordOf } from '../core/model/records.ts';

export type { SheetContext, SheetDocument } from './sheetDocument.ts';

/** Drawing facts the analysis overlay needs to paint levels onto the sheet. */
export interface SheetGeometry {
  /** Net name of every wire, by wire id. */
  readonly wireNets: Readonly<Record<string, string>>;
  /** Net name of every part pin, keyed `partId.pin` (pins: gate, drain, source, a, b, net). */
  readonly pinNets: ReadonlyMap<string, string>;
  /** Device name of every device part, by part id. */
  readonly partDevices: Readonly<Record<string, string>>;
  /** The inverse: part id of every device name. */
  readonly deviceParts: Readonly<Record<string, string>>;
  readonly junctions: readonly { readonly x: number; readonly y: number }[];
  /** Wire ends that touch nothing, marked on the sheet as unfinished wiring. */
  readonly openEnds: readonly { readonly x: number; readonly y: number }[];
}

export interface DerivedDesign {
  /** The open cell as the analyses read it: instances flattened with hierarchical names. */
  readonly design: CellDesign;
  /** The open cell as the design holds it: its own devices and its instances. */
  readonly openCell: Cell;
  readonly geometry: SheetGeometry;
  readonly issues: readonly SheetIssue[];
}

/**
 * The netlist of a sheet, remembered per sheet object: an edit that is judged before it is committed
 * (docs/semantics.md §1) derives its result once, and the commit reuses it.
 */
const derivedSheets = new WeakMap<Sheet, { readonly name: string; readonly derived: DerivedNetlist }>();

export function derivedSheet(sheet: Sheet, name: string): DerivedNetlist {
  const known = derivedSheets.get(sheet);
  if (known !== undefined && known.name === name) return known.derived;
  const derived = sheetToNetlist(sheet, name);
  derivedSheets.set(sheet, { name, derived });
  return derived;
}

/**
 * The design of a document: the netlist derived from the sheet. With the design derived before, an
 * unchanged netlist or technology keeps its old object, so "did the circuit change?" is one identity
 * test for everything downstream (moving a part re-derives an equal netlist).
 */
export function deriveDesign(doc: SheetDocument, before: CellDesign | null = null): DerivedDesign {
  const d = derivedSheet(doc.sheet, doc.name);
  const openCell = openCellOf(doc, d.netlist, d.instances);
  const seen = seenFrom(doc, openCell);
  const flat = flattened(doc, openCell, seen.top.name);
  const design: CellDesign = {
    name: seen.top.name,
    technology: kept(before?.technology, doc.technology),
    netlist: kept(before?.netlist, flat.netlist),
    expectations: seen.top.expectations,
    sequences: seen.top.sequences,
    sheet: doc.sheet,
    ...(doc.notes === undefined ? {} : { notes: doc.notes }),
  };
  const names = seen.placement;
  const rename = <T extends string>(record: Readonly<Record<string, T>>, f: (n: string) => string) =>
    names === null ? record : recordOf(Object.entries(record).map(([k, v]) => [k, f(v)] as const));
  const partDevices = rename(d.partDevices, (n) => names?.device(n) ?? n);
  const deviceParts = nameRecord<string>(); // a device may be called __proto__
  for (const [partId, device] of Object.entries(partDevices)) deviceParts[device] ??= partId;
  return {
    design,
    geometry: {
      wireNets: rename(d.wireNets, (n) => names?.net(n) ?? n),
      pinNets: names === null ? d.pinNets : new Map([...d.pinNets].map(([k, v]) => [k, names.net(v)])),
      partDevices,
      deviceParts,
      junctions: d.junctions,
      openEnds: d.openEnds,
    },
    issues: flat.issue === null ? d.issues : [...d.issues, flat.issue],
    openCell,
  };
}

/** The earlier object when it equals the new one, so unchanged parts keep their identity. */
function kept<T>(earlier: T | undefined, next: T): T {
  return earlier !== undefined && samePlainData(earlier, next) ? earlier : next;
}

/**
 * A design as the editor holds it, its open cell on the sheet (one cell alone is a design of its
 * own); a cell without a drawing is placed automatically.
 */
export function documentFromDesign(given: Design | CellDesign): SheetDocument {
  const design = 'cells' in given ? given : designOfCell(given);
  const at = Math.max(
    0,
    design.cells.findIndex((c) => c.name === design.open),
  );
  const open = design.cells[at] as Cell;
  const others = design.cells.filter((_, i) => i !== at);
  return {
    ...cellFields(open, cellsByName(design)),
    technology: design.technology,
    ...(design.notes === undefined ? {} : { notes: design.notes }),
    ...(others.length === 0 ? {} : { cells: others, openAt: at }),
    ...(design.name === open.name ? {} : { designName: design.name }),
  };
}

/**
 * The open-cell fields of a document for one cell: its drawing with a symbol for every instance it
 * places (core/hierarchy/instanceParts.ts), each showing its cell's pins as they are now.
 */
function cellFields(
  cell: Cell,
  cells: ReadonlyMap<string, Cell>,
): Pick<SheetDocument, 'name' | 'expectations' | 'sequences' | 'sheet' | 'instances' | 'globals'> {
  const drawing = refreshSymbols(cell.sheet ?? autoPlace(cell.netlist), (c) => cells.get(c)?.netlist);
  const sheet = drawInstances(drawing, cell.instances, cells);
  // An instance of a cell the design lacks cannot be drawn: it stays, and flattening names it.
  const undrawn = cell.instances.filter((i) => !cells.has(i.cell));
  return {
    name: cell.name,
    expectations: cell.expectations,
    sequences: cell.sequences,
    sheet,
    ...(undrawn.length === 0 ? {} : { instances: undrawn }),
    ...(cell.globals === undefined ? {} : { globals: cell.globals }),
  };
}
