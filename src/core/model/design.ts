/**
 * What a design asks of its cells besides their netlists: input vectors, named sequences of them, and
 * the instances of one cell placed in another. The design and its cells, which also hold the
 * drawing, are `core/document/design.ts`, above the sheet.
 */

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
