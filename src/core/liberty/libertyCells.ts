/**
 * What a Liberty file says about each cell that a switch-level check can use: its pins with their
 * direction, `function` and `three_state` attributes, its power and ground pins, and whether it is
 * sequential (an `ff`, `ff_bank`, `latch`, `latch_bank` or `statetable` group).
 */
import { readLibertyGroups, type LibertyGroup } from './libertyGroups.ts';
import { LibertyError } from './libertyLexer.ts';

export interface LibertyPin {
  readonly name: string;
  readonly direction: string;
  readonly function?: string;
  readonly threeState?: string;
  readonly line: number;
}

export interface PowerPin {
  readonly name: string;
  readonly role: 'supply' | 'ground';
}

export interface LibertyCell {
  readonly name: string;
  readonly line: number;
  readonly pins: readonly LibertyPin[];
  readonly powerPins: readonly PowerPin[];
  /** The group that makes the cell sequential, or null for a combinational cell. */
  readonly sequential: string | null;
}

export interface LibertyLibrary {
  readonly name: string;
  readonly cells: readonly LibertyCell[];
  /** The library's `voltage_map`: supply net names and their voltages. */
  readonly voltages: ReadonlyMap<string, number>;
}

const SEQUENTIAL = new Set(['ff', 'ff_bank', 'latch', 'latch_bank', 'statetable']);
const SUPPLY_TYPES = new Set(['primary_power', 'backup_power', 'internal_power', 'nwell', 'deepnwell']);

export function readLiberty(text: string): LibertyLibrary {
  const top = readLibertyGroups(text);
  const library = top.find((g) => g.type === 'library');
  if (library === undefined) throw new LibertyError(1, 'no library group: this is not a Liberty file');
  const voltages = voltageMap(library);
  const cells = library.groups.filter((g) => g.type === 'cell').map((g) => readCell(g, voltages));
  return { name: library.names[0] ?? '', cells, voltages };
}

/** `voltage_map (VPWR, 1.8);` at the library level: the voltage each supply name stands for. */
function voltageMap(library: LibertyGroup): Map<string, number> {
  const map = new Map<string, number>();
  for (const a of library.attributes) {
    const [name, volts] = a.values;
    if (a.name === 'voltage_map' && name !== undefined && volts !== undefined) map.set(name, Number(volts));
  }
  return map;
}

function readCell(g: LibertyGroup, voltages: ReadonlyMap<string, number>): LibertyCell {
  const sequential = g.groups.find((c) => SEQUENTIAL.has(c.type))?.type ?? null;
  const powerPins = g.groups.filter((c) => c.type === 'pg_pin').flatMap((c) => powerPin(c, voltages));
  return { name: g.names[0] ?? '', line: g.line, pins: pinsOf(g), powerPins, sequential };
}

/**
 * A power pin's role: from the voltage its `voltage_name` maps to (0 V is a ground), else from its
 * `pg_type` (power and n-well types supply, the others ground).
 */
function powerPin(g: LibertyGroup, voltages: ReadonlyMap<string, number>): PowerPin[] {
  const name = g.names[0];
  if (name === undefined) return [];
  const volts = voltages.get(attribute(g, 'voltage_name') ?? name);
  if (volts !== undefined && Number.isFinite(volts))
    return [{ name, role: volts === 0 ? 'ground' : 'supply' }];
  const type = attribute(g, 'pg_type') ?? '';
  return [{ name, role: SUPPLY_TYPES.has(type) ? 'supply' : 'ground' }];
}

/** Pins anywhere in the cell (also inside `bus` and `bundle` groups), each name of a shared group. */
function pinsOf(cell: LibertyGroup): LibertyPin[] {
  const pins: LibertyPin[] = [];
  const stack = [...cell.groups].reverse();
  while (stack.length > 0) {
    const g = stack.pop() as LibertyGroup;
    if (g.type === 'pin') pins.push(...g.names.map((name) => pinOf(g, name)));
    else if (g.type === 'bus' || g.type === 'bundle') stack.push(...[...g.groups].reverse());
  }
  return pins;
}

function pinOf(g: LibertyGroup, name: string): LibertyPin {
  const fn = attribute(g, 'function');
  const ts = attribute(g, 'three_state');
  return {
    name,
    direction: attribute(g, 'direction') ?? '',
    line: g.line,
    ...(fn === undefined ? {} : { function: fn }),
    ...(ts === undefined ? {} : { threeState: ts }),
  };
}

function attribute(g: LibertyGroup, name: string): string | undefined {
  return g.attributes.find((a) => a.name === name)?.values[0];
}
