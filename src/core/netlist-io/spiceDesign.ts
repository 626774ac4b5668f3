/**
 * A netlist file as a design of several cells (docs/semantics.md §6): every subcircuit read becomes
 * a cell that keeps the instances it places, in the order the file defines them. The app opens a
 * netlist this way; the checks flatten each cell when they run.
 */
import type { Cell, Design } from '../model/design.ts';
import type { Technology } from '../model/technology.ts';
import type { SpiceImport } from './spiceImport.ts';

export function designFromImport(imported: SpiceImport, technology: Technology, name: string): Design {
  const byName = new Map<string, Cell>();
  for (const c of imported.cells)
    for (const cell of c.cells) if (!byName.has(cell.name)) byName.set(cell.name, cell);
  const position = new Map(imported.available.map((n, i) => [n.toLowerCase(), i]));
  const cells = [...byName.values()].sort(
    (a, b) => (position.get(a.name.toLowerCase()) ?? 0) - (position.get(b.name.toLowerCase()) ?? 0),
  );
  const open = imported.cells[0]?.name ?? cells[0]?.name ?? name;
  return { name, technology, cells, open };
}
