/**
 * A Liberty file attached to an opened design (docs/semantics.md §4): each cell of the design takes
 * the expected functions of the library cell of the same name (case-blind). Pins are left as the
 * design has them; a function of a pin the cell does not have, a sequential cell, and a cell the
 * library does not describe each give a note, so nothing is silently unchecked.
 */
import type { Cell, Design } from '../document/design.ts';
import type { LibertyLibrary } from './libertyCells.ts';
import { cellFunctions } from './cellFunctions.ts';

export interface AttachedFunctions {
  readonly design: Design;
  readonly notes: readonly string[];
  /** Cells that took at least one expected function. */
  readonly matched: number;
}

export function attachLibertyFunctions(
  design: Design,
  library: LibertyLibrary,
  source: string,
): AttachedFunctions {
  const byName = new Map(library.cells.map((c) => [c.name.toLowerCase(), c]));
  const notes: string[] = [];
  let matched = 0;
  const cells = design.cells.map((cell): Cell => {
    const lib = byName.get(cell.name.toLowerCase());
    if (lib === undefined) {
      notes.push(`${cell.name}: no cell of that name in ${source}`);
      return cell;
    }
    if (lib.sequential !== null) {
      notes.push(
        `${cell.name}: sequential in ${source} (a ${lib.sequential} group): no function to check in a sweep`,
      );
      return cell;
    }
    const f = cellFunctions(lib, cell.netlist, source);
    notes.push(...f.notes.map((n) => `${cell.name}: ${n}`));
    const usable = Object.entries(f.expectations).filter(([out]) => cell.netlist.outputs.includes(out));
    if (usable.length < Object.keys(f.expectations).length)
      notes.push(`${cell.name}: outputs of ${source} that are not outputs here were left out`);
    if (usable.length === 0) return cell;
    matched++;
    return { ...cell, expectations: { ...cell.expectations, ...Object.fromEntries(usable) } };
  });
  return { design: { ...design, cells }, notes, matched };
}
