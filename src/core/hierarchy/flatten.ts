/**
 * Flattens one cell of a design for the analyses (docs/semantics.md §1, hierarchy): every instance
 * is replaced by the devices of the cell it places, with device and net names prefixed by the
 * instance path and the separator (`X1.X2.N3`, `X1.n5`). A pin wires the placed cell's net to the
 * net above; rails and global nets that no pin wires keep their name at every depth, so a placed
 * cell's VDD joins the VDD above. The hierarchy is sized first with the importer's walk
 * (`sizing.ts`), so a loop or a cell past the limits is refused before anything is expanded.
 */
import type { Cell } from '../document/design.ts';
import type { Instance } from '../model/design.ts';
import type { Device, Netlist, Rail } from '../model/netlist.ts';
import { mapDeviceNets } from '../model/netlist.ts';
import { HierarchySizer, type Placement } from './sizing.ts';
import { cellNets, cellPins } from './cellNets.ts';

/** Joins the steps of a hierarchical name: `X1.X2.n5` (docs/semantics.md §1). */
export const PATH_SEPARATOR = '.';

/** A design whose hierarchy cannot be flattened; the message names the cells and instances. */
export class HierarchyError extends Error {
  override readonly name = 'HierarchyError';
}

/** A cell made ready to be placed many times: its nets numbered once. */
interface Prepared {
  readonly cell: Cell;
  readonly nets: readonly string[];
  readonly index: ReadonlyMap<string, number>;
  /** Rail of each net, or null; global nets (rails and `globals`) keep their name. */
  readonly rail: readonly (Rail | null)[];
  readonly global: readonly boolean[];
  readonly pins: ReadonlySet<string>;
}

interface Frame {
  readonly prepared: Prepared;
  /** Flat name of each of the cell's nets in this placement. */
  readonly names: readonly string[];
  /** `X1.X2.` for this placement. */
  readonly prefix: string;
  /** The chain of cells down to here, for messages. */
  readonly chain: string;
  next: number;
}

class FlatBuilder {
  readonly devices: Device[] = [];
  readonly rails: Rail[] = [];
  private readonly netNames = new Set<string>();
  private readonly railNets = new Set<string>();
  private readonly deviceNames = new Set<string>();
  private readonly prepared = new Map<Cell, Prepared>();

  constructor(private readonly cells: ReadonlyMap<string, Cell>) {}

  prepare(cell: Cell): Prepared {
    let p = this.prepared.get(cell);
    if (p === undefined) {
      p = prepareCell(cell);
      this.prepared.set(cell, p);
    }
    return p;
  }

  child(instance: Instance, chain: string): Cell {
    const cell = this.cells.get(instance.cell);
    if (cell === undefined)
      throw new HierarchyError(`${chain} → ${instance.name}: no cell named ${instance.cell} in this design`);
    return cell;
  }

  /** Registers a net name; a global one may be met again, any other only once. */
  net(name: string, global: boolean, rail: Rail | null, chain: string): string {
    if (this.netNames.has(name) && !global)
      throw new HierarchyError(
        `${chain}: the hierarchical net name ${name} is also the name of another net; rename one of them`,
      );
    this.netNames.add(name);
    if (rail !== null && !this.railNets.has(name)) {
      this.railNets.add(name);
      this.rails.push({ ...rail, net: name });
    }
    return name;
  }

  emit(devices: readonly Device[], frame: Frame): void {
    const { prepared, names, prefix, chain } = frame;
    for (const d of devices) {
      const name = prefix + d.name;
      if (this.deviceNames.has(name))
        throw new HierarchyError(`${chain}: two devices are named ${name}; rename one of them`);
      this.deviceNames.add(name);
      const renamed = mapDeviceNets(d, (net) => names[prepared.index.get(net) as number] as string);
      this.devices.push(prefix === '' ? renamed : { ...renamed, name });
    }
  }
}

function prepareCell(cell: Cell): Prepared {
  const nets = cellNets(cell);
  const index = new Map(nets.map((n, i) => [n, i]));
  const railByNet = new Map(cell.netlist.rails.map((r) => [r.net, r]));
  const globals = new Set(cell.globals ?? []);
  return {
    cell,
    nets,
    index,
    rail: nets.map((n) => railByNet.get(n) ?? null),
    global: nets.map((n) => railByNet.has(n) || globals.has(n)),
    pins: new Set(cellPins(cell.netlist)),
  };
}

/** The sizing walk over a design's cells; an instance of a missing cell counts as nothing. */
export function designSizer(cells: ReadonlyMap<string, Cell>): HierarchySizer<Cell> {
  return new HierarchySizer<Cell>({
    noun: 'cell',
    nameOf: (cell) => cell.name,
    ownDevices: (cell) => cell.netlist.devices.length,
    placements: (cell) =>
      cell.instances.map((i): Placement<Cell> => ({ name: i.name, child: cells.get(i.cell) })),
  });
}

/**
 * The flat netlist of one cell: its own devices, then each instance's in order, depth first. Pins,
 * name and rails are the cell's own, plus the rails that placed cells bring by name.
 */
export function flattenCell(cells: ReadonlyMap<string, Cell>, name: string): Netlist {
  const top = cells.get(name);
  if (top === undefined) throw new HierarchyError(`no cell named ${name} in this design`);
  if (top.instances.length === 0) return top.netlist;
  const problem = designSizer(cells).problem(top);
  if (problem !== null) throw new HierarchyError(problem.message);
  const b = new FlatBuilder(cells);
  const root = b.prepare(top);
  const names = root.nets.map((n, i) => b.net(n, root.global[i] as boolean, root.rail[i] ?? null, top.name));
  const stack: Frame[] = [{ prepared: root, names, prefix: '', chain: top.name, next: 0 }];
  b.emit(top.netlist.devices, stack[0] as Frame);
  while (stack.length > 0) {
    const f = stack[stack.length - 1] as Frame;
    const instance = f.prepared.cell.instances[f.next++];
    if (instance === undefined) stack.pop();
    else {
      const frame = enter(b, f, instance);
      b.emit(frame.prepared.cell.netlist.devices, frame);
      stack.push(frame);
    }
  }
  return { ...top.netlist, devices: b.devices, rails: b.rails };
}

function enter(b: FlatBuilder, parent: Frame, instance: Instance): Frame {
  const chain = `${parent.chain} → ${instance.name} (${instance.cell})`;
  const p = b.prepare(b.child(instance, parent.chain));
  for (const pin of Object.keys(instance.pins))
    if (!p.pins.has(pin)) throw new HierarchyError(`${chain}: ${instance.cell} has no pin ${pin}`);
  const prefix = `${parent.prefix}${instance.name}${PATH_SEPARATOR}`;
  const names = p.nets.map((local, i) => {
    const above = Object.hasOwn(instance.pins, local) ? instance.pins[local] : undefined;
    if (above !== undefined) {
      const name = parent.names[parent.prepared.index.get(above) as number] as string;
      // A rail pin wired to the net of its own name is that rail: it keeps its role above.
      const rail = p.rail[i] ?? null;
      return rail !== null && name === local ? b.net(name, true, rail, chain) : name;
    }
    const global = p.global[i] as boolean;
    return b.net(global ? local : prefix + local, global, p.rail[i] ?? null, chain);
  });
  return { prepared: p, names, prefix, chain, next: 0 };
}
