/**
 * Edits that keep a design's hierarchy whole: renaming a cell or one of its pins updates every
 * instance that places it, in every cell (docs/semantics.md §1, hierarchy).
 */
import type { Cell, Design } from '../document/design.ts';
import type { Instance } from '../model/design.ts';
import { mapDeviceNets, type Netlist } from '../model/netlist.ts';
import { refreshSymbols } from './instanceParts.ts';

/** Thrown when an edit would break the design (a name taken, a pin that does not exist). */
export class HierarchyEditError extends Error {
  override readonly name = 'HierarchyEditError';
}

function placing(design: Design, cell: string, edit: (i: Instance) => Instance): Design {
  return {
    ...design,
    cells: design.cells.map((c) =>
      c.instances.some((i) => i.cell === cell)
        ? { ...c, instances: c.instances.map((i) => (i.cell === cell ? edit(i) : i)) }
        : c,
    ),
  };
}

/** Every cell's symbols showing the cells as they now are, `from` renamed `to` (instanceParts.ts). */
function withSymbols(
  cells: readonly Cell[],
  from: string,
  to: string,
  netlists: ReadonlyMap<string, Netlist> = new Map(cells.map((c) => [c.name, c.netlist])),
): Cell[] {
  const rename = (name: string): string => (name === from ? to : name);
  return cells.map((c) => {
    if (c.sheet === undefined || !c.instances.some((i) => i.cell === to)) return c;
    const sheet = refreshSymbols(c.sheet, (name) => netlists.get(name), rename);
    return sheet === c.sheet ? c : { ...c, sheet };
  });
}

/** Renames a cell; instances of it follow, and so does `open`. */
export function renameCell(design: Design, from: string, to: string): Design {
  if (from === to) return design;
  if (to === '') throw new HierarchyEditError('a cell needs a name');
  if (design.cells.some((c) => c.name === to)) throw new HierarchyEditError(`a cell is already named ${to}`);
  const renamed = placing(design, from, (i) => ({ ...i, cell: to }));
  const cells = renamed.cells.map((c) =>
    c.name === from ? { ...c, name: to, netlist: { ...c.netlist, name: to } } : c,
  );
  return { ...renamed, open: design.open === from ? to : design.open, cells: withSymbols(cells, from, to) };
}

/**
 * Renames a pin (an input, output or rail net) of one cell: its own netlist, its expected functions'
 * keys, and the pin key of every instance that places it.
 */
export function renamePin(design: Design, cellName: string, from: string, to: string): Design {
  const cell = design.cells.find((c) => c.name === cellName);
  if (cell === undefined) throw new HierarchyEditError(`no cell named ${cellName}`);
  if (from === to) return design;
  const nets = new Set([
    ...cell.netlist.inputs,
    ...cell.netlist.outputs,
    ...cell.netlist.rails.map((r) => r.net),
  ]);
  if (!nets.has(from)) throw new HierarchyEditError(`${cellName} has no pin ${from}`);
  if (nets.has(to)) throw new HierarchyEditError(`${cellName} already has a pin ${to}`);
  const withPin = placing(design, cellName, (i) => {
    if (!Object.hasOwn(i.pins, from)) return i;
    const { [from]: net, ...rest } = i.pins;
    return { ...i, pins: { ...rest, [to]: net as string } };
  });
  const cells = withPin.cells.map((c) => (c.name === cellName ? renamedPinCell(c, from, to) : c));
  return { ...withPin, cells: withSymbols(cells, cellName, cellName) };
}

function renamedPinCell(cell: Cell, from: string, to: string): Cell {
  const rename = (n: string): string => (n === from ? to : n);
  const netlist: Netlist = {
    ...cell.netlist,
    devices: cell.netlist.devices.map((d) => mapDeviceNets(d, rename)),
    rails: cell.netlist.rails.map((r) => ({ ...r, net: rename(r.net) })),
    inputs: cell.netlist.inputs.map(rename),
    outputs: cell.netlist.outputs.map(rename),
  };
  const expectations = Object.fromEntries(Object.entries(cell.expectations).map(([k, v]) => [rename(k), v]));
  return {
    ...cell,
    netlist,
    expectations,
    instances: cell.instances.map((i) => ({
      ...i,
      pins: Object.fromEntries(Object.entries(i.pins).map(([p, n]) => [p, rename(n)])),
    })),
  };
}

/**
 * Old → new names of the pins that changed in place: same count of inputs (and of outputs), a name
 * at one position that is new. A pin added or removed is no rename.
 */
export function renamedPins(before: Netlist, after: Netlist): Map<string, string> {
  const renames = new Map<string, string>();
  const old = new Set([...before.inputs, ...before.outputs]);
  for (const [a, b] of [
    [before.inputs, after.inputs],
    [before.outputs, after.outputs],
  ] as const) {
    if (a.length !== b.length) continue;
    a.forEach((name, i) => {
      const next = b[i] as string;
      if (next !== name && !old.has(next)) renames.set(name, next);
    });
  }
  return renames;
}

/**
 * The other cells of a design after one cell changed its name or renamed pins in place: every
 * instance of it follows. Returns `cells` itself when nothing places the cell or nothing changed.
 */
export function followCellChange(
  cells: readonly Cell[],
  before: Pick<Cell, 'name' | 'netlist'>,
  after: Pick<Cell, 'name' | 'netlist'>,
): readonly Cell[] {
  const renames = renamedPins(before.netlist, after.netlist);
  if (renames.size === 0 && before.name === after.name) return cells;
  const follow = (i: Instance): Instance => ({
    ...i,
    cell: after.name,
    pins: Object.fromEntries(Object.entries(i.pins).map(([pin, net]) => [renames.get(pin) ?? pin, net])),
  });
  let changed = false;
  const out = cells.map((c) => {
    if (!c.instances.some((i) => i.cell === before.name)) return c;
    changed = true;
    return { ...c, instances: c.instances.map((i) => (i.cell === before.name ? follow(i) : i)) };
  });
  if (!changed) return cells;
  const netlists = new Map([...cells.map((c) => [c.name, c.netlist] as const), [after.name, after.netlist]]);
  return withSymbols(out, before.name, after.name, netlists);
}
