/**
 * A whole design as structural Verilog (IEEE Std 1364-2005): one module per cell, each instance a
 * module instantiation with its ports connected by name (clause 12.3.6). Rails are supply nets of
 * each module (clause 4.6.4), so a rail joined by name needs no port; a rail pin an instance wires
 * to another net is written as a comment, since a supply net is no port. Names follow the
 * single-cell export's rules (verilogNames.ts): module identifiers distinct over the design, each
 * instance in its module's name space of nets and primitives (clause 12.6), ports connected by the
 * placed module's own identifiers.
 */
import { CAUTION } from '../caution.ts';
import type { Cell, Design } from '../document/design.ts';
import { printable } from '../text/printable.ts';
import { cellNets } from '../hierarchy/cellNets.ts';
import { moduleLines } from './verilogExport.ts';
import { verilogModuleNames, verilogNames, type VerilogNames } from './verilogNames.ts';
import { placedFirst } from './spiceDesignExport.ts';

export function exportVerilogDesign(design: Design): string {
  const byName = new Map(design.cells.map((c) => [c.name, c]));
  const order = placedFirst(design.cells, byName);
  const modules = verilogModuleNames(order.map((c) => c.name));
  const names = new Map(
    order.map((c, i) => [
      c,
      verilogNames(c.netlist, {
        extraNets: cellNets(c),
        placements: c.instances.map((x) => x.name),
        module: modules[i] as string,
      }),
    ]),
  );
  const lines = [
    `// ${printable(design.name)}: ${order.length} cells as switch-level modules, exported by Railwise (IEEE Std 1364-2005).`,
    `// ${CAUTION}`,
    ...order.flatMap((c) => {
      const own = names.get(c) as VerilogNames;
      return ['', ...moduleLines(c.netlist, own, instantiations(c, own, names, byName), cellNets(c))];
    }),
  ];
  return `${lines.join('\n')}\n`;
}

/** One line per instance: `cell name (.PIN(net), …);`, rails wired elsewhere noted after it. */
function instantiations(
  cell: Cell,
  own: VerilogNames,
  names: ReadonlyMap<Cell, VerilogNames>,
  byName: ReadonlyMap<string, Cell>,
): string[] {
  return cell.instances.flatMap((i, k) => {
    const placed = byName.get(i.cell);
    if (placed === undefined) return [];
    const theirs = names.get(placed) as VerilogNames;
    const signals = new Set([...placed.netlist.inputs, ...placed.netlist.outputs]);
    const wiring = Object.entries(i.pins);
    const ports = wiring.filter(([pin]) => signals.has(pin));
    const railWiring = wiring.filter(([pin, net]) => !signals.has(pin) && pin !== net);
    const note =
      railWiring.length === 0
        ? ''
        : ` // rails wired: ${printable(railWiring.map(([p, n]) => `${p} to ${n}`).join(', '))}`;
    const connections = ports.map(([pin, net]) => `.${theirs.net(pin)}(${own.net(net)})`).join(', ');
    return [`${theirs.module} ${own.placement(k)} (${connections});${note}`];
  });
}
