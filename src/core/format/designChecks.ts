/**
 * Checks a design file's schema cannot express: how its lists relate to each other. Each problem
 * names the field as the file spells it (`netlist.inputs[0]`), so a hand-edited file is easy to fix.
 * Only what would make the design meaningless is refused; what the checker reports as a finding
 * (a pin connected to nothing, a duplicate device name) is left to it.
 */
import type { Netlist } from '../model/netlist.ts';

export interface DesignProblem {
  readonly field: string;
  readonly message: string;
}

/** The first problem of the netlist's pin and rail lists, or null. */
export function netlistProblem(netlist: Netlist): DesignProblem | null {
  const rails = new Set<string>();
  for (const [i, rail] of netlist.rails.entries()) {
    if (rails.has(rail.net)) {
      return { field: `netlist.rails[${i}].net`, message: `rail ${rail.net} is listed twice` };
    }
    rails.add(rail.net);
  }
  for (const list of ['inputs', 'outputs'] as const) {
    const seen = new Set<string>();
    for (const [i, net] of netlist[list].entries()) {
      if (seen.has(net)) return { field: `netlist.${list}[${i}]`, message: `${net} is listed twice` };
      seen.add(net);
      if (list === 'inputs' && rails.has(net)) {
        return { field: `netlist.inputs[${i}]`, message: `input ${net} is also a rail` };
      }
    }
  }
  return null;
}
