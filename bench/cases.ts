/**
 * What the benchmark runs: the circuit families at several sizes, and the one-off cases (sweep,
 * toggle, edit, memory). Sizes are chosen so one full run stays well under two minutes on 2 cores.
 */
import type { Netlist } from '../src/core/model/netlist.ts';
import { adderBank, inverterChain, muxTree, ratioedDecoder, rippleAdder } from './generators/index.ts';

export interface Family {
  readonly name: string;
  /** Parameter values for the settle-versus-size series; the last is also used for random vectors. */
  readonly sizes: readonly number[];
  readonly make: (size: number) => Netlist;
  /** How the size parameter reads in a case name. */
  readonly unit: string;
}

export const FAMILIES: readonly Family[] = [
  { name: 'inverter-chain', sizes: [50, 500, 5000], make: inverterChain, unit: 'stages' },
  { name: 'ripple-adder', sizes: [4, 16, 64, 179], make: rippleAdder, unit: 'bits' },
  { name: 'tg-mux-tree', sizes: [3, 6, 9], make: muxTree, unit: 'select bits' },
  { name: 'ratioed-decoder', sizes: [3, 5, 8], make: ratioedDecoder, unit: 'address bits' },
];

/** The exhaustive sweep: 16 inputs, 1,792 transistors. */
export function sweepCircuit(): Netlist {
  return adderBank(8);
}

/** Solver-only sweep against checkSweep: a 6-bit ripple adder, 13 inputs, 8,192 vectors, 168 transistors. */
export const OVERHEAD_BITS = 6;

/** The ~5,000-transistor sheet for the toggle and edit cases: a 179-bit ripple adder, 5,012 transistors. */
export const TOGGLE_BITS = 179;

/**
 * Memory growth: about 4k, 16k and 64k transistors in two families. Smaller circuits drown in the
 * collector's noise (a few hundred kilobytes either way).
 */
export const MEMORY_SERIES: readonly { readonly family: string; readonly sizes: readonly number[] }[] = [
  { family: 'inverter-chain', sizes: [2000, 8000, 32000] },
  { family: 'ripple-adder', sizes: [143, 572, 2286] },
];

export function familyNamed(name: string): Family {
  const family = FAMILIES.find((f) => f.name === name);
  if (family === undefined) throw new Error(`no benchmark family named ${name}`);
  return family;
}
