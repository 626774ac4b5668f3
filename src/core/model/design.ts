/**
 * What a design asks of its cell besides the netlist: input vectors and named sequences of them. The
 * design itself, which also holds the drawing, is `core/document/design.ts`, above the sheet.
 */

/** One input assignment: '0' and '1' drive the pin, 'Z' leaves it undriven, 'X' drives an unknown. */
export type InputValue = '0' | '1' | 'X' | 'Z';
export type InputVector = Readonly<Record<string, InputValue>>;

export interface Sequence {
  readonly name: string;
  readonly steps: readonly InputVector[];
}
