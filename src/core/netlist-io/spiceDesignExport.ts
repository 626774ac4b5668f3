/**
 * A whole design as SPICE, hierarchy kept (docs/semantics.md §6): the technology's model cards once,
 * then one `.subckt` per cell, a cell after every cell it places, each instance an `X` line whose
 * nets follow the placed cell's port order. Names follow the single-cell export's rules
 * (spiceNames.ts): every cell gets an identifier of its own over the whole design, and each cell's
 * nets, devices and instances theirs, with a `* railwise: name` directive where one changed; rails
 * and `.global` nets are named once for the whole file (spiceFileNets.ts). A pin the instance leaves
 * unwired still needs a net on the `X` line: a rail pin takes the net of its own name (what it joins
 * by name), any other pin a net of its own; `* railwise: unwired` lists them so our importer leaves
 * them unwired again. Reading the file back gives the same cells
 * (`tests/netlist-io/designIdentity.test.ts`).
 */
import { CAUTION } from '../caution.ts';
import type { Cell, Design } from '../document/design.ts';
import type { Netlist } from '../model/netlist.ts';
import { modelCards } from './spiceModelExport.ts';
import { modelLines, subcktLines, subcktPorts } from './spiceExport.ts';
import { spiceCellNames, spiceIdentifier, spiceNames, type FileNets, type SpiceNames } from './spiceNames.ts';
import { designFileNets } from './spiceFileNets.ts';
import { cellNets } from '../hierarchy/cellNets.ts';

export function exportSpiceDesign(design: Design): string {
  const byName = new Map(design.cells.map((c) => [c.name, c]));
  const order = placedFirst(design.cells, byName);
  const ids = spiceCellNames(order.map((c) => c.name));
  const idOf = new Map(order.map((c, i) => [c.name, ids[i] as string]));
  const fileNets = designFileNets(order);
  const names = new Map(order.map((c) => [c, cellSpiceNames(c, idOf.get(c.name) as string, fileNets)]));
  // One netlist of every device, so each card a device names is written once.
  const everything: Netlist = { ...emptyNetlist, devices: order.flatMap((c) => c.netlist.devices) };
  const cards = modelCards(everything, design.technology, spiceIdentifier);
  const lines = [
    `* ${spiceIdentifier(design.name || 'design')}: exported by Railwise, ${order.length} cells. ${CAUTION}`,
    ...modelLines(design.technology, cards, everything.devices),
    ...(fileNets.globals.length === 0 ? [] : [`.global ${fileNets.globals.join(' ')}`]),
    ...order.flatMap((c) =>
      subcktLines({
        netlist: c.netlist,
        expectations: c.expectations,
        names: names.get(c) as SpiceNames,
        modelOf: cards.modelOf,
        instances: instanceLines(c, { names, byName, fileNets }),
        ...(c.sheet === undefined ? {} : { sheet: c.sheet }),
      }),
    ),
    '.end',
  ];
  return `${lines.join('\n')}\n`;
}

const emptyNetlist: Netlist = { name: '', devices: [], rails: [], inputs: [], outputs: [] };

function cellSpiceNames(cell: Cell, id: string, fileNets: FileNets): SpiceNames {
  return spiceNames(cell.netlist, {
    extraNets: [...Object.keys(cell.expectations), ...cellNets(cell)],
    instances: cell.instances.map((i) => i.name),
    cell: id,
    ...(cell.globals === undefined ? {} : { globals: cell.globals }),
    fileNets,
  });
}

/** What the `X` lines of a cell are written with. */
interface Placing {
  readonly names: ReadonlyMap<Cell, SpiceNames>;
  readonly byName: ReadonlyMap<string, Cell>;
  readonly fileNets: FileNets;
}

/** The `X` lines of a cell, and the `unwired` directives of the pins they leave unwired. */
function instanceLines(cell: Cell, ctx: Placing): { lines: string[]; directives: string[] } {
  const own = ctx.names.get(cell) as SpiceNames;
  const nets = new Set(cellNets(cell));
  const placements = cell.instances.flatMap((instance, k) => {
    const placed = ctx.byName.get(instance.cell);
    if (placed === undefined) return [];
    const ports = subcktPorts(placed.netlist);
    const unwired = ports.filter((p) => !Object.hasOwn(instance.pins, p));
    const element = own.instance(k);
    return [{ instance, element, placed, names: ctx.names.get(placed) as SpiceNames, ports, unwired }];
  });
  // Nets of their own for unwired pins, all at once so no two placements take the same one.
  const bases = placements.flatMap((p) => p.unwired.map((pin) => `${p.element}_${p.names.net(pin)}_open`));
  const open = own.fresh(bases);
  let next = 0;
  const lines: string[] = [];
  const directives: string[] = [];
  for (const p of placements) {
    const fresh = new Map(p.unwired.map((pin) => [pin, open[next++] as string]));
    const netOf = (pin: string): string => {
      const wired = Object.hasOwn(p.instance.pins, pin) ? p.instance.pins[pin] : undefined;
      if (wired !== undefined) return own.net(wired);
      const rail = p.placed.netlist.rails.find((r) => r.net === pin);
      if (rail === undefined) return fresh.get(pin) as string;
      return nets.has(pin) ? own.net(pin) : ctx.fileNets.id(pin, rail.role);
    };
    lines.push(`${p.element} ${p.ports.map(netOf).join(' ')} ${p.names.cell}`);
    if (p.unwired.length > 0)
      directives.push(`* railwise: unwired ${p.element} ${p.unwired.map(p.names.net).join(' ')}`);
  }
  return { lines, directives };
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
