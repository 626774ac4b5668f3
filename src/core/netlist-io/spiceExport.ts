/**
 * SPICE-compatible export: one `.subckt` with W and L, level-1 (Shichman–Hodges) `.model` cards
 * from the design's technology, and `* railwise:` directives that carry what plain SPICE cannot
 * (pin directions, rails with unusual names, expected functions), so that importing the export
 * gives back the same netlist.
 */
import { CAUTION } from '../caution.ts';
import type { Device, MosDevice, Netlist } from '../model/netlist.ts';
import type { Technology } from '../model/technology.ts';
import { formatSpiceNumber } from './spiceNumber.ts';

export const NMOS_MODEL = 'rw_nmos';
export const PMOS_MODEL = 'rw_pmos';
export const DIODE_MODEL = 'rw_diode';

/** Net names the importer takes as rails without being told (see spiceImport.ts). */
const DEFAULT_RAIL_NAMES = { ground: ['0', 'gnd', 'vss'], supply: ['vdd', 'vcc'] };

export interface SpiceExportOptions {
  /** Expected functions to carry as directives. */
  readonly expectations?: Readonly<Record<string, string>>;
}

export function exportSpice(netlist: Netlist, tech: Technology, options: SpiceExportOptions = {}): string {
  const cell = token(netlist.name || 'cell');
  const lines = [
    `* ${cell}: exported by Railwise. ${CAUTION}`,
    ...modelLines(
      tech,
      netlist.devices.some((d) => d.kind === 'diode'),
    ),
    ...subcktLines(netlist, options.expectations ?? {}),
    '.end',
  ];
  return `${lines.join('\n')}\n`;
}

/** Level-1 model cards from the technology (and the diode's, when a cell has one). */
export function modelLines(tech: Technology, diode: boolean): string[] {
  return [
    `* Level-1 models from: ${tech.source}`,
    `.model ${NMOS_MODEL} nmos (level=1 vto=${tech.vtn} kp=${formatSpiceNumber(tech.kpn)})`,
    `.model ${PMOS_MODEL} pmos (level=1 vto=${-tech.vtp} kp=${formatSpiceNumber(tech.kpp)})`,
    ...(diode ? [`.model ${DIODE_MODEL} d`] : []),
  ];
}

/** The ports of a cell's `.subckt` line, in order: inputs, outputs, rails. */
export function subcktPorts(netlist: Netlist): string[] {
  return unique([...netlist.inputs, ...netlist.outputs, ...netlist.rails.map((r) => r.net)]);
}

/** One cell as `.subckt` … `.ends`, with its directives, devices and any further lines (instances). */
export function subcktLines(
  netlist: Netlist,
  expectations: Readonly<Record<string, string>>,
  more: readonly string[] = [],
): string[] {
  const cell = token(netlist.name || 'cell');
  return [
    `.subckt ${cell} ${subcktPorts(netlist).map(token).join(' ')}`.trimEnd(),
    `* railwise: inputs ${netlist.inputs.map(token).join(' ')}`.trimEnd(),
    `* railwise: outputs ${netlist.outputs.map(token).join(' ')}`.trimEnd(),
    ...railLines(netlist),
    ...Object.entries(expectations).map(([out, expr]) => `* railwise: expect ${out} = ${expr}`),
    ...netlist.devices.map((d) => deviceLine(d, netlist)),
    ...more,
    `.ends ${cell}`,
  ];
}

/** Directives for rails the importer would not recognise by name, and V lines for explicit voltages. */
function railLines(netlist: Netlist): string[] {
  const ground = netlist.rails.find((r) => r.role === 'ground')?.net ?? '0';
  return netlist.rails.flatMap((r) => {
    if (r.role === 'supply' && r.volts !== undefined) {
      return [`V${token(r.net)} ${token(r.net)} ${token(ground)} DC ${formatSpiceNumber(r.volts)}`];
    }
    const known = DEFAULT_RAIL_NAMES[r.role].includes(r.net.toLowerCase().replace(/!$/, ''));
    return known ? [] : [`* railwise: ${r.role} ${token(r.net)}`];
  });
}

function deviceLine(d: Device, netlist: Netlist): string {
  switch (d.kind) {
    case 'nmos':
    case 'pmos':
      return mosLine(d, netlist);
    case 'resistor':
      return `${elementName('R', d.name)} ${token(d.a)} ${token(d.b)} ${formatSpiceNumber(d.ohms)}`;
    case 'capacitor':
      return `${elementName('C', d.name)} ${token(d.a)} ${token(d.b)} ${formatSpiceNumber(d.farads)}`;
    case 'diode':
      return `${elementName('D', d.name)} ${token(d.anode)} ${token(d.cathode)} ${DIODE_MODEL}`;
  }
}

function mosLine(d: MosDevice, netlist: Netlist): string {
  const role = d.kind === 'nmos' ? 'ground' : 'supply';
  const bulk = d.bulk ?? netlist.rails.find((r) => r.role === role)?.net ?? (role === 'ground' ? '0' : 'vdd');
  const model = d.kind === 'nmos' ? NMOS_MODEL : PMOS_MODEL;
  const nets = [d.drain, d.gate, d.source, bulk].map(token).join(' ');
  return `${elementName('M', d.name)} ${nets} ${model} W=${microns(d.w)} L=${microns(d.l)}`;
}

/** SPICE knows an element by its first letter: `N1` becomes `MN1`. */
export function elementName(letter: string, name: string): string {
  const t = token(name);
  return t.charAt(0).toUpperCase() === letter ? t : `${letter}${t}`;
}

/** µm with the `u` suffix, as cell designers write them. */
function microns(value: number): string {
  const plain = String(value);
  return plain.includes('e') ? formatSpiceNumber(value, -6) : `${plain}u`;
}

/** SPICE splits on white space and reads `= ( ) , $ ;` as syntax: those become `_`. */
export function token(name: string): string {
  const t = name.replace(/[\s=(),$;]/g, '_');
  return /^[*+.]/.test(t) ? `_${t}` : t;
}

function unique(names: readonly string[]): string[] {
  return [...new Set(names)];
}
