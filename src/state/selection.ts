/**
 * The selection slice: what is selected on the sheet, and what the analysis asks to highlight.
 * Never part of undo.
 */
import type { ItemIds } from '../core/sheet/selection.ts';
import { NO_ITEMS } from '../core/sheet/selection.ts';
import type { Sheet } from '../core/sheet/types.ts';

export interface SelectionState {
  readonly selected: ItemIds;
  /** Nets and devices picked out by the analysis panels (by name, as the netlist knows them). */
  readonly highlight: { readonly nets: readonly string[]; readonly devices: readonly string[] };
}

export const EMPTY_SELECTION: SelectionState = { selected: NO_ITEMS, highlight: { nets: [], devices: [] } };

/** Drops ids that no longer exist (after undo, delete or a new file). */
export function pruneSelection(sel: ItemIds, sheet: Sheet): ItemIds {
  const parts = new Set(sheet.parts.map((p) => p.id));
  const wires = new Set(sheet.wires.map((w) => w.id));
  const keptParts = sel.parts.filter((id) => parts.has(id));
  const keptWires = sel.wires.filter((id) => wires.has(id));
  return keptParts.length === sel.parts.length && keptWires.length === sel.wires.length
    ? sel
    : { parts: keptParts, wires: keptWires };
}

/** Adds or removes ids (shift-click): toggles each. */
export function toggleItems(sel: ItemIds, ids: ItemIds): ItemIds {
  const flip = (have: readonly string[], ids: readonly string[]) => {
    const set = new Set(have);
    for (const id of ids) {
      if (set.has(id)) set.delete(id);
      else set.add(id);
    }
    return [...set];
  };
  return { parts: flip(sel.parts, ids.parts), wires: flip(sel.wires, ids.wires) };
}
