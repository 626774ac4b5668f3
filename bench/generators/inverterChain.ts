import type { Netlist } from '../../src/core/model/netlist.ts';
import { assemble, inverter } from './parts.ts';

/**
 * A chain of `stages` static CMOS inverters from input A to output Y (2 transistors per stage).
 * Internal nets are n1 … n(stages-1); Y = A for an even number of stages, !A for an odd one.
 */
export function inverterChain(stages: number): Netlist {
  if (!Number.isInteger(stages) || stages < 1)
    throw new RangeError(`stages must be a positive integer, got ${stages}`);
  const node = (i: number): string => (i === 0 ? 'A' : i === stages ? 'Y' : `n${i}`);
  const cells = Array.from({ length: stages }, (_, i) => inverter(`I${i + 1}.`, node(i), node(i + 1)));
  return assemble(`inverter-chain-${stages}`, { inputs: ['A'], outputs: ['Y'] }, cells);
}
