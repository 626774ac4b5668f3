/**
 * Reads back the directives our SPICE export writes for what SPICE cannot say (spiceNames.ts,
 * spiceExport.ts): `* railwise: name net|device|instance|cell IDENTIFIER "original"` restores a
 * name SPICE could not spell, `* railwise: implied-bulk ELEMENT…` leaves out a bulk the design never
 * had, and `* railwise: implied-ground 0` drops the node 0 a V line needed when the design has no
 * ground. A directive that does not read is noted and ignored: the cell is still usable under the
 * names in the file. Each subcircuit carries its own directives, so every cell of a hierarchy is
 * restored by its own, and an instance takes the restored names of the cell it places.
 */
import type { Instance } from '../model/design.ts';
import type { Device, Netlist } from '../model/netlist.ts';
import { recordOf } from '../model/records.ts';
import { unquoted } from '../format/printable.ts';
import type { Directive } from './spiceParse.ts';

export interface RestoredCell {
  readonly netlist: Netlist;
  readonly expectations: Readonly<Record<string, string>>;
  /** Line of each expected function's directive, by output. */
  readonly expectationLines: Readonly<Record<string, number>>;
}

/** What one subcircuit's directives say about its names, read once. */
export interface ExportedNames {
  /** A net as the design names it (SPICE nets match without case). */
  readonly net: (name: string) => string;
  /** A device or instance as the design names it, by element name as written. */
  readonly element: (name: string) => string;
  /** The cell's own name, or null when the file's is the design's. */
  readonly cell: string | null;
  /** Elements written with a bulk the design never had. */
  readonly impliedBulk: ReadonlySet<string>;
  /** Nets that only a V line needed (SPICE's node 0 in a design without a ground). */
  readonly impliedGround: ReadonlySet<string>;
  /** True when no directive renames or drops anything. */
  readonly none: boolean;
}

export function readExportedNames(directives: readonly Directive[], notes: string[]): ExportedNames {
  const nets = new Map<string, string>();
  const elements = new Map<string, string>();
  let cell: string | null = null;
  for (const d of directives) {
    if (d.key !== 'name') continue;
    const m = /^(net|device|instance|cell)\s+(\S+)\s+(".*")$/.exec(d.value);
    const original = m === null ? null : unquoted(m[3] as string);
    if (m === null || original === null) {
      notes.push(
        `line ${d.line}: a name directive reads: name net|device|instance|cell IDENTIFIER "original"; ignored`,
      );
      continue;
    }
    const [, what, id] = m as unknown as [string, 'net' | 'device' | 'instance' | 'cell', string];
    if (what === 'net') nets.set(id.toLowerCase(), original);
    else if (what === 'cell') cell = original;
    else elements.set(id, original);
  }
  const words = (key: string): Set<string> =>
    new Set(directives.filter((d) => d.key === key).flatMap((d) => d.value.split(/\s+/).filter(Boolean)));
  const impliedBulk = words('implied-bulk');
  const impliedGround = words('implied-ground');
  return {
    net: (n) => nets.get(n.toLowerCase()) ?? n,
    element: (n) => elements.get(n) ?? n,
    cell,
    impliedBulk,
    impliedGround,
    none: nets.size + elements.size + impliedBulk.size + impliedGround.size === 0 && cell === null,
  };
}

/** One cell under the names its directives give. */
export function restoreExportedNames(cell: RestoredCell, names: ExportedNames): RestoredCell {
  if (names.none) return cell;
  const { net } = names;
  const { netlist } = cell;
  return {
    netlist: {
      name: names.cell ?? netlist.name,
      devices: netlist.devices.map((d) => renameDevice(d, names)),
      rails: netlist.rails
        .filter((r) => !names.impliedGround.has(r.net))
        .map((r) => ({ ...r, net: net(r.net) })),
      inputs: netlist.inputs.map(net),
      outputs: netlist.outputs.map(net),
    },
    expectations: recordOf(Object.entries(cell.expectations).map(([k, v]) => [net(k), v] as const)),
    expectationLines: recordOf(Object.entries(cell.expectationLines).map(([k, v]) => [net(k), v] as const)),
  };
}

/** The placed cell as restored: its name, and how its pins (nets as the file spells them) read. */
export interface PlacedNames {
  readonly cell: string;
  readonly net: (name: string) => string;
}

/** An instance under the restored names: its own (parent's directives), its pins (the placed cell's). */
export function restoreInstance(instance: Instance, names: ExportedNames, placed: PlacedNames): Instance {
  const pins = Object.entries(instance.pins).map(([pin, net]) => [placed.net(pin), names.net(net)] as const);
  return { name: names.element(instance.name), cell: placed.cell, pins: recordOf(pins) };
}

function renameDevice(d: Device, names: ExportedNames): Device {
  const { net } = names;
  const name = names.element(d.name);
  switch (d.kind) {
    case 'nmos':
    case 'pmos': {
      const { bulk, ...rest } = d;
      const base = { ...rest, name, gate: net(d.gate), drain: net(d.drain), source: net(d.source) };
      return bulk === undefined || names.impliedBulk.has(d.name) ? base : { ...base, bulk: net(bulk) };
    }
    case 'resistor':
    case 'capacitor':
      return { ...d, name, a: net(d.a), b: net(d.b) };
    case 'diode':
      return { ...d, name, anode: net(d.anode), cathode: net(d.cathode) };
  }
}
