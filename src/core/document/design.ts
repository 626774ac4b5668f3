import type { Instance, Sequence } from '../model/design.ts';
import type { Netlist } from '../model/netlist.ts';
import type { Technology } from '../model/technology.ts';
import type { Sheet } from '../sheet/types.ts';

/*
 * What a designer saves, cell by cell. These types hold the drawing, so they live above
 * `core/sheet`; the netlists, technology, vectors and instances they are made of stay in
 * `core/model`, below the sheet (DEVELOPERS.md, "Layers").
 */

/**
 * One cell as the designer edits it: its own devices, rails and pins (`netlist`), the instances of
 * other cells it places, what it should do, and where it is drawn.
 */
export interface Cell {
  readonly name: string;
  /** The cell's own devices, rails and pins; `netlist.name` is the cell's name. */
  readonly netlist: Netlist;
  readonly instances: readonly Instance[];
  /** Expected function per output, as expression text (see core/expect). */
  readonly expectations: Readonly<Record<string, string>>;
  readonly sequences: readonly Sequence[];
  /** Sheet geometry for the editor; absent for cells never drawn (the editor places them). */
  readonly sheet?: Sheet;
  /**
   * Nets besides the rails that keep their name at every depth (a netlist's `.global` nets and names
   * ending in `!`): inside an instance they join the net of that name above.
   */
  readonly globals?: readonly string[];
}

/** Everything a designer saves: cells sharing one technology, one of them open on the sheet. */
export interface Design {
  readonly name: string;
  readonly technology: Technology;
  /** Every cell, in the order the designer sees them; names are unique. */
  readonly cells: readonly Cell[];
  /** The name of the cell on the sheet. */
  readonly open: string;
  readonly notes?: string;
}

/**
 * One cell as the analyses, the panels and the exports of a single cell read it: the cell with its
 * design's technology and its instances flattened into `netlist` with hierarchical names
 * (docs/semantics.md §1). `cellDesign(design)` in core/hierarchy gives the open cell this way.
 */
export interface CellDesign {
  readonly name: string;
  readonly technology: Technology;
  /** Flat: devices of every instance, named by their instance path (`X1.N1`). */
  readonly netlist: Netlist;
  readonly expectations: Readonly<Record<string, string>>;
  readonly sequences: readonly Sequence[];
  readonly sheet?: Sheet;
  readonly notes?: string;
}
