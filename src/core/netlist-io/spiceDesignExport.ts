/**
 * A whole design as SPICE, hierarchy kept (docs/semantics.md §6): the technology's model cards once,
 * then one `.subckt` per cell, a cell after every cell it places, each instance an `X` line whose
 * nets follow the placed cell's port order. Names follow the single-cell export's rules
 * (spiceNames.ts): every cell gets an identifier of its own over the whole design, and each cell's
 * nets, devices and instances theirs, with a `* railwise: name` directive where one changed. A pin
 * the instance leaves unwired still needs a net on the `X` line: a rail pin takes the net of its own
 * name (what it joins by name), any other pin a net of its own; `* railwise: unwired` lists them so
 * our importer leaves them unwired again. Reading the file back gives the same cells
 * (`tests/netlist-io/designIdentity.test.ts`).
 */
import { CAUTION } from '../caution.ts';
import type { Cell, Design, Instance } from '../model/design.ts';
import type { Netlist } from '../model/netlist.ts';
import { modelCards } from './spiceModelExport.ts';
import { modelLines, subcktLines, subcktPorts } from './spiceExport.ts';
import { spiceCellNames, spiceIdentifier, spiceNames, type SpiceNames } from './spiceNames.ts';
import { cellNets } from '../hierarchy/cellNets.ts';

export function exportSpiceDesign(design: Design): string {
  const byName = new Map(design.cells.map((c) => [c.name, c]));
  const order = placedFirst(design.cells, byName);
  const ids = spiceCellNames(order.map((c) => c.name));
  const idOf = new Map(order.map((c, i) => [c.name, ids[i] as string]));
  const names = new Map(order.map((c) => [c, cellSpiceNames(c, idOf.get(c.name) as string)]));
  // One netlist of every device, so each card a device names is written once.
  const everything: Netlist = { ...emptyNetlist, devices: order.flatMap((c) => c.netlist.devices) };
  const cards = modelCards(everything, design.technology, spiceIdentifier);
  const lines = [
    `* ${spiceIdentifier(design.name || 'design')}: exported by Railwise, ${order.length} cells. ${CAUTION}`,
    ...modelLines(design.technology, cards, everything.devices),
    ...globalLines(order),
    ...order.flatMap((c) =>
      subcktLines({
        netlist: c.netlist,
        expectations: c.expectations,
        names: names.get(c) as SpiceNames,
        modelOf: cards.modelOf,
        instances: instanceLines(c, names, byName),
      }),
    ),
    '.end',
  ];
  return `${lines.join('\n')}\n`;
}

/** Nets that keep their name at every depth besides the rails (a netlist's `.global` nets). */
function globalLines(cells: readonly Cell[]): string[] {
  const globals = [...new Set(cells.flatMap((c) => c.globals ?? []))].map(spiceIdentifier);
  return globals.length === 0 ? [] : [`.global ${globals.join(' ')}`];
}

const emptyNetlist: Netlist = { name: '', devices: [], rails: [], inputs: [], outputs: [] };

function cellSpiceNames(cell: Cell, id: string): SpiceNames {
  return spiceNames(cell.netlist, {
    extraNets: [...Object.keys(cell.expectations), ...cellNets(cell)],
    instances: cell.instances.map((i) => i.name),
    cell: id,
  });
}

/** The `X` lines of a cell, and the `unwired` directives of the pins they leave unwired. */
function instanceLines(
  cell: Cell,
  names: ReadonlyMap<Cell, SpiceNames>,
  byName: ReadonlyMap<string, Cell>,
): { lines: string[]; directives: string[] } {
  const own = names.get(cell) as SpiceNames;
  const placements = cell.instances.flatMap((instance, k) => {
    const placed = byName.get(instance.cell);
    if (placed === undefined) return [];
    const ports = subcktPorts(placed.netlist);
    const unwired = ports.filter((p) => !Object.hasOwn(instance.pins, p));
    return [
      { instance, element: own.instance(k), placed, names: names.get(placed) as SpiceNames, ports, unwired },
    ];
  });
  // Nets of their own for unwired pins, all at once so no two placements take the same one.
  const open = own.fresh(
    placements.flatMap((p) => p.unwired.map((pin) => `${p.element}_${p.names.net(pin)}_open`)),
  );
  let next = 0;
  const lines: string[] = [];
  const directives: string[] = [];
  for (const p of placements) {
    const fresh = new Map(p.unwired.map((pin) => [pin, open[next++] as string]));
    const nets = p.ports.map((pin) => wiredNet(p.instance, pin, p.placed, own) ?? (fresh.get(pin) as string));
    lines.push(`${p.element} ${nets.join(' ')} ${p.names.cell}`);
    if (p.unwired.length > 0)
      directives.push(`* railwise: unwired ${p.element} ${p.unwired.map(p.names.net).join(' ')}`);
  }
  return { lines, directives };
}

/** The net a pin is written with: its wiring, or for an unwired rail pin the net of that name. */
function wiredNet(i: Instance, pin: string, placed: Cell, own: SpiceNames): string | undefined {
  const net = Object.hasOwn(i.pins, pin) ? i.pins[pin] : undefined;
  if (net !== undefined) return own.net(net);
  return placed.netlist.rails.some((r) => r.net === pin) ? own.net(pin) : undefined;
}

/** Cells in an order where every cell comes after the cells it places (depth first, no recursion). */
export function placedFirst(cells: readonly Cell[], byName: ReadonlyMap<string, Cell>): Cell[] {
  const order: Cell[] = [];
  const seen = new Set<Cell>();
  for (const root of cells) {
    if (seen.has(root)) continue;
    seen.add(root);
    const stack: { cell: Cell; next: number }[] = [{ cell: root, next: 0 }];
    while (stack.length > 0) {
      const f = stack[stack.length - 1] as { cell: Cell; next: number };
      const i = f.cell.instances[f.next++];
      if (i === undefined) {
        stack.pop();
        order.push(f.cell);
        continue;
      }
      const child = byName.get(i.cell);
      if (child !== undefined && !seen.has(child)) {
        seen.add(child);
        stack.push({ cell: child, next: 0 });
      }
    }
  }
  return order;
}
