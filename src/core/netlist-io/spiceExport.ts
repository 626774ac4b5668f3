/**
 * SPICE-compatible export: one `.subckt` with W and L, level-1 (Shichman–Hodges) `.model` cards
 * (the technology's own, named by a `* railwise: technology` line, and the cards devices name), and
 * `* railwise:` directives that carry what plain SPICE cannot (pin directions, rails with unusual
 * names, expected functions, names SPICE cannot spell), so that importing the export gives back the
 * same netlist and level-1 values. No text from the design reaches the file unescaped: names become
 * identifiers (spiceNames.ts) and free text is written on one line with every control character
 * escaped, so nothing in a design can add a statement to the file.
 */
import { CAUTION } from '../caution.ts';
import type { Device, MosDevice, Netlist } from '../model/netlist.ts';
import type { Technology } from '../model/technology.ts';
import { isPrintable, printable, quoted } from '../text/printable.ts';
import { modelCards, type ExportCards } from './spiceModelExport.ts';

export { NMOS_MODEL, PMOS_MODEL } from './spiceModelExport.ts';
import { formatSpiceNumber } from '../units/spiceNumber.ts';
import type { Sheet } from '../sheet/types.ts';
import { placementLines } from './placementComments.ts';
import {
  bareRailName,
  DEFAULT_RAIL_NAMES,
  spiceIdentifier,
  spiceNames,
  type SpiceNames,
} from './spiceNames.ts';

export const DIODE_MODEL = 'rw_diode';

export interface SpiceExportOptions {
  /** Expected functions to carry as directives. */
  readonly expectations?: Readonly<Record<string, string>>;
  /** The drawing, carried in comment lines of our own (placementComments.ts). */
  readonly sheet?: Sheet;
}

export function exportSpice(netlist: Netlist, tech: Technology, options: SpiceExportOptions = {}): string {
  const expectations = options.expectations ?? {};
  const names = spiceNames(netlist, { extraNets: Object.keys(expectations) });
  const cards = modelCards(netlist, tech, spiceIdentifier);
  const lines = [
    `* ${names.cell}: exported by Railwise. ${CAUTION}`,
    ...modelLines(tech, cards, netlist.devices),
    ...subcktLines({
      netlist,
      expectations,
      names,
      modelOf: cards.modelOf,
      ...(options.sheet === undefined ? {} : { sheet: options.sheet }),
    }),
    '.end',
  ];
  return `${lines.join('\n')}\n`;
}

/** Where the models come from, the cards, and the diode's card when a device needs it. */
export function modelLines(tech: Technology, cards: ExportCards, devices: readonly Device[]): string[] {
  return [
    `* Level-1 models from: ${printable(tech.source)}`,
    ...cards.lines,
    ...(devices.some((d) => d.kind === 'diode') ? [`.model ${DIODE_MODEL} d`] : []),
  ];
}

/**
 * The ports of a cell's `.subckt` line, in order: pins, then rails in their own order (the
 * importer numbers rails in order of first appearance).
 */
export function subcktPorts(netlist: Netlist): string[] {
  const railNets = new Set(netlist.rails.map((r) => r.net));
  const pins = [...netlist.inputs, ...netlist.outputs].filter((n) => !railNets.has(n));
  return [...new Set([...pins, ...railNets])];
}

/** What one `.subckt` is written from. */
export interface SubcktSource {
  readonly netlist: Netlist;
  readonly expectations: Readonly<Record<string, string>>;
  readonly names: SpiceNames;
  readonly modelOf: (d: MosDevice) => string;
  /** Lines after the devices (a design's instances) and the directives they need. */
  readonly instances?: { readonly lines: readonly string[]; readonly directives: readonly string[] };
  /** The drawing, carried in comment lines of our own (placementComments.ts). */
  readonly sheet?: Sheet;
}

