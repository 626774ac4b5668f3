/**
 * A netlist file as a design of several cells (docs/semantics.md §6): every subcircuit read becomes
 * a cell that keeps the instances it places, in the order the file defines them. The app opens a
 * netlist this way; the checks flatten each cell when they run. The technology takes the level-1
 * values of the cards a `* railwise: technology` line names, and keeps every card a device names.
 */
import type { Cell, Design } from '../document/design.ts';
import { recordOf } from '../model/records.ts';
import { withCardValues, type DeviceModel, type Technology } from '../model/technology.ts';
import type { ImportedCell, SpiceImport } from './spiceImport.ts';

export function designFromImport(imported: SpiceImport, base: Technology, name: string): Design {
  const byName = new Map<string, Cell>();
  // Cells that only the checks could not flatten are cells of the design all the same.
  for (const c of [...imported.cells, ...imported.failed])
    for (const cell of c.cells ?? []) if (!byName.has(cell.name)) byName.set(cell.name, cell);
  const position = new Map(imported.available.map((n, i) => [n.toLowerCase(), i]));
  const cells = [...byName.values()].sort(
    (a, b) => (position.get(a.name.toLowerCase()) ?? 0) - (position.get(b.name.toLowerCase()) ?? 0),
  );
  const open =
    imported.cells[0]?.name ??
    imported.failed.find((f) => f.cells)?.cells?.at(-1)?.name ??
    cells[0]?.name ??
    name;
  const technology = withCellModels(withTechnologyCards(base, imported), [imported]);
  return { name, technology, cells, open };
}

/** The technology with the level-1 values of the cards `* railwise: technology` names. */
export function withTechnologyCards(
  base: Technology,
  imported: Pick<SpiceImport, 'technologyCards' | 'file'>,
): Technology {
  const cards: readonly DeviceModel[] = imported.technologyCards;
  if (cards.length === 0) return base;
  const source = `level-1 values from the model cards of ${imported.file}; the rest from ${base.source}`;
  return { ...cards.reduce(withCardValues, base), source };
}

/** The technology holding every model card the cells' devices name (cards are the file's, one per name). */
export function withCellModels(tech: Technology, cells: readonly Pick<ImportedCell, 'models'>[]): Technology {
  const models = recordOf(cells.flatMap((c) => Object.entries(c.models)));
  return Object.keys(models).length === 0 ? tech : { ...tech, models };
}
