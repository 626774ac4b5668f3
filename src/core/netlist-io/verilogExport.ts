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

interface Hops {
  readonly ground: ReadonlyMap<string, number>;
  readonly supply: ReadonlyMap<string, number>;
  readonly input: ReadonlyMap<string, number>;
}

export function exportVerilog(netlist: Netlist): string {
  const lines = [
    `// ${netlist.name}: switch-level model exported by Railwise (IEEE Std 1364-2005 clause 7 primitives).`,
    `// ${CAUTION}`,
    ...moduleLines(netlist),
  ];
  return `${lines.join('\n')}\n`;
}

/** What a module holds besides its own devices: the instances of other modules and the nets only they touch. */
export interface ModuleExtras {
  readonly nets: readonly string[];
  readonly lines: readonly string[];
}

/** One cell as a module: ports (inputs, then outputs), rails as supply nets, wires, primitives, extras. */
export function moduleLines(netlist: Netlist, extras: ModuleExtras = { nets: [], lines: [] }): string[] {
  const hops = channelHops(netlist);
  const pins = new Set([...netlist.inputs, ...netlist.outputs]);
  const rails = new Set(netlist.rails.map((r) => r.net));
  const internal = [...new Set([...netNames(netlist), ...extras.nets])].filter(
    (n) => !pins.has(n) && !rails.has(n),
  );
  const outputs = netlist.outputs.filter((n) => !netlist.inputs.includes(n));
  return [
    `module ${identifier(netlist.name || 'cell')} (${[...netlist.inputs, ...outputs].map(identifier).join(', ')});`,
    ...declaration('input', netlist.inputs),
    ...declaration('output', outputs),
    ...netlist.rails.map(
      (r) =>
        `  ${r.role === 'supply' ? 'supply1' : 'supply0'} ${identifier(r.net)};${r.volts === undefined ? '' : ` // ${r.volts} V`}`,
    ),
    ...declaration('wire', internal),
    ...netlist.devices.map((d) => `  ${instance(d, hops)}`),
    ...extras.lines.map((l) => `  ${l}`),
    'endmodule',
  ];
}

function declaration(keyword: string, nets: readonly string[]): string[] {
  return nets.length === 0 ? [] : [`  ${keyword} ${nets.map(identifier).join(', ')};`];
}

function instance(d: Device, hops: Hops): string {
  const name = identifier(d.name);
  switch (d.kind) {
    case 'nmos':
    case 'pmos':
      return mosInstance(d, name, hops);
    case 'resistor':
      return `rtran ${name} (${identifier(d.a)}, ${identifier(d.b)}); // ${d.ohms} ohm`;
    case 'capacitor':
      return `// ${d.name}: ${d.farads} F between ${d.a} and ${d.b} (no switch-level primitive; charge is held by the nets)`;
    case 'diode':
      return `// ${d.name}: protection diode from ${d.anode} to ${d.cathode} (does not conduct in steady state)`;
  }
}

function mosInstance(d: MosDevice, name: string, hops: Hops): string {
  const rail = d.kind === 'nmos' ? hops.ground : hops.supply;
  const order = nearerEnd(d, rail) || nearerEnd(d, hops.input);
  const gate = identifier(d.gate);
  if (order === 0) {
    const primitive = d.kind === 'nmos' ? 'tranif1' : 'tranif0';
    return `${primitive} ${name} (${identifier(d.drain)}, ${identifier(d.source)}, ${gate});`;
  }
  const [output, data] = order > 0 ? [d.drain, d.source] : [d.source, d.drain];
  return `${d.kind} ${name} (${identifier(output)}, ${identifier(data)}, ${gate});`;
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

/** Reserved words of IEEE Std 1364-2005 (Annex B) that a net or device name might collide with. */
const KEYWORDS = new Set(
  (
    'always and assign begin buf bufif0 bufif1 case casex casez cmos deassign default defparam disable edge else end ' +
    'endcase endfunction endmodule endprimitive endspecify endtable endtask event for force forever fork function ' +
    'highz0 highz1 if ifnone initial inout input integer join large macromodule medium module nand negedge nmos nor ' +
    'not notif0 notif1 or output parameter pmos posedge primitive pull0 pull1 pulldown pullup rcmos real realtime reg ' +
    'release repeat rnmos rpmos rtran rtranif0 rtranif1 scalared small specify specparam strong0 strong1 supply0 ' +
    'supply1 table task time tran tranif0 tranif1 tri tri0 tri1 triand trior trireg vectored wait wand weak0 weak1 ' +
    'while wire wor xnor xor generate endgenerate genvar localparam signed unsigned automatic cell config design ' +
    'endconfig incdir include instance liblist library noshowcancelled pulsestyle_ondetect pulsestyle_onevent ' +
    'showcancelled use uwire'
  ).split(' '),
);

/**
 * A simple identifier when the name is one (IEEE Std 1364-2005 3.7), otherwise an escaped
 * identifier: a backslash, the name, and a terminating space (3.7.1).
 */
export function identifier(name: string): string {
  if (/^[A-Za-z_][A-Za-z0-9_$]*$/.test(name) && !KEYWORDS.has(name)) return name;
  return `\\${name.replace(/\s/g, '_')} `;
}
