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
import { unquoted } from '../text/printable.ts';
import type { Directive, Subckt } from './spiceParse.ts';

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

/**
 * The names one subcircuit's directives give. `cellNets` are the subcircuit's nets as the file spells
 * them: a net directive that would give two of them one name (a hand-edited file) is ignored, noted.
 */
export function readExportedNames(
  directives: readonly Directive[],
  notes: string[],
  cellNets: readonly string[] = [],
): ExportedNames {
  const { nets, elements, cell } = parseRenames(directives, notes);
  const words = (key: string): Set<string> =>
    new Set(directives.filter((d) => d.key === key).flatMap((d) => d.value.split(/\s+/).filter(Boolean)));
  const impliedBulk = words('implied-bulk');
  const impliedGround = words('implied-ground');
  // The node 0 a V line needed is dropped: it takes no name from the cell's nets.
  keepDistinct(
    nets,
    cellNets.filter((n) => !impliedGround.has(n)),
    notes,
  );
  return {
    net: (n) => nets.get(n.toLowerCase()) ?? n,
    element: (n) => elements.get(n) ?? n,
    cell,
    impliedBulk,
    impliedGround,
    none: nets.size + elements.size + impliedBulk.size + impliedGround.size === 0 && cell === null,
  };
}

interface Renames {
  /** By lower-case identifier: SPICE nets match without case. */
  readonly nets: Map<string, string>;
  /** Devices and instances by element name as written. */
  readonly elements: Map<string, string>;
  readonly cell: string | null;
}

function parseRenames(directives: readonly Directive[], notes: string[]): Renames {
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
  return { nets, elements, cell };
}

/** Drops net renames until no two nets of the cell share a name. */
function keepDistinct(renames: Map<string, string>, cellNets: readonly string[], notes: string[]): void {
  for (let pass = 0; pass <= renames.size; pass++) {
    const owner = new Map<string, string>();
    let clash: readonly [string, string, string] | null = null;
    for (const n of cellNets) {
      const name = renames.get(n.toLowerCase()) ?? n;
      const before = owner.get(name);
      if (before !== undefined && before.toLowerCase() !== n.toLowerCase()) {
        clash = [name, before, n];
        break;
      }
      owner.set(name, n);
    }
    if (clash === null) return;
    const [name, ...nets] = clash;
    // Undo whichever of the two was renamed (both, when both were).
    for (const n of nets)
      if (renames.delete(n.toLowerCase()))
        notes.push(`a name directive would call two nets ${JSON.stringify(name)}; ${n} keeps its own name`);
  }
}

/**
 * Each subcircuit's cell name, by its lower-case name in the file: the one its `name cell`
 * directive gives, unless two cells would then share a name (that directive is ignored, noted).
 */
export function restoredCellNames(subckts: readonly Subckt[], notes: string[]): Map<string, string> {
  const names = subckts.map((s) => {
    const d = [...s.directives].reverse().find((x) => x.key === 'name' && /^cell\s/.test(x.value));
    const m = d === undefined ? null : /^cell\s+\S+\s+(".*")$/.exec(d.value);
    return (m === null ? null : unquoted(m[1] as string)) ?? s.name;
  });
  // Each pass gives at least one cell back its name in the file; those are distinct.
  for (let pass = 0; pass < subckts.length; pass++) {
    const count = new Map<string, number>();
    names.forEach((n) => count.set(n, (count.get(n) ?? 0) + 1));
    const clashing = subckts.flatMap((s, i) =>
      count.get(names[i] as string) === 1 || names[i] === s.name ? [] : [i],
    );
    if (clashing.length === 0) break;
    for (const i of clashing) {
      const s = subckts[i] as Subckt;
      notes.push(
        `${s.name}: its name directive would give two cells the name ${JSON.stringify(names[i])}; ignored`,
      );
      names[i] = s.name;
    }
  }
  return new Map(subckts.map((s, i) => [s.name.toLowerCase(), names[i] as string]));
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
