/**
 * CDL `short` links (a resistor whose value is the word `short`, or an instance of a subcircuit
 * named `short`) are zero-ohm connections: their two nets become one (docs/semantics.md §6). The
 * joined net keeps the name that must survive: a rail or global net first, then a port of the cell,
 * then the first written. When both ends must keep their names (two ports, a port and a rail, two
 * rails) the link is kept as a resistor of the smallest resistance in range, so nothing is renamed.
 */
import type { Instance } from '../model/design.ts';
import { mapDeviceNets, type Device } from '../model/netlist.ts';
import type { CellBuilder, FlatSource } from './spiceCellBuilder.ts';
import { VALUE_RANGES } from './valueRanges.ts';

interface Joined {
  readonly devices: Device[];
  readonly instances: Instance[];
  readonly sources: FlatSource[];
  readonly nets: string[];
  readonly notes: string[];
}

export function joinShorts(b: CellBuilder, ports: ReadonlySet<string>): Joined {
  const nets = b.nets;
  if (b.shorts.length === 0)
    return { devices: b.devices, instances: b.instances, sources: b.sources, nets, notes: [] };
  const rank = (net: string): number => {
    const lower = net.toLowerCase();
    return b.ctx.isGlobal(lower) ? 2 : ports.has(lower) ? 1 : 0;
  };
  const parent = new Map<string, string>();
  const find = (net: string): string => {
    let root = net;
    while (parent.has(root)) root = parent.get(root) as string;
    if (root !== net) parent.set(net, root);
    return root;
  };
  const joined: string[] = [];
  const kept: string[] = [];
  const devices = [...b.devices];
  for (const s of b.shorts) {
    const [ra, rb] = [find(s.a), find(s.b)];
    if (ra === rb) continue;
    if (rank(ra) > 0 && rank(rb) > 0) {
      devices.push({ kind: 'resistor', name: s.name, a: s.a, b: s.b, ohms: VALUE_RANGES.ohms.min });
      kept.push(`${s.name} (${s.a}–${s.b})`);
      continue;
    }
    const [keep, drop] = rank(rb) > rank(ra) ? [rb, ra] : [ra, rb];
    parent.set(drop, keep);
    joined.push(`${s.name} (${drop} into ${keep})`);
  }
  const notes = [
    ...(joined.length > 0 ? [`short links join their nets: ${joined.join(', ')}`] : []),
    ...(kept.length > 0
      ? [
          `short links between two pins or rails kept as ${VALUE_RANGES.ohms.min} Ω resistors: ${kept.join(', ')}`,
        ]
      : []),
  ];
  return {
    devices: devices.map((d) => mapDeviceNets(d, find)),
    instances: b.instances.map((i) => ({
      ...i,
      pins: Object.fromEntries(Object.entries(i.pins).map(([pin, net]) => [pin, find(net)])),
    })),
    sources: b.sources.map((s) => ({ ...s, plus: find(s.plus), minus: find(s.minus) })),
    nets: nets.filter((n) => find(n) === n),
    notes,
  };
}
