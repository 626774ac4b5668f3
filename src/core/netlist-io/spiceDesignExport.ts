/**
 * A whole design as SPICE, hierarchy kept (docs/semantics.md §6): one `.subckt` per cell, a cell
 * after every cell it places, and each instance as an `X` line whose nets follow the placed cell's
 * port order. A pin the instance leaves unwired is a rail joined by name (written as the rail's own
 * name) or an open pin (written as a net of its own, `X1_A_open`). Reading the file back gives the
 * same cells and instances (`tests/netlist-io/designRoundTrip.test.ts`).
 */
import { CAUTION } from '../caution.ts';
import type { Cell, Design, Instance } from '../model/design.ts';
import { elementName, modelLines, subcktLines, subcktPorts, token } from './spiceExport.ts';

export function exportSpiceDesign(design: Design): string {
  const byName = new Map(design.cells.map((c) => [c.name, c]));
  const lines = [
    `* ${token(design.name || 'design')}: exported by Railwise, ${design.cells.length} cells. ${CAUTION}`,
    ...modelLines(
      design.technology,
      design.cells.some((c) => c.netlist.devices.some((d) => d.kind === 'diode')),
    ),
    ...placedFirst(design.cells, byName).flatMap((c) =>
      subcktLines(c.netlist, c.expectations, instanceLines(c, byName)),
    ),
    '.end',
  ];
  return `${lines.join('\n')}\n`;
}

function instanceLines(cell: Cell, byName: ReadonlyMap<string, Cell>): string[] {
  return cell.instances.map((i) => {
    const placed = byName.get(i.cell);
    const nets = placed === undefined ? [] : subcktPorts(placed.netlist).map((p) => wiredNet(i, p, placed));
    return `${elementName('X', i.name)} ${nets.map(token).join(' ')} ${token(i.cell)}`;
  });
}

function wiredNet(i: Instance, pin: string, placed: Cell): string {
  const net = Object.hasOwn(i.pins, pin) ? i.pins[pin] : undefined;
  if (net !== undefined) return net;
  return placed.netlist.rails.some((r) => r.net === pin) ? pin : `${i.name}_${pin}_open`;
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
