/**
 * Reads back the directives our SPICE export writes for what SPICE cannot say (spiceNames.ts,
 * spiceExport.ts): `* railwise: name net|device|cell IDENTIFIER "original"` restores a name SPICE
 * could not spell, `* railwise: implied-bulk ELEMENT…` leaves out a bulk the design never had, and
 * `* railwise: implied-ground 0` drops the node 0 a V line needed when the design has no ground.
 * A directive that does not read is noted and ignored: the cell is still usable under the names
 * in the file.
 */
import type { Device, Netlist } from '../model/netlist.ts';
import { recordOf } from '../model/records.ts';
import { unquoted } from '../text/printable.ts';
import type { Directive } from './spiceParse.ts';

export interface RestoredCell {
  readonly netlist: Netlist;
  readonly expectations: Readonly<Record<string, string>>;
  /** Line of each expected function's directive, by output. */
  readonly expectationLines: Readonly<Record<string, number>>;
}

interface Renames {
  /** By lower-case identifier: SPICE nets match without case. */
  readonly nets: Map<string, string>;
  /** By element name as written. */
  readonly devices: Map<string, string>;
  cell: string | null;
}

export function restoreExportedNames(
  cell: RestoredCell,
  directives: readonly Directive[],
  notes: string[],
): RestoredCell {
  const renames = readRenames(directives, notes);
  const implied = new Set(
    directives.filter((d) => d.key === 'implied-bulk').flatMap((d) => d.value.split(/\s+/).filter(Boolean)),
  );
  const dropped = new Set(
    directives.filter((d) => d.key === 'implied-ground').flatMap((d) => d.value.split(/\s+/).filter(Boolean)),
  );
  if (renames.nets.size + renames.devices.size + implied.size + dropped.size === 0 && renames.cell === null) {
    return cell;
  }
  const net = (n: string): string => renames.nets.get(n.toLowerCase()) ?? n;
  const { netlist } = cell;
  return {
    netlist: {
      name: renames.cell ?? netlist.name,
      devices: netlist.devices.map((d) => renameDevice(d, net, renames.devices, implied.has(d.name))),
      rails: netlist.rails.filter((r) => !dropped.has(r.net)).map((r) => ({ ...r, net: net(r.net) })),
      inputs: netlist.inputs.map(net),
      outputs: netlist.outputs.map(net),
    },
    expectations: recordOf(Object.entries(cell.expectations).map(([k, v]) => [net(k), v] as const)),
    expectationLines: recordOf(Object.entries(cell.expectationLines).map(([k, v]) => [net(k), v] as const)),
  };
}

function readRenames(directives: readonly Directive[], notes: string[]): Renames {
  const renames: Renames = { nets: new Map(), devices: new Map(), cell: null };
  for (const d of directives) {
    if (d.key !== 'name') continue;
    const m = /^(net|device|cell)\s+(\S+)\s+(".*")$/.exec(d.value);
    const original = m === null ? null : unquoted(m[3] as string);
    if (m === null || original === null) {
      notes.push(
        `line ${d.line}: a name directive reads: name net|device|cell IDENTIFIER "original"; ignored`,
      );
      continue;
    }
    const [, what, id] = m as unknown as [string, 'net' | 'device' | 'cell', string];
    if (what === 'net') renames.nets.set(id.toLowerCase(), original);
    else if (what === 'device') renames.devices.set(id, original);
    else renames.cell = original;
  }
  return renames;
}

function renameDevice(
  d: Device,
  net: (n: string) => string,
  names: ReadonlyMap<string, string>,
  dropBulk: boolean,
): Device {
  const name = names.get(d.name) ?? d.name;
  switch (d.kind) {
    case 'nmos':
    case 'pmos': {
      const { bulk, ...rest } = d;
      const base = { ...rest, name, gate: net(d.gate), drain: net(d.drain), source: net(d.source) };
      return bulk === undefined || dropBulk ? base : { ...base, bulk: net(bulk) };
    }
    case 'resistor':
    case 'capacitor':
      return { ...d, name, a: net(d.a), b: net(d.b) };
    case 'diode':
      return { ...d, name, anode: net(d.anode), cathode: net(d.cathode) };
  }
}
