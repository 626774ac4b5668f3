/**
 * What a SPICE file carries of a design, for the export → import identity tests: each cell with
 * its devices, rails, pins, instances and expected functions (sequences and drawings stay in the
 * design file), for the cells a reader finds.
 */
import type { Cell, Design } from '../../src/core/document/design.ts';
import { DEFAULT_TECHNOLOGY } from '../../src/core/model/technology.ts';
import { UnflattenedCellError } from '../../src/core/netlist-io/spiceErrors.ts';
import { designFromImport } from '../../src/core/netlist-io/spiceDesign.ts';
import { importSpice } from '../../src/core/netlist-io/spiceImport.ts';

/** A cell as SPICE carries it, records spread to plain objects. */
function carried(c: Cell) {
  return {
    name: c.name,
    netlist: c.netlist,
    instances: c.instances.map((i) => ({ name: i.name, cell: i.cell, pins: { ...i.pins } })),
    expectations: { ...c.expectations },
    globals: c.globals ?? [],
  };
}

/** The cells of a design as SPICE carries them, sorted by name. */
export function carriedCells(cells: readonly Cell[]): ReturnType<typeof carried>[] {
  return cells.map(carried).sort((a, b) => (a.name < b.name ? -1 : a.name > b.name ? 1 : 0));
}

/**
 * The cells a reader finds (docs/semantics.md §5): the one cell nothing places, or, when several
 * are placed by nothing (a library), those that hold devices directly or through instances; and
 * every cell they place. An empty cell of a library is no cell (a note says so).
 */
export function findableCells(design: Design): Cell[] {
  const byName = new Map(design.cells.map((c) => [c.name, c]));
  const placed = new Set(design.cells.flatMap((c) => c.instances.map((i) => i.cell)));
  const holds = (c: Cell): boolean =>
    c.netlist.devices.length > 0 || c.instances.some((i) => holds(byName.get(i.cell) as Cell));
  const kept = new Set<Cell>();
  const keep = (c: Cell): void => {
    if (kept.has(c)) return;
    kept.add(c);
    c.instances.forEach((i) => keep(byName.get(i.cell) as Cell));
  };
  const roots = design.cells.filter((c) => !placed.has(c.name));
  (roots.length === 1 ? roots : roots.filter(holds)).forEach(keep);
  return design.cells.filter((c) => kept.has(c));
}

/**
 * A netlist read back as a design. Only a cell the checks cannot flatten (two devices meeting under
 * one hierarchical name) may fail, and its cells are read all the same; anything else is returned
 * as the failure it is.
 */
export function designOfSpice(text: string): Design | { readonly failure: string } {
  const imported = importSpice(text, 'design.sp');
  const other = imported.failed.find((f) => !(f.error instanceof UnflattenedCellError));
  if (other !== undefined) return { failure: other.error.message };
  return designFromImport(imported, DEFAULT_TECHNOLOGY, 'design');
}
