import type { Netlist } from '../model/netlist.ts';

/**
 * Names an expected function may use (docs/semantics.md §4): the inputs, and the outputs, which stand
 * for the value the output held before this vector (the previous step in a sequence; unknown in a
 * sweep, where every vector starts from an unknown state). `Q = !Sb | Rb & Q` says that Q holds. An
 * output called Z is left out: `Z` keeps meaning high-impedance (a tristate cell's output is often
 * called Z).
 */
export function expressionNames(netlist: Pick<Netlist, 'inputs' | 'outputs'>): string[] {
  return [...netlist.inputs, ...netlist.outputs.filter((o) => o !== 'Z')];
}
