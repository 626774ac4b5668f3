/**
 * The drawing carried through a SPICE file in comment lines of our own (docs/semantics.md §6), so
 * that a design exported from Railwise and opened again looks as it was drawn. Other readers see
 * comments. Inside the cell's `.subckt`:
 *
 *   * railwise: sheet-part ID KIND X Y TURNS MIRROR "NAME"   one per part, in sheet order
 *   * railwise: sheet-wire ID X,Y X,Y …                        one per wire
 *
 * TURNS is 0–3 quarter turns clockwise, MIRROR 0 or 1, NAME a JSON string (the part's name as the
 * design spells it: device, pin, rail or label). A device part takes its sizes from the device of
 * that name in the netlist read from the same file. The drawing is used only when it derives exactly
 * that netlist; otherwise (a file edited by hand, say) it is set aside with a note and the cell is
 * placed afresh.
 */
import type { Netlist } from '../model/netlist.ts';
import type { Point, Rotation, Sheet, SheetPart, SheetWire } from '../sheet/types.ts';
import { makeSheetPart, partForDevice, PART_KINDS, isDevicePart } from '../sheet/parts/index.ts';
import type { PartKind } from '../sheet/types.ts';
import { sheetToNetlist } from '../sheet/toNetlist.ts';
import { samePlainData } from '../model/plainData.ts';
import type { Directive } from './spiceParse.ts';

export const PART_KEY = 'sheet-part';
export const WIRE_KEY = 'sheet-wire';

/** The comment lines that carry a drawing. */
export function placementLines(sheet: Sheet): string[] {
  return [
    ...sheet.parts.map(
      (p) =>
        `* railwise: ${PART_KEY} ${p.id} ${p.kind} ${p.x} ${p.y} ${p.rotation} ${p.mirror ? 1 : 0} ${JSON.stringify(p.name)}`,
    ),
    ...sheet.wires.map(
      (w) => `* railwise: ${WIRE_KEY} ${w.id} ${w.points.map((q) => `${q.x},${q.y}`).join(' ')}`,
    ),
  ];
}

class PlacementError extends Error {}

/**
 * The cell and pins of an instance symbol by instance name (the cell's `X` lines give them,
 * drawnInstances.ts), or null when the cell places no such instance.
 */
export type SymbolProps = (instance: string) => { readonly cell: string; readonly pins: string } | null;

const ID = /^[A-Za-z0-9_]+$/;
const INTEGER = /^-?\d{1,7}$/;

function integer(text: string | undefined, what: string): number {
  if (text === undefined || !INTEGER.test(text)) throw new PlacementError(`${what} is not a whole number`);
  return Number(text) + 0;
}

function readPart(value: string, netlist: Netlist, symbols: SymbolProps): SheetPart {
  const m = /^(\S+) (\S+) (\S+) (\S+) ([0-3]) ([01]) (".*")$/.exec(value);
  if (m === null) throw new PlacementError('a part reads: ID KIND X Y TURNS MIRROR "NAME"');
  const [, id, kind, x, y, turns, mirror, quoted] = m as unknown as string[];
  if (!ID.test(id!)) throw new PlacementError(`part id ${id} is not an id`);
  if (!(PART_KINDS as readonly string[]).includes(kind!)) throw new PlacementError(`no part kind ${kind}`);
  const name: unknown = JSON.parse(quoted!);
  if (typeof name !== 'string') throw new PlacementError('a part name is a JSON string');
  const placement = {
    id: id!,
    x: integer(x, 'x'),
    y: integer(y, 'y'),
    rotation: Number(turns) as Rotation,
    mirror: mirror === '1',
  };
  if (kind === 'instance') {
    const props = symbols(name);
    if (props === null) throw new PlacementError(`no instance ${name} in the cell`);
    return makeSheetPart('instance', { ...placement, name }, props);
  }
  if (!isDevicePart(kind as PartKind)) return makeSheetPart(kind as PartKind, { ...placement, name });
  const device = netlist.devices.find((d) => d.name === name);
  const part = device === undefined ? null : partForDevice(device, placement);
  if (part === null || part.kind !== kind) throw new PlacementError(`no ${kind} device ${name} in the cell`);
  return part;
}

function readWire(value: string): SheetWire {
  const [id, ...coords] = value.split(/\s+/);
  if (id === undefined || !ID.test(id)) throw new PlacementError(`wire id ${id ?? ''} is not an id`);
  const points: Point[] = coords.map((c) => {
    const [x, y, extra] = c.split(',');
    if (extra !== undefined) throw new PlacementError(`wire point ${c} is not X,Y`);
    return { x: integer(x, 'a wire x'), y: integer(y, 'a wire y') };
  });
  if (points.length < 2) throw new PlacementError(`wire ${id} has fewer than two points`);
  return { id, points };
}

/** Devices by name, then the rest as derived: equal circuits whatever order the devices are in. */
function sameCircuit(a: Netlist, b: Netlist): boolean {
  const byName = (n: Netlist) =>
    [...n.devices].sort((x, y) => (x.name < y.name ? -1 : x.name > y.name ? 1 : 0));
  return (
    samePlainData(byName(a), byName(b)) &&
    samePlainData(a.inputs, b.inputs) &&
    samePlainData(a.outputs, b.outputs) &&
    samePlainData(
      [...a.rails].sort((x, y) => (x.net < y.net ? -1 : 1)),
      [...b.rails].sort((x, y) => (x.net < y.net ? -1 : 1)),
    )
  );
}

/**
 * The drawing a cell's directives carry, checked against the netlist read from the same file; null
 * when there is none or it does not derive that netlist (then a note says why).
 */
export function readPlacement(
  directives: readonly Directive[],
  netlist: Netlist,
  notes: string[],
  symbols: SymbolProps = () => null,
): Sheet | null {
  const parts = directives.filter((d) => d.key === PART_KEY);
  const wires = directives.filter((d) => d.key === WIRE_KEY);
  if (parts.length === 0 && wires.length === 0) return null;
  let line = 0;
  try {
    const sheet: Sheet = {
      parts: parts.map((d) => ((line = d.line), readPart(d.value, netlist, symbols))),
      wires: wires.map((d) => ((line = d.line), readWire(d.value))),
    };
    line = 0;
    if (!sameCircuit(sheetToNetlist(sheet, netlist.name).netlist, netlist))
      throw new PlacementError('the drawing no longer gives the netlist of the file');
    return sheet;
  } catch (e) {
    if (!(e instanceof PlacementError || e instanceof SyntaxError)) throw e;
    const where = line === 0 ? '' : `line ${line}: `;
    notes.push(
      `${where}the drawing carried in the file was set aside (${e.message}); the cell is placed afresh`,
    );
    return null;
  }
}
