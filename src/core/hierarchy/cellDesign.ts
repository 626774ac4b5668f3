/**
 * The single-cell view of a design (`CellDesign`): what analyses, panels and single-cell exports
 * read. A design holds several cells; these helpers give one of them with the design's technology
 * and its instances flattened, and wrap a single cell as a design of its own.
 */
import type { Cell, CellDesign, Design } from '../document/design.ts';
import { flattenCell } from './flatten.ts';

export function cellsByName(design: Pick<Design, 'cells'>): Map<string, Cell> {
  return new Map(design.cells.map((c) => [c.name, c]));
}

export function findCell(design: Pick<Design, 'cells'>, name: string): Cell | undefined {
  return design.cells.find((c) => c.name === name);
}

/** One cell of the design (the open one unless named), flattened, with the design's technology. */
export function cellDesign(design: Design, name: string = design.open): CellDesign {
  const cells = cellsByName(design);
  const cell = cells.get(name);
  if (cell === undefined) throw new Error(`no cell named ${name} in ${design.name}`);
  return {
    name: cell.name,
    technology: design.technology,
    netlist: flattenCell(cells, name),
    expectations: cell.expectations,
    sequences: cell.sequences,
    ...(cell.sheet === undefined ? {} : { sheet: cell.sheet }),
    ...(design.notes === undefined ? {} : { notes: design.notes }),
  };
}

/** A cell with no instances as a cell of a design. */
export function cellOf(one: CellDesign): Cell {
  return {
    name: one.name,
    netlist: one.netlist.name === one.name ? one.netlist : { ...one.netlist, name: one.name },
    instances: [],
    expectations: one.expectations,
    sequences: one.sequences,
    ...(one.sheet === undefined ? {} : { sheet: one.sheet }),
  };
}

/** One cell as a design of its own (starters, a drawn cell, tests). */
export function designOfCell(one: CellDesign): Design {
  return {
    name: one.name,
    technology: one.technology,
    cells: [cellOf(one)],
    open: one.name,
    ...(one.notes === undefined ? {} : { notes: one.notes }),
  };
}
