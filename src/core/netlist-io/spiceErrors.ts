import type { Cell } from '../document/design.ts';

/** A netlist that cannot be used, with the file and 1-based line to look at. */
export class SpiceImportError extends Error {
  override readonly name = 'SpiceImportError';
  constructor(
    readonly file: string,
    readonly line: number,
    readonly detail: string,
  ) {
    super(`${file}:${line}: ${detail}`);
  }
}

/**
 * A cell whose subcircuits all read but whose hierarchy cannot be flattened for the checks (two
 * devices that meet under one hierarchical name): the checks refuse it, the design keeps its cells.
 */
export class UnflattenedCellError extends SpiceImportError {
  constructor(
    file: string,
    line: number,
    detail: string,
    /** The cell and the cells it places, as read. */
    readonly cells: readonly Cell[],
  ) {
    super(file, line, detail);
  }
}
