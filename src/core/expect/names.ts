import type { Netlist } from '../model/netlist.ts';
import type { Expr } from './parse.ts';

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

/** Every name an expression reads, added to `into`. */
export function namesRead(e: Expr, into: Set<string> = new Set()): Set<string> {
  switch (e.kind) {
    case 'const':
      break;
    case 'name':
      into.add(e.name);
      break;
    case 'not':
      namesRead(e.arg, into);
      break;
    case 'and':
    case 'or':
    case 'xor':
      namesRead(e.left, namesRead(e.right, into));
      break;
    case 'choose':
      namesRead(e.select, namesRead(e.whenTrue, namesRead(e.whenFalse, into)));
      break;
  }
  return into;
}
