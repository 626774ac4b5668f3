/**
 * The document slice: what the designer edits and what undo restores. The netlist is never
 * stored here; it is derived from the sheet on every change, so the two cannot disagree.
 */
import type { Cell, CellDesign, Design, Instance, Sequence } from '../core/model/design.ts';
import type { Netlist } from '../core/model/netlist.ts';
import type { Technology } from '../core/model/technology.ts';
import type { Sheet } from '../core/sheet/types.ts';
import { sheetToNetlist, type SheetIssue } from '../core/sheet/toNetlist.ts';
import { autoPlace } from '../core/sheet/autoPlace.ts';
import { samePlainData } from '../core/model/plainData.ts';
import { designOfCell } from '../core/hierarchy/cellDesign.ts';
import { flattenCell, HierarchyError } from '../core/hierarchy/flatten.ts';
import { followCellChange } from '../core/hierarchy/edits.ts';

/**
 * The open cell's fields at the top (what the editor and the panels read), the design's other
 * cells beside them. A one-cell design leaves the optional fields out.
 */
export interface SheetDocument {
  /** The open cell's name. */
  readonly name: string;
  readonly technology: Technology;
  readonly expectations: Readonly<Record<string, string>>;
  readonly sequences: readonly Sequence[];
  readonly notes?: string;
  readonly sheet: Sheet;
  /** Instances the open cell places that are not drawn on its sheet. */
  readonly instances?: readonly Instance[];
  readonly globals?: readonly string[];
  /** The design's other cells, in order; the open cell sits at `openAt` among them. */
  readonly cells?: readonly Cell[];
  readonly openAt?: number;
  /** The design's own name (the file name on save); the open cell's name when absent. */
  readonly designName?: string;
}

/** Drawing facts the analysis overlay needs to paint levels onto the sheet. */
export interface SheetGeometry {
  /** Net name of every wire, by wire id. */
  readonly wireNets: Readonly<Record<string, string>>;
  /** Net name of every part pin, keyed `partId.pin` (pins: gate, drain, source, a, b, net). */
  readonly pinNets: Readonly<Record<string, string>>;
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
 * The design of a document: the netlist derived from the sheet. With the design derived before, an
 * unchanged netlist or technology keeps its old object, so "did the circuit change?" is one identity
 * test for everything downstream (moving a part re-derives an equal netlist).
 */
export function deriveDesign(doc: SheetDocument, before: CellDesign | null = null): DerivedDesign {
  const d = sheetToNetlist(doc.sheet, doc.name);
  const deviceParts: Record<string, string> = {};
  for (const [partId, device] of Object.entries(d.partDevices)) deviceParts[device] ??= partId;
  const openCell = openCellOf(doc, d.netlist);
  const flat = flattened(doc, openCell);
  const design: CellDesign = {
    name: doc.name,
    technology: kept(before?.technology, doc.technology),
    netlist: kept(before?.netlist, flat.netlist),
    expectations: doc.expectations,
    sequences: doc.sequences,
    sheet: doc.sheet,
    ...(doc.notes === undefined ? {} : { notes: doc.notes }),
  };
  return {
    design,
    geometry: {
      wireNets: d.wireNets,
      pinNets: d.pinNets,
      partDevices: d.partDevices,
      deviceParts,
      junctions: d.junctions,
      openEnds: d.openEnds,
    },
    issues: flat.issue === null ? d.issues : [...d.issues, flat.issue],
    openCell,
  };
}

function openCellOf(doc: SheetDocument, netlist: Netlist): Cell {
  return {
    name: doc.name,
    netlist,
    instances: doc.instances ?? [],
    expectations: doc.expectations,
    sequences: doc.sequences,
    sheet: doc.sheet,
    ...(doc.globals === undefined ? {} : { globals: doc.globals }),
  };
}

/** The open cell with its instances expanded; a hierarchy that cannot be flattened is an issue. */
function flattened(doc: SheetDocument, open: Cell): { netlist: Netlist; issue: SheetIssue | null } {
  if (open.instances.length === 0) return { netlist: open.netlist, issue: null };
  const cells = new Map((doc.cells ?? []).map((c) => [c.name, c]));
  cells.set(open.name, open);
  try {
    return { netlist: flattenCell(cells, open.name), issue: null };
  } catch (e) {
    if (!(e instanceof HierarchyError)) throw e;
    return { netlist: open.netlist, issue: { kind: 'hierarchy', parts: [], message: e.message } };
  }
}

/**
 * A change to the open cell that other cells place: when its name or a pin's name changed, every
 * instance of it follows, in the same document (so in the same undo step).
 */
export function followOpenCell(before: SheetDocument, next: SheetDocument, open: Cell): SheetDocument {
  const cells = next.cells ?? [];
  if (next === before || (next.sheet === before.sheet && next.name === before.name)) return next;
  if (!cells.some((c) => c.instances.some((i) => i.cell === open.name))) return next;
  const after = { name: next.name, netlist: sheetToNetlist(next.sheet, next.name).netlist };
  const followed = followCellChange(cells, open, after);
  return followed === cells ? next : { ...next, cells: followed };
}

/** Every cell of the document's design in order, the open one as derived. */
export function documentCells(doc: SheetDocument, openCell: Cell): Cell[] {
  const others = doc.cells ?? [];
  const at = Math.min(doc.openAt ?? others.length, others.length);
  return [...others.slice(0, at), openCell, ...others.slice(at)];
}

/** The whole design the document holds, as saved. */
export function designOfDocument(doc: SheetDocument, openCell: Cell): Design {
  return {
    name: doc.designName ?? doc.name,
    technology: doc.technology,
    cells: documentCells(doc, openCell),
    open: doc.name,
    ...(doc.notes === undefined ? {} : { notes: doc.notes }),
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
    ...cellFields(open),
    technology: design.technology,
    ...(design.notes === undefined ? {} : { notes: design.notes }),
    ...(others.length === 0 ? {} : { cells: others, openAt: at }),
    ...(design.name === open.name ? {} : { designName: design.name }),
  };
}

/** The open-cell fields of a document for one cell. */
export function cellFields(
  cell: Cell,
): Pick<SheetDocument, 'name' | 'expectations' | 'sequences' | 'sheet' | 'instances' | 'globals'> {
  return {
    name: cell.name,
    expectations: cell.expectations,
    sequences: cell.sequences,
    sheet: cell.sheet ?? autoPlace(cell.netlist),
    ...(cell.instances.length === 0 ? {} : { instances: cell.instances }),
    ...(cell.globals === undefined ? {} : { globals: cell.globals }),
  };
}
