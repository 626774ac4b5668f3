/**
 * Channel hops from a set of rails to every net, by breadth-first search over transistor and
 * resistor channels. Rails are sources only: the search never passes through another rail.
 */
import type { Netlist } from '../model/netlist.ts';
import { channelNets } from '../model/netlist.ts';

export function railDistances(netlist: Netlist, from: readonly string[]): Map<string, number> {
  const rails = new Set(netlist.rails.map((r) => r.net));
  const neighbours = new Map<string, string[]>();
  for (const d of netlist.devices) {
    const nets = channelNets(d);
    if (!nets || nets[0] === nets[1]) continue;
    for (const [from, to] of [nets, [nets[1], nets[0]]] as const) {
      const list = neighbours.get(from);
      if (list) list.push(to);
      else neighbours.set(from, [to]);
    }
  }
  const dist = new Map<string, number>(from.map((n) => [n, 0]));
  let frontier = [...from];
  for (let hop = 1; frontier.length > 0; hop++) {
    const next: string[] = [];
    for (const net of frontier) {
      if (hop > 1 && rails.has(net)) continue;
      for (const m of neighbours.get(net) ?? []) {
        if (dist.has(m)) continue;
        dist.set(m, hop);
        if (!rails.has(m)) next.push(m);
      }
    }
    frontier = next;
  }
  return dist;
}
