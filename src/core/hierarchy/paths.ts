/**
 * Hierarchical names (docs/semantics.md §1): `X1.X2.n5` is net `n5` of the cell that instance `X2`
 * of instance `X1` places. `locateName` turns a flat name back into the instances to descend
 * through and the name inside the last cell, so a finding can take the designer to it.
 */
import type { Cell } from '../document/design.ts';
import type { Instance } from '../model/design.ts';
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

/** How a cell's own names read in the flat netlist of `top`, seen through one instance path. */
export interface Placement {
  /** The cell the path ends in. */
  readonly cell: string;
  readonly path: readonly Instance[];
  readonly net: (local: string) => string;
  readonly device: (local: string) => string;
}

/**
 * The flat names of the nets and devices of the cell that `instances` (names, from `top` down) lead
 * to, by the flattener's rules (docs/semantics.md §1): a pin takes the net above, a rail or global
 * net keeps its name, anything else takes the path as prefix. Null when the path leads nowhere.
 */
export function placementOf(
  cells: ReadonlyMap<string, Cell>,
  top: string,
  instances: readonly string[],
): Placement | null {
  let cell: Cell | undefined = cells.get(top);
  if (cell === undefined) return null;
  let above = (local: string): string => local;
  const path: Instance[] = [];
  for (const name of instances) {
    const step: Instance | undefined = cell.instances.find((i) => i.name === name);
    const child: Cell | undefined = step === undefined ? undefined : cells.get(step.cell);
    if (step === undefined || child === undefined) return null;
    path.push(step);
    const outer = above;
    const prefix = flatName(path, '');
    const globals = new Set([...child.netlist.rails.map((r) => r.net), ...(child.globals ?? [])]);
    above = (local) => {
      const wired = Object.hasOwn(step.pins, local) ? step.pins[local] : undefined;
      if (wired !== undefined) return outer(wired);
      return globals.has(local) ? local : prefix + local;
    };
    cell = child;
  }
  const prefix = flatName(path, '');
  return { cell: cell.name, path, net: above, device: (local) => prefix + local };
}
