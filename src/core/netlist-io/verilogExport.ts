/**
 * Structural Verilog with the switch-level primitives of IEEE Std 1364-2005, clause 7:
 * `nmos`/`pmos` (terminals: output, data input, control), `tranif1`/`tranif0` (bidirectional pass
 * switches: inout, inout, control), `rtran` for resistors, and `supply1`/`supply0` nets for rails.
 *
 * A MOS primitive passes signal one way only, so each transistor is oriented. Its data terminal is
 * the end nearer (in channel hops) to the rail it naturally passes: ground for an NMOS, the supply
 * for a PMOS; failing that, nearer to an input pin. When both ends are equally near (a pass device
 * between two equally driven nets) the direction is unknowable and it becomes a bidirectional
 * `tranif` switch.
 */
import { CAUTION } from '../caution.ts';
import type { Device, MosDevice, Netlist } from '../model/netlist.ts';
import { channelNets, netNames } from '../model/netlist.ts';
import { printable } from '../text/printable.ts';
import { verilogNames, type VerilogNames } from './verilogNames.ts';

interface Hops {
  readonly ground: ReadonlyMap<string, number>;
  readonly supply: ReadonlyMap<string, number>;
  readonly input: ReadonlyMap<string, number>;
}

export function exportVerilog(netlist: Netlist): string {
  const lines = [
    `// ${printable(netlist.name)}: switch-level model exported by Railwise (IEEE Std 1364-2005 clause 7 primitives).`,
    `// ${CAUTION}`,
    ...moduleLines(netlist),
  ];
  return `${lines.join('\n')}\n`;
}

/**
 * One cell as a module: renamed names, ports (inputs, then outputs), rails as supply nets, wires,
 * primitives, then any further lines (a design's instances, written with the same `names`).
 */
export function moduleLines(
  netlist: Netlist,
  names: VerilogNames = verilogNames(netlist),
  more: readonly string[] = [],
  extraNets: readonly string[] = [],
): string[] {
  const hops = channelHops(netlist);
  const id = names.net;
  const pins = new Set([...netlist.inputs, ...netlist.outputs]);
  const rails = new Set(netlist.rails.map((r) => r.net));
  const internal = [...new Set([...netNames(netlist), ...extraNets])].filter(
    (n) => !pins.has(n) && !rails.has(n),
  );
  const outputs = netlist.outputs.filter((n) => !netlist.inputs.includes(n));
  return [
    ...names.comments,
    `module ${names.module} (${[...netlist.inputs, ...outputs].map(id).join(', ')});`,
    ...declaration('input', netlist.inputs.map(id)),
    ...declaration('output', outputs.map(id)),
    ...netlist.rails.map(
      (r) =>
        `  ${r.role === 'supply' ? 'supply1' : 'supply0'} ${id(r.net)};${r.volts === undefined ? '' : ` // ${r.volts} V`}`,
    ),
    ...declaration('wire', internal.map(id)),
    ...netlist.devices.map((d, i) => `  ${instance(d, names.instance(i), id, hops)}`),
    ...more.map((l) => `  ${l}`),
    'endmodule',
  ];
}

function declaration(keyword: string, identifiers: readonly string[]): string[] {
  return identifiers.length === 0 ? [] : [`  ${keyword} ${identifiers.join(', ')};`];
}

type Identify = (net: string) => string;

function instance(d: Device, name: string, id: Identify, hops: Hops): string {
  switch (d.kind) {
    case 'nmos':
    case 'pmos':
      return mosInstance(d, name, id, hops);
    case 'resistor':
      return `rtran ${name} (${id(d.a)}, ${id(d.b)}); // ${d.ohms} ohm`;
    case 'capacitor':
      return `// ${printable(d.name)}: ${d.farads} F between ${printable(d.a)} and ${printable(d.b)} (no switch-level primitive; charge is held by the nets)`;
    case 'diode':
      return `// ${printable(d.name)}: protection diode from ${printable(d.anode)} to ${printable(d.cathode)} (does not conduct in steady state)`;
  }
}

function mosInstance(d: MosDevice, name: string, id: Identify, hops: Hops): string {
  const rail = d.kind === 'nmos' ? hops.ground : hops.supply;
  const order = nearerEnd(d, rail) || nearerEnd(d, hops.input);
  const gate = id(d.gate);
  if (order === 0) {
    const primitive = d.kind === 'nmos' ? 'tranif1' : 'tranif0';
    return `${primitive} ${name} (${id(d.drain)}, ${id(d.source)}, ${gate});`;
  }
  const [output, data] = order > 0 ? [d.drain, d.source] : [d.source, d.drain];
  return `${d.kind} ${name} (${id(output)}, ${id(data)}, ${gate});`;
}

/** +1 when the source end is nearer (it is the data input), -1 when the drain is, 0 for a tie. */
function nearerEnd(d: MosDevice, hops: ReadonlyMap<string, number>): number {
  const far = Number.MAX_SAFE_INTEGER;
  return Math.sign((hops.get(d.drain) ?? far) - (hops.get(d.source) ?? far));
}

/** Channel hops to the nearest ground, supply and input pin; a search never passes through a rail or pin. */
function channelHops(netlist: Netlist): Hops {
  const neighbours = new Map<string, string[]>();
  for (const d of netlist.devices) {
    const ends = channelNets(d);
    if (ends === null) continue;
    const [a, b] = ends;
    neighbours.set(a, [...(neighbours.get(a) ?? []), b]);
    neighbours.set(b, [...(neighbours.get(b) ?? []), a]);
  }
  const driven = new Set([...netlist.rails.map((r) => r.net), ...netlist.inputs]);
  const search = (starts: readonly string[]): Map<string, number> => {
    const distance = new Map(starts.map((s) => [s, 0]));
    const queue = [...starts];
    for (let i = 0; i < queue.length; i++) {
      const net = queue[i] as string;
      if (i >= starts.length && driven.has(net)) continue;
      for (const n of neighbours.get(net) ?? []) {
        if (distance.has(n)) continue;
        distance.set(n, (distance.get(net) ?? 0) + 1);
        queue.push(n);
      }
    }
    return distance;
  };
  const railsOf = (role: 'ground' | 'supply'): string[] =>
    netlist.rails.filter((r) => r.role === role).map((r) => r.net);
  return {
    ground: search(railsOf('ground')),
    supply: search(railsOf('supply')),
    input: search(netlist.inputs),
  };
}

export { identifier } from './verilogNames.ts';
