/** The nets and pins of one cell, its instances' wiring included. */
import type { Cell } from '../document/design.ts';
import { netNames, type Netlist } from '../model/netlist.ts';

/** Every net of the cell: the netlist's, then nets only instance pins touch, in first-appearance order. */
export function cellNets(cell: Cell): string[] {
  const nets = netNames(cell.netlist);
  const seen = new Set(nets);
  for (const instance of cell.instances)
    for (const net of Object.values(instance.pins))
      if (!seen.has(net)) {
        seen.add(net);
        nets.push(net);
      }
  return nets;
}

/** The pins an instance of the cell can wire: inputs, outputs and rails, each once. */
export function cellPins(netlist: Netlist): string[] {
  return [...new Set([...netlist.inputs, ...netlist.outputs, ...netlist.rails.map((r) => r.net)])];
}
