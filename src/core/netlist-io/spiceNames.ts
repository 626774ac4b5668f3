/**
 * How names travel through a SPICE export. A SPICE reader splits a line at white space, reads
 * `= ( ) , $ ; ' " { }` as syntax, takes a line starting with `*`, `+` or `.` as a comment, a
 * continuation or a command, ignores case, and knows nets called `0`, `gnd`, `vss`, `vdd` and `vcc`
 * as rails. Names that would be misread are replaced by identifiers that cannot be, and the file
 * lists each replacement as a `* railwise: name` directive holding the original as a JSON string,
 * so our importer gives back every name exactly while other readers see a comment.
 */
import type { Netlist, Rail } from '../model/netlist.ts';
import { netNames } from '../model/netlist.ts';
import { quoted } from '../text/printable.ts';
import {
  exportNames,
  identifierMap,
  MAX_IDENTIFIER_LENGTH,
  type ExportedNames,
  type IdentifierRules,
} from './exportNames.ts';

/** Net names the importer takes as rails without being told (see spiceImport.ts). */
export const DEFAULT_RAIL_NAMES = { ground: ['0', 'gnd', 'vss'], supply: ['vdd', 'vcc'] } as const;

/** Lower case with a trailing `!` dropped: how the importer compares rail names. */
export function bareRailName(name: string): string {
  return name.toLowerCase().replace(/!$/, '');
}

export function railRoleByName(name: string): 'supply' | 'ground' | null {
  const bare = bareRailName(name);
  if ((DEFAULT_RAIL_NAMES.ground as readonly string[]).includes(bare)) return 'ground';
  if ((DEFAULT_RAIL_NAMES.supply as readonly string[]).includes(bare)) return 'supply';
  return null;
}

/**
 * Printable ASCII other than SPICE syntax, not starting like a comment, continuation or command,
 * and not a lone `/` (CDL's separator between an instance's nets and its subcircuit).
 */
