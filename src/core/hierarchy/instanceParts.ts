/**
 * Instances on a cell's sheet (docs/semantics.md §1, hierarchy): each drawn as a symbol generated
 * from the placed cell's pins (`sheet/parts/instance.ts`). This module keeps those symbols in step
 * with the design: a symbol for every instance a cell places (one an import or an older file left
 * undrawn gets a symbol with a net label on each wired pin, so its connections are the same), its
 * pins those of the cell as it is now, and a renamed cell or pin followed on every sheet.
 */
import type { Cell } from '../document/design.ts';
import type { Instance } from '../model/design.ts';
import type { Netlist } from '../model/netlist.ts';
import type { Point, Sheet, SheetPart } from '../sheet/types.ts';
import { makeSheetPart } from '../sheet/parts/index.ts';
import { instancePins, pinsText, type InstancePart, type InstancePins } from '../sheet/parts/instance.ts';
import { partBounds, unionRects } from '../sheet/geometry.ts';
import { nextPartId } from '../sheet/naming.ts';
import { freeOffset } from '../sheet/freeSpace.ts';

export const isInstancePart = (p: SheetPart): p is InstancePart => p.kind === 'instance';

/**
 * The pins a symbol of `cell` shows: its inputs and outputs; a rail only when the instance wires it
 * to a net of another name (a rail left alone joins the rail of its own name and is not drawn).
 */
export function symbolPins(cell: Netlist, wiring: Readonly<Record<string, string>> = {}): InstancePins {
  const rails = cell.rails
    .map((r) => r.net)
    .filter((r) => Object.hasOwn(wiring, r) && wiring[r] !== r && !cell.inputs.includes(r));
  return { inputs: [...cell.inputs, ...rails], outputs: cell.outputs.filter((o) => !rails.includes(o)) };
}

/** A new instance part of `cell` named `name`, its top input lead at `at`. */
export function instancePart(
  id: string,
  name: string,
  cell: Cell,
  at: Point,
  pins: InstancePins,
): InstancePart {
  const placement = { id, name, x: at.x, y: at.y, rotation: 0 as const, mirror: false };
  return makeSheetPart('instance', placement, { cell: cell.name, pins: pinsText(pins) }) as InstancePart;
}

/** Where a new part of this shape can go on `sheet` without touching anything. */
export function freeSpot(sheet: Sheet, part: SheetPart, extra: readonly SheetPart[] = []): Point {
  const d = freeOffset(sheet, [part, ...extra], []) ?? { x: 0, y: 0 };
  return { x: part.x + d.x, y: part.y + d.y };
}

/**
 * The sheet with a symbol for each instance the cell places that it does not draw: right of the
 * drawing, one under another, each wired pin given a net label of its net (labels of one name are
 * one net, docs/semantics.md §1). The sheet itself when every instance is drawn.
 */
export function drawInstances(
  sheet: Sheet,
  instances: readonly Instance[],
  cells: ReadonlyMap<string, Cell>,
): Sheet {
  const drawn = new Set(sheet.parts.filter(isInstancePart).map((p) => p.name));
  const missing = instances.filter((i) => !drawn.has(i.name) && cells.has(i.cell));
  if (missing.length === 0) return sheet;
  const all = unionRects(sheet.parts.map(partBounds));
  let y = Math.round(all?.y0 ?? 0);
  const x = Math.round((all?.x1 ?? 0) + 6);
  let next = sheet;
  for (const instance of missing) {
    const cell = cells.get(instance.cell) as Cell;
    const pins = symbolPins(cell.netlist, instance.pins);
    const part = instancePart(nextPartId(next), instance.name, cell, { x, y }, pins);
    next = { ...next, parts: [...next.parts, part, ...pinLabels(next, part, instance)] };
    y = Math.round(partBounds(part).y1 + 4);
  }
  return next;
}

/** A net label on each wired pin of a symbol, pointing away from it. */
function pinLabels(sheet: Sheet, part: InstancePart, instance: Instance): SheetPart[] {
  const { inputs, outputs } = instancePins(part);
  const rows = [...inputs.map((p, k) => [p, 0, k] as const), ...outputs.map((p, k) => [p, 8, k] as const)];
  return rows.flatMap(([pin, x, k], n) => {
    const net = Object.hasOwn(instance.pins, pin) ? instance.pins[pin] : undefined;
    if (net === undefined) return [];
    const placement = {
      id: nextPartId(sheet, 1 + n),
      name: net,
      x: part.x + x,
      y: part.y + 2 * k,
      rotation: x === 0 ? (2 as const) : (0 as const),
      mirror: false,
    };
    return [makeSheetPart('label', placement)];
  });
}

/**
 * The sheet with each symbol showing its cell's pins as they are now (`netlistOf`) and carrying the
 * cell's name as `rename` gives it. The sheet itself when nothing changed.
 */
export function refreshSymbols(
  sheet: Sheet,
  netlistOf: (cell: string) => Netlist | undefined,
  rename: (cell: string) => string = (c) => c,
): Sheet {
  let changed = false;
  const parts = sheet.parts.map((p) => {
    if (!isInstancePart(p)) return p;
    const name = rename(p.cell);
    const netlist = netlistOf(name);
    // A rail shown stays shown (it is wired to a net of another name).
    const shown = Object.fromEntries(instancePins(p).inputs.map((pin) => [pin, '']));
    const text = netlist === undefined ? p.pins : pinsText(symbolPins(netlist, shown));
    if (text === p.pins && name === p.cell) return p;
    changed = true;
    return { ...p, cell: name, pins: text };
  });
  return changed ? { ...sheet, parts } : sheet;
}
