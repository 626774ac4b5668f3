// Indexes read here are in range by construction, so `!` marks them (no run-time cost).
import { capacitanceBreakdown, type CapacitanceBreakdown } from '../compile/capacitance.ts';
import type { MosDevice, Netlist } from '../model/netlist.ts';
import { deviceTerminals, netNames } from '../model/netlist.ts';
import type { Technology } from '../model/technology.ts';

/**
 * Each net's capacitance for delay estimates, by name, farads. It starts from the project's
 * per-terminal breakdown (gate area, diffusion per width, capacitors) and, with `sharedDiffusion`,
 * counts the node between two series transistors once: in a layout the two share one uncontacted
 * diffusion region, which is the assumption of the unit RC model (Weste & Harris, 4th ed., §4.3).
 */
export function delayCapacitances(
  netlist: Netlist,
  tech: Technology,
  sharedDiffusion: boolean,
): Map<string, CapacitanceBreakdown> {
  const names = netNames(netlist);
  const index = new Map(names.map((n, i) => [n, i]));
  const breakdown = capacitanceBreakdown(netlist, tech, index);
  const byName = new Map(names.map((n, i) => [n, breakdown[i]!]));
  if (!sharedDiffusion) return byName;
  for (const [net, widths] of seriesNodes(netlist)) {
    const b = byName.get(net) as CapacitanceBreakdown;
    byName.set(net, { ...b, diffusion: tech.cdPerWidth * Math.max(...widths) });
  }
  return byName;
}

/**
 * Nets that are only the joint of two transistor channels of the same type: no gate, capacitor,
 * pin or rail on them. Returns the two widths per such net.
 */
function seriesNodes(netlist: Netlist): Map<string, number[]> {
  const pinned = new Set<string>([...netlist.inputs, ...netlist.outputs, ...netlist.rails.map((r) => r.net)]);
  const terminals = new Map<string, MosDevice[]>();
  for (const d of netlist.devices) {
    if (d.kind === 'nmos' || d.kind === 'pmos') {
      pinned.add(d.gate);
      if (d.bulk !== undefined) pinned.add(d.bulk);
      for (const net of [d.drain, d.source]) terminals.set(net, [...(terminals.get(net) ?? []), d]);
    } else {
      for (const t of deviceTerminals(d)) pinned.add(t.net);
    }
  }
  const series = new Map<string, number[]>();
  for (const [net, devices] of terminals) {
    const [first, second] = devices;
    if (
      pinned.has(net) ||
      first === undefined ||
      second === undefined ||
      devices.length !== 2 ||
      first === second ||
      first.kind !== second.kind
    )
      continue;
    series.set(net, [first.w, second.w]);
  }
  return series;
}

export function totalCapacitance(b: CapacitanceBreakdown): number {
  return b.gate + b.diffusion + b.explicit;
}