/** One cell as `.subckt` … `.ends`: its directives, its devices, then any instances. */
export function subcktLines(source: SubcktSource): string[] {
  const { netlist, names } = source;
  const net = names.net;
  const expectations = Object.entries(source.expectations);
  return [
    `.subckt ${names.cell} ${subcktPorts(netlist).map(net).join(' ')}`.trimEnd(),
    ...names.directives,
    `* railwise: inputs ${netlist.inputs.map(net).join(' ')}`.trimEnd(),
    `* railwise: outputs ${netlist.outputs.map(net).join(' ')}`.trimEnd(),
    ...railLines(netlist, net),
    ...impliedBulkLines(netlist, names),
    ...(source.instances?.directives ?? []),
    ...expectations.map(([out, text]) => `* railwise: expect ${net(out)} = ${expressionText(text)}`),
    ...(source.sheet === undefined ? [] : placementLines(source.sheet)),
    ...netlist.devices.map((d, i) => deviceLine(d, names.device(i), netlist, net, source.modelOf)),
    ...(source.instances?.lines ?? []),
    `.ends ${names.cell}`,
  ];
}

/** An expression as written when it reads back the same; otherwise as a JSON string. */
function expressionText(text: string): string {
  return isPrintable(text) && text === text.trim() && !text.startsWith('"') ? text : quoted(text);
}

/** Directives for rails the importer would not recognise by name, and V lines for explicit voltages. */
function railLines(netlist: Netlist, net: SpiceNames['net']): string[] {
  const ground = netlist.rails.find((r) => r.role === 'ground')?.net;
  const held = netlist.rails.filter((r) => r.role === 'supply' && r.volts !== undefined);
  // With no ground rail a V line refers to SPICE's node 0, which the design itself does not have.
  const reference = ground === undefined ? '0' : net(ground);
  const implied = ground === undefined && held.length > 0 ? ['* railwise: implied-ground 0'] : [];
  const lines = netlist.rails.flatMap((r) => {
    if (r.role === 'supply' && r.volts !== undefined) {
      return [`V${net(r.net)} ${net(r.net)} ${reference} DC ${formatSpiceNumber(r.volts)}`];
    }
    const known = (DEFAULT_RAIL_NAMES[r.role] as readonly string[]).includes(bareRailName(net(r.net)));
    return known ? [] : [`* railwise: ${r.role} ${net(r.net)}`];
  });
  return [...implied, ...lines];
}

function deviceLine(
  d: Device,
  element: string,
  netlist: Netlist,
  net: SpiceNames['net'],
  modelOf: (d: MosDevice) => string,
): string {
  switch (d.kind) {
    case 'nmos':
    case 'pmos':
      return mosLine(d, element, netlist, net, modelOf(d));
    case 'resistor':
      return `${element} ${net(d.a)} ${net(d.b)} ${formatSpiceNumber(d.ohms)}`;
    case 'capacitor':
      return `${element} ${net(d.a)} ${net(d.b)} ${formatSpiceNumber(d.farads)}`;
    case 'diode':
      return `${element} ${net(d.anode)} ${net(d.cathode)} ${DIODE_MODEL}`;
  }
}

/**
 * A MOS line has four nets. A device drawn without a bulk is written with the conventional rail
 * (ground for NMOS, supply for PMOS; its own source when the cell has no such rail), and this
 * directive tells our importer to leave the bulk out again.
 */
function impliedBulkLines(netlist: Netlist, names: SpiceNames): string[] {
  const implied = netlist.devices.flatMap((d, i) =>
    (d.kind === 'nmos' || d.kind === 'pmos') && d.bulk === undefined ? [names.device(i)] : [],
  );
  const lines: string[] = [];
  for (let k = 0; k < implied.length; k += 16) {
    lines.push(`* railwise: implied-bulk ${implied.slice(k, k + 16).join(' ')}`);
  }
  return lines;
}

function mosLine(
  d: MosDevice,
  element: string,
  netlist: Netlist,
  net: SpiceNames['net'],
  model: string,
): string {
  const role = d.kind === 'nmos' ? 'ground' : 'supply';
  const bulk = d.bulk ?? netlist.rails.find((r) => r.role === role)?.net ?? d.source;
  const nets = [net(d.drain), net(d.gate), net(d.source), net(bulk)].join(' ');
  return `${element} ${nets} ${model} W=${microns(d.w)} L=${microns(d.l)}`;
}

/** µm with the `u` suffix, as cell designers write them. */
function microns(value: number): string {
  const plain = String(value);
  return plain.includes('e') ? formatSpiceNumber(value, -6) : `${plain}u`;
}
