import type { Netlist } from './netlist.ts';
import type { Technology } from './technology.ts';
import type { Sheet } from '../sheet/types.ts';

/** One input assignment: '0' and '1' drive the pin, 'Z' leaves it undriven, 'X' drives an unknown. */
export type InputValue = '0' | '1' | 'X' | 'Z';
export type InputVector = Readonly<Record<string, InputValue>>;

export interface Sequence {
  readonly name: string;
  readonly steps: readonly InputVector[];
}

/**
 * Another cell of the design placed inside this one (docs/semantics.md §1, hierarchy). `pins` wires
 * each pin of the placed cell to a net of this one; a rail of the placed cell that no pin wires joins
 * the net of the same name here (rails are global by name).
 */
export interface Instance {
  readonly name: string;
  /** The name of the placed cell. */
  readonly cell: string;
  /** Net of this cell for each pin of the placed cell, by pin name. */
  readonly pins: Readonly<Record<string, string>>;
}

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
