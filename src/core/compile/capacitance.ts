// Indexes here are in range by construction (compiled-netlist and per-net arrays), so `!` marks them (no run-time cost).
import type { Netlist } from '../model/netlist.ts';
import type { Technology } from '../model/technology.ts';

/** What makes up one net's capacitance, farads. */
export interface CapacitanceBreakdown {
  readonly gate: number;
  readonly diffusion: number;
  readonly explicit: number;
}

/**
 * Each net's capacitance broken down by origin: gate area (Cox·W·L of every gate on it), drain and
 * source diffusion (per µm of width), and capacitors. A capacitor between two nets is counted on each
 * of them as a load to ground: a switch-level approximation of a floating capacitor.
 */
export function capacitanceBreakdown(
  netlist: Netlist,
  tech: Technology,
  netIndex: ReadonlyMap<string, number>,
): CapacitanceBreakdown[] {
  const { gate, diffusion, explicit } = capacitanceParts(netlist, tech, netIndex);
  return Array.from(gate, (g, i) => ({ gate: g, diffusion: diffusion[i]!, explicit: explicit[i]! }));
}

/** Each net's total capacitance to ground, farads. */
export function netCapacitances(
  netlist: Netlist,
  tech: Technology,
  netIndex: ReadonlyMap<string, number>,
): Float64Array {
  const { gate, diffusion, explicit } = capacitanceParts(netlist, tech, netIndex);
  for (let i = 0; i < gate.length; i++) gate[i]! += diffusion[i]! + explicit[i]!;
  return gate;
}

function capacitanceParts(netlist: Netlist, tech: Technology, netIndex: ReadonlyMap<string, number>) {
  const gate = new Float64Array(netIndex.size);
  const diffusion = new Float64Array(netIndex.size);
  const explicit = new Float64Array(netIndex.size);
  const at = (n: string): number => netIndex.get(n) as number;
  for (const d of netlist.devices) {
    switch (d.kind) {
      case 'nmos':
      case 'pmos':
        gate[at(d.gate)]! += tech.cgPerArea * d.w * d.l;
        diffusion[at(d.drain)]! += tech.cdPerWidth * d.w;
        diffusion[at(d.source)]! += tech.cdPerWidth * d.w;
        break;
      case 'capacitor':
        explicit[at(d.a)]! += d.farads;
        if (d.b !== d.a) explicit[at(d.b)]! += d.farads;
        break;
      case 'resistor':
      case 'diode':
        break;
    }
  }
  return { gate, diffusion, explicit };
}