export function spiceIdentifier(name: string): string {
  const t = name.slice(0, MAX_IDENTIFIER_LENGTH).replace(/[^\x21-\x7e]|[=(),$;'"{}\\]/g, '_');
  return /^[*+.]/.test(t) || t === '/' ? `_${t}` : t;
}

export const sameAs = (id: string): string => id.toLowerCase();

/** Element names start with their kind's letter: `N1` becomes `MN1`. */
function elementRules(letter: string): IdentifierRules {
  return {
    legal: (name) => {
      const t = spiceIdentifier(name);
      return t.charAt(0).toUpperCase() === letter ? t : `${letter}${t}`;
    },
    sameAs,
    reserved: () => false,
  };
}

const ELEMENT_LETTER = { nmos: 'M', pmos: 'M', resistor: 'R', capacitor: 'C', diode: 'D' } as const;

export interface SpiceNames {
  readonly cell: string;
  readonly net: (name: string) => string;
  /** Element name of the device at this index. */
  readonly device: (index: number) => string;
  /** Element name of the instance at this index (`SpiceNameOptions.instances`). */
  readonly instance: (index: number) => string;
  /** Identifiers for new nets, one per base name, that no net of the cell takes. */
  readonly fresh: (bases: readonly string[]) => readonly string[];
  /** `* railwise: name …` lines for every name that changed. */
  readonly directives: readonly string[];
}

export interface SpiceNameOptions {
  /** Names besides the netlist's own nets: outputs of expected functions, nets only instances wire. */
  readonly extraNets?: readonly string[];
  /** Names of the instances the cell places (`X` elements). */
  readonly instances?: readonly string[];
  /** The cell's identifier, when the caller gives every cell of a design one of its own. */
  readonly cell?: string;
  /** The cell's global nets besides its rails (`Cell.globals`). */
  readonly globals?: readonly string[];
  /** How the file names rails and globals, when several cells share it. */
  readonly fileNets?: FileNets;
}

/**
 * Rails and global nets are named alike in every cell of a file: a reader takes a `supply`,
 * `ground` or `.global` name as such in every subcircuit. A design's export gives each one an
 * identifier over the whole design (spiceDesignExport.ts), and no other net takes those.
 */
export interface FileNets {
  readonly id: (net: string, role: Rail['role'] | 'global') => string;
  /** Lower-case identifiers that only those nets may take. */
  readonly reserved: ReadonlySet<string>;
}

/** Identifiers for a netlist's cell, nets (and expected-function outputs) and devices. */
export function spiceNames(netlist: Netlist, options: SpiceNameOptions = {}): SpiceNames {
  const fixed = fixedNets(netlist, options);
  const fixedSet = new Set(fixed.names);
  const extra = options.extraNets ?? [];
  const others = [...new Set([...netNames(netlist), ...extra])].filter((n) => !fixedSet.has(n));
  const fileWide = options.fileNets?.reserved;
  // A name a reader takes as a rail, or as global (a `!` at its end), would join nets it should not.
  const netRules: IdentifierRules = {
    legal: spiceIdentifier,
    sameAs,
    reserved: (id) => railRoleByName(id) !== null || id.endsWith('!') || fileWide?.has(sameAs(id)) === true,
  };
  const nets = exportNames(others, netRules, fixed.identifiers.map(sameAs));
  const netOf = new Map([...identifierMap(fixed.names, fixed), ...identifierMap(others, nets)]);
  const taken = [...fixed.identifiers, ...nets.identifiers].map(sameAs);
  const devices = deviceNames(netlist);
  const instances = exportNames(options.instances ?? [], elementRules('X'));
  const cell = cellName(netlist.name, options.cell);
  const line = (what: string, [original, id]: readonly [string, string]): string =>
    `* railwise: name ${what} ${id} ${quoted(original)}`;
  return {
    cell: cell.id,
    net: (name) => netOf.get(name) ?? spiceIdentifier(name),
    device: (index) => devices.identifiers[index] as string,
    instance: (index) => instances.identifiers[index] as string,
    fresh: (bases) => exportNames(bases, netRules, taken).identifiers,
    directives: [
      ...cell.renamed.map((r) => line('cell', r)),
      ...fixed.renamed.map((r) => line('net', r)),
      ...nets.renamed.map((r) => line('net', r)),
      ...devices.renamed.map((r) => line('device', r)),
      ...instances.renamed.map((r) => line('instance', r)),
    ],
  };
}

/** Rails (and a design's global nets): named by the file when it says how, else within the cell. */
function fixedNets(netlist: Netlist, options: SpiceNameOptions): ExportedNames & { names: string[] } {
  const railNets = netlist.rails.map((r) => r.net);
  const { fileNets } = options;
  if (fileNets === undefined) return { names: railNets, ...cellRails(netlist) };
  const railSet = new Set(railNets);
  const globals = (options.globals ?? []).filter((g) => !railSet.has(g));
  const names = [...railNets, ...globals];
  const identifiers = [
    ...netlist.rails.map((r) => fileNets.id(r.net, r.role)),
    ...globals.map((g) => fileNets.id(g, 'global')),
  ];
  const renamed = names.flatMap((n, i) =>
    identifiers[i] === n ? [] : [[n, identifiers[i] as string] as const],
  );
  return { names, identifiers, renamed };
}

/** A cell's rails named within the cell: a supply called `gnd` would come back a ground, so it is renamed. */
function cellRails(netlist: Netlist): ExportedNames {
  return exportNames(
    netlist.rails.map((r) => r.net),
    {
      legal: spiceIdentifier,
      sameAs,
      reserved: (id) => {
        const role = netlist.rails.find((r) => r.net === id)?.role;
        const byName = railRoleByName(id);
        return byName !== null && byName !== role;
      },
    },
  );
}

/** The cell's identifier (the caller's, or its own name made legal) and the directive it needs. */
function cellName(
  name: string,
  given: string | undefined,
): { id: string; renamed: (readonly [string, string])[] } {
  const id = given ?? (spiceCellNames([name])[0] as string);
  return { id, renamed: id === name ? [] : [[name, id]] };
}

/** Identifiers for the cells of a design: legal, and distinct as SPICE compares subcircuit names. */
export function spiceCellNames(names: readonly string[]): readonly string[] {
  return exportNames(names, { legal: (n) => spiceIdentifier(n || 'cell'), sameAs, reserved: () => false })
    .identifiers;
}

/** Element names, unique per kind letter (different letters never clash), in device order. */
function deviceNames(netlist: Netlist): { identifiers: string[]; renamed: (readonly [string, string])[] } {
  const identifiers: string[] = new Array<string>(netlist.devices.length);
  const renamed: (readonly [string, string])[] = [];
  for (const letter of ['M', 'R', 'C', 'D']) {
    const indexes = netlist.devices.flatMap((d, i) => (ELEMENT_LETTER[d.kind] === letter ? [i] : []));
    const names = indexes.map((i) => netlist.devices[i]?.name ?? '');
    const exported = exportNames(names, elementRules(letter));
    indexes.forEach((i, k) => (identifiers[i] = exported.identifiers[k] as string));
    renamed.push(...exported.renamed);
  }
  return { identifiers, renamed };
}
