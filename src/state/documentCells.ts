/**
 * The document's cells beside the open one: the design they make, the open cell flattened (or the
 * cell it is seen inside, when descended), and what follows an edit of a cell other cells place.
 */
import type { Cell, Design } from '../core/document/design.ts';
import type { Instance } from '../core/model/design.ts';
import type { Netlist } from '../core/model/netlist.ts';
import type { SheetIssue } from '../core/sheet/toNetlist.ts';
import { sheetToNetlist } from '../core/sheet/toNetlist.ts';
import { flattenCell, HierarchyError } from '../core/hierarchy/flatten.ts';
import { followCellChange } from '../core/hierarchy/edits.ts';
import { placementOf, type Placement } from '../core/hierarchy/paths.ts';
import type { SheetDocument } from './sheetDocument.ts';

/** The open cell: its own netlist, the instances drawn on its sheet, then any it cannot draw. */
export function openCellOf(doc: SheetDocument, netlist: Netlist, drawn: readonly Instance[]): Cell {
  return {
    name: doc.name,
    netlist,
    instances: [...drawn, ...(doc.instances ?? [])],
    expectations: doc.expectations,
    sequences: doc.sequences,
    sheet: doc.sheet,
    ...(doc.globals === undefined ? {} : { globals: doc.globals }),
  };
}

/** The open cell with its instances expanded; a hierarchy that cannot be flattened is an issue. */
export function flattened(
  doc: SheetDocument,
  open: Cell,
  top: string,
): { netlist: Netlist; issue: SheetIssue | null } {
  if (top === open.name && open.instances.length === 0) return { netlist: open.netlist, issue: null };
  const cells = allCells(doc, open);
  try {
    return { netlist: flattenCell(cells, top), issue: null };
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

function allCells(doc: SheetDocument, open: Cell): Map<string, Cell> {
  const cells = new Map((doc.cells ?? []).map((c) => [c.name, c]));
  cells.set(open.name, open);
  return cells;
}

/**
 * The cell analysed and how the open cell's names read in it: the open cell itself, or, descended
 * into, the top of the context with the names of that placement. A context that no longer leads to
 * the open cell (a cell renamed, an instance deleted) is ignored.
 */
export function seenFrom(doc: SheetDocument, open: Cell): { top: Cell; placement: Placement | null } {
  const context = doc.context;
  if (context === undefined || context.instances.length === 0) return { top: open, placement: null };
  const cells = allCells(doc, open);
  const placement = placementOf(cells, context.top, context.instances);
  const top = cells.get(context.top);
  if (placement === null || top === undefined || placement.cell !== open.name)
    return { top: open, placement: null };
  return { top, placement };
}

/**
 * The document with the open cell's fields changed. Descended into an instance, expected functions
 * and sequences are the top cell's (the one analysed), so those go to it.
 */
export function withFields(
  doc: SheetDocument,
  patch: Partial<Pick<SheetDocument, 'name' | 'technology' | 'expectations' | 'sequences' | 'notes'>>,
): SheetDocument {
  const { expectations, sequences, ...own } = patch;
  const top = doc.context?.top;
  if (top === undefined || (expectations === undefined && sequences === undefined))
    return { ...doc, ...patch };
  const toTop = {
    ...(expectations === undefined ? {} : { expectations }),
    ...(sequences === undefined ? {} : { sequences }),
  };
  const cells = (doc.cells ?? []).map((c) => (c.name === top ? { ...c, ...toTop } : c));
  return { ...doc, ...own, cells };
}
