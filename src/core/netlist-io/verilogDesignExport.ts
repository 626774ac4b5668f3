/**
 * A whole design as structural Verilog (IEEE Std 1364-2005): one module per cell, each instance a
 * module instantiation with its ports connected by name (clause 12.3.6). Rails are supply nets of
 * each module (clause 4.6.4), so a rail joined by name needs no port; a rail pin an instance wires
 * to another net is written as a comment, since a supply net is no port.
 */
import { CAUTION } from '../caution.ts';
import type { Cell, Design } from '../model/design.ts';
import { identifier, moduleLines } from './verilogExport.ts';
import { placedFirst } from './spiceDesignExport.ts';

export function exportVerilogDesign(design: Design): string {
  const byName = new Map(design.cells.map((c) => [c.name, c]));
  const lines = [
    `// ${design.name}: ${design.cells.length} cells as switch-level modules, exported by Railwise (IEEE Std 1364-2005).`,
    `// ${CAUTION}`,
    ...placedFirst(design.cells, byName).flatMap((c) => ['', ...moduleLines(c.netlist, extras(c, byName))]),
  ];
  return `${lines.join('\n')}\n`;
}

function extras(cell: Cell, byName: ReadonlyMap<string, Cell>) {
  const signalsOf = (name: string): Set<string> => {
    const placed = byName.get(name);
    return new Set([...(placed?.netlist.inputs ?? []), ...(placed?.netlist.outputs ?? [])]);
  };
  const nets = cell.instances.flatMap((i) => {
    const signals = signalsOf(i.cell);
    return Object.entries(i.pins).flatMap(([pin, net]) => (signals.has(pin) ? [net] : []));
  });
  const lines = cell.instances.map((i) => {
    const signals = signalsOf(i.cell);
    const ports = Object.entries(i.pins).filter(([pin]) => signals.has(pin));
    const railWiring = Object.entries(i.pins).filter(([pin, net]) => !signals.has(pin) && pin !== net);
    const note =
      railWiring.length === 0
        ? ''
        : ` // rails wired: ${railWiring.map(([p, n]) => `${p} to ${n}`).join(', ')}`;
    const connections = ports.map(([pin, net]) => `.${identifier(pin)}(${identifier(net)})`).join(', ');
    return `${identifier(i.cell)} ${identifier(i.name)} (${connections});${note}`;
  });
  return { nets, lines };
}
