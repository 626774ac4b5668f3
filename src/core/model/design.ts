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

/** Everything a designer saves: the circuit, its process, what it should do, and where it is drawn. */
export interface Design {
  readonly name: string;
  readonly technology: Technology;
  readonly netlist: Netlist;
  /** Expected function per output, as expression text (see core/expect). */
  readonly expectations: Readonly<Record<string, string>>;
  readonly sequences: readonly Sequence[];
  /** Sheet geometry for the editor; absent for netlist-only designs (the editor places them). */
  readonly sheet?: Sheet;
  readonly notes?: string;
}
