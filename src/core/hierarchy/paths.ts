/**
 * Hierarchical names (docs/semantics.md §1): `X1.X2.n5` is net `n5` of the cell that instance `X2`
 * of instance `X1` places. `locateName` turns a flat name back into the instances to descend
 * through and the name inside the last cell, so a finding can take the designer to it.
 */
import type { Cell, Instance } from '../model/design.ts';
import { cellNets } from './cellNets.ts';
import { PATH_SEPARATOR } from './flatten.ts';

/** Where a flat name lives: the instances from the top down, and the net or device name there. */
export interface Located {
  readonly path: readonly Instance[];
  /** The cell that holds the name (the top cell when the path is empty). */
  readonly cell: string;
  readonly local: string;
}

/** The instance path as written: `X1.X2`, or '' at the top. */
export function pathText(path: readonly Pick<Instance, 'name'>[]): string {
  return path.map((i) => i.name).join(PATH_SEPARATOR);
}

/** Flat name of a net or device inside the instance path. */
export function flatName(path: readonly Pick<Instance, 'name'>[], local: string): string {
  return path.length === 0 ? local : `${pathText(path)}${PATH_SEPARATOR}${local}`;
}

/**
 * Finds a flat net or device name under `top`. A name the cell holds itself wins (flattening refuses
 * a name that would also be a hierarchical one, so this is never ambiguous); otherwise the first
 * step names an instance to descend into. A name nowhere in the design gives null.
 */
export function locateName(cells: ReadonlyMap<string, Cell>, top: string, name: string): Located | null {
  const path: Instance[] = [];
  let cell = cells.get(top);
  let rest = name;
  while (cell !== undefined) {
    if (holds(cell, rest)) return { path, cell: cell.name, local: rest };
    const dot = rest.indexOf(PATH_SEPARATOR);
    const step = dot < 0 ? undefined : cell.instances.find((i) => i.name === rest.slice(0, dot));
    if (step === undefined) return null;
    path.push(step);
    rest = rest.slice(dot + PATH_SEPARATOR.length);
    cell = cells.get(step.cell);
  }
  return null;
}

function holds(cell: Cell, name: string): boolean {
  return cell.netlist.devices.some((d) => d.name === name) || cellNets(cell).includes(name);
}
