/**
 * Places a netlist on a sheet the way a designer would sketch it: the pull-up network above the
 * output row, the pull-down network below, inputs on the left, outputs on the right.
 *
 * Devices go in rows by their distance (in channel hops) from their rail, nearest rail outermost;
 * a device joins the column of the device it stacks on, so series stacks line up. Stacked channel
 * terminals on the same net are wired; rails sit directly on the pins they feed; every other pin
 * gets a net label, and equal labels join the net.
 */
import type { Device, Netlist } from '../model/netlist.ts';
import { channelNets, deviceTerminals } from '../model/netlist.ts';
import type { PartKind, Point, Rotation, Sheet, SheetPart, SheetWire } from './types.ts';
import { makeSheetPart, partForDevice, partKindForDevice, partSpec } from './parts/index.ts';
import { pinPositions, turnDirection } from './geometry.ts';
import { railDistances } from './railDistance.ts';

export interface AutoPlaceOptions {
  /** Grid units between device columns and between rows. */
  readonly columnPitch: number;
  readonly rowPitch: number;
}

const DEFAULTS: AutoPlaceOptions = { columnPitch: 8, rowPitch: 6 };

interface Slot {
  readonly device: Device;
  readonly upper: boolean;
  readonly row: number;
  column: number;
}

/** Upper half: PMOS, and resistors nearer the supply (loads). Lower: NMOS and the rest. */
function isUpper(
  d: Device,
  toSupply: ReadonlyMap<string, number>,
  toGround: ReadonlyMap<string, number>,
): boolean {
  if (d.kind === 'pmos') return true;
  if (d.kind !== 'resistor') return false;
  const near = (m: ReadonlyMap<string, number>) => Math.min(m.get(d.a) ?? Infinity, m.get(d.b) ?? Infinity);
  return near(toSupply) < near(toGround);
}

function rowOf(d: Device, dist: ReadonlyMap<string, number>, deepest: number): number {
  const nets = channelNets(d);
  if (!nets) return deepest;
  const r = Math.min(dist.get(nets[0]) ?? Infinity, dist.get(nets[1]) ?? Infinity);
  return Number.isFinite(r) ? r : deepest;
}

/**
 * Rows counted from the rail; within a row, a device takes the column of the first device of the
 * row before (in placing order) that it shares a channel net with and whose column is still free.
 * Devices of the row before are found through their nets, so a wide row costs what its nets share,
 * not the product of the two rows.
 */
function assignColumns(slots: Slot[]): void {
  const byRow = new Map<number, Slot[]>();
  for (const s of slots) (byRow.get(s.row) ?? byRow.set(s.row, []).get(s.row)!).push(s);
  for (const row of [...byRow.keys()].sort((a, b) => a - b)) {
    const before = new Map<string, number[]>();
    const prev = byRow.get(row - 1) ?? [];
    prev.forEach((p, i) => {
      for (const n of channelNets(p.device) ?? []) (before.get(n) ?? before.set(n, []).get(n)!).push(i);
    });
    const used = new Set<number>();
    // The lowest column still free: where a device that stacks on nothing goes. Columns are only
    // ever taken, so it only moves right, and a wide row of such devices stays linear.
    let lowestFree = 0;
    for (const slot of byRow.get(row)!) {
      let first = Infinity;
      for (const n of channelNets(slot.device) ?? [])
        for (const i of before.get(n) ?? []) if (i < first && !used.has(prev[i]!.column)) first = i;
      let col = first === Infinity ? lowestFree : prev[first]!.column;
      while (used.has(col)) col++;
      slot.column = col;
      used.add(col);
      while (used.has(lowestFree)) lowestFree++;
    }
  }
}

function slotDevices(
  netlist: Netlist,
  toSupply: ReadonlyMap<string, number>,
  toGround: ReadonlyMap<string, number>,
): Slot[] {
  const channel = netlist.devices.filter((d) => channelNets(d) !== null);
  const deepest = channel.length;
  const slots: Slot[] = channel.map((device) => {
    const upper = isUpper(device, toSupply, toGround);
    return { device, upper, row: rowOf(device, upper ? toSupply : toGround, deepest), column: 0 };
  });
  // Compact rows: unreachable devices go one row past the deepest reachable one.
  for (const upper of [true, false]) {
    const half = slots.filter((s) => s.upper === upper);
    const rows = [...new Set(half.map((s) => s.row))].sort((a, b) => a - b);
    half.forEach((s) => Object.assign(s, { row: rows.indexOf(s.row) }));
    assignColumns(half);
  }
  return slots;
}

export function autoPlace(netlist: Netlist, options: Partial<AutoPlaceOptions> = {}): Sheet {
  const o = { ...DEFAULTS, ...options };
  const builder = new SheetBuilder();
  const supplies = new Set(netlist.rails.filter((r) => r.role === 'supply').map((r) => r.net));
  const grounds = new Set(netlist.rails.filter((r) => r.role === 'ground').map((r) => r.net));
  const columns = placeChannelDevices(netlist, builder, o, supplies, grounds);
  placeTwoTerminalLoads(netlist, builder, o, columns * o.columnPitch);
  builder.connectPins(supplies, grounds);
  const minX = Math.min(0, ...builder.parts.map((p) => p.x)) - 6;
  const maxX = Math.max(0, ...builder.parts.map((p) => p.x)) + 6;
  netlist.inputs.forEach((net, i) =>
    builder.naming('input', net, { x: minX, y: -Math.floor(netlist.inputs.length / 2) * 3 + i * 3 }),
  );
  netlist.outputs.forEach((net, i) => {
    const at = { x: maxX, y: i * 3 };
    builder.naming('output', net, at);
    builder.wireToOutput(net, at);
  });
  return builder.sheet();
}

/** Transistors and resistors in their rows and columns; returns the number of columns used. */
function placeChannelDevices(
  netlist: Netlist,
  builder: SheetBuilder,
  o: AutoPlaceOptions,
  supplies: ReadonlySet<string>,
  grounds: ReadonlySet<string>,
): number {
  const toSupply = railDistances(netlist, [...supplies]);
  const toGround = railDistances(netlist, [...grounds]);
  const slots = slotDevices(netlist, toSupply, toGround);
  const upRows = Math.max(0, ...slots.filter((s) => s.upper).map((s) => s.row + 1));
  const lowRows = Math.max(0, ...slots.filter((s) => !s.upper).map((s) => s.row + 1));
  for (const slot of slots) {
    const y = slot.upper
      ? -o.rowPitch * (upRows - slot.row) + o.rowPitch / 2
      : o.rowPitch * (lowRows - slot.row) - o.rowPitch / 2;
    const at = { x: slot.column * o.columnPitch, y: Math.round(y) };
    builder.device(slot.device, at, flipFor(slot, slot.upper ? toSupply : toGround));
  }
  return slots.length === 0 ? 0 : Math.max(...slots.map((s) => s.column)) + 1;
}

/** The channel pin a kind draws on top, found once per kind (a thousand devices share a few kinds). */
const topPins = new Map<PartKind, string>();

function topPinOf(kind: PartKind): string {
  let pin = topPins.get(kind);
  if (pin === undefined) {
    pin = partSpec(kind)
      .pins.filter((p) => p.name !== 'gate')
      .sort((a, b) => a.y - b.y)[0]!.name;
    topPins.set(kind, pin);
  }
  return pin;
}

/** Vertical flip when the terminal drawn at the bottom is the one nearer the rail above (or vice versa). */
function flipFor(slot: Slot, dist: ReadonlyMap<string, number>): boolean {
  const nets = channelNets(slot.device);
  const kind = partKindForDevice(slot.device);
  if (!nets || kind === null) return false;
  const topPin = topPinOf(kind);
  const [top, bottom] = topPin === 'drain' || topPin === 'a' ? nets : [nets[1], nets[0]];
  const dt = dist.get(top) ?? Infinity;
  const db = dist.get(bottom) ?? Infinity;
  // Upper devices want the rail side on top; lower devices want it at the bottom.
  return slot.upper ? db < dt : dt < db;
}

/** Devices with no channel (capacitors, diodes) stand in a row right of the transistors. */
function placeTwoTerminalLoads(
  netlist: Netlist,
  builder: SheetBuilder,
  o: AutoPlaceOptions,
  x0: number,
): void {
  netlist.devices
    .filter((d) => channelNets(d) === null)
    .forEach((d, i) => builder.device(d, { x: x0 + i * (o.columnPitch / 2), y: o.rowPitch }, false));
}

/** Accumulates parts and wires with sequential ids. */
class SheetBuilder {
  readonly parts: SheetPart[] = [];
  private readonly wires: SheetWire[] = [];
  private readonly deviceParts: { part: SheetPart; device: Device }[] = [];

  private nextPlacement(at: Point, rotation: Rotation, mirror: boolean) {
    return { id: `p${this.parts.length + 1}`, x: at.x, y: at.y, rotation, mirror };
  }

  /** Places the device's part; a device no part kind draws is left off the sheet. */
  device(device: Device, at: Point, flip: boolean): void {
    // Mirror then a half turn is a flip top-to-bottom; the gate stays on the left.
    const part = partForDevice(device, this.nextPlacement(at, flip ? 2 : 0, flip));
    if (part === null) return;
    this.parts.push(part);
    this.deviceParts.push({ part, device });
  }

  naming(kind: PartKind, name: string, at: Point, rotation: Rotation = 0): void {
    this.parts.push(makeSheetPart(kind, { ...this.nextPlacement(at, rotation, false), name }));
  }

  /** A straight wire, named by a label at its middle so the net keeps its netlist name. */
  wire(a: Point, b: Point, net: string): void {
    this.wires.push({
      id: `w${this.wires.length + 1}`,
      points: [
        { x: a.x, y: a.y },
        { x: b.x, y: b.y },
      ],
    });
    this.naming('label', net, { x: Math.round((a.x + b.x) / 2), y: Math.round((a.y + b.y) / 2) });
  }

  /** Wires stacked terminals in one column; rails and labels on every other pin. */
  connectPins(supplies: ReadonlySet<string>, grounds: ReadonlySet<string>): void {
    const pins = this.deviceParts.flatMap(({ part, device }) => {
      const terminals = deviceTerminals(device);
      const netOf = (pin: string): string => terminals.find((t) => t.terminal === pin)?.net ?? '';
      return pinPositions(part).map((pin) => ({ part, pin, net: netOf(pin.pin) }));
    });
    const wired = new Set<string>();
    // Channel pins per column, top to bottom: each pin's neighbour below is the next one.
    const columns = new Map<number, typeof pins>();
    for (const p of pins) {
      if (p.pin.pin === 'gate') continue;
      const col = columns.get(p.pin.x);
      if (col) col.push(p);
      else columns.set(p.pin.x, [p]);
    }
    for (const col of columns.values()) {
      col.sort((p, q) => p.pin.y - q.pin.y);
      col.forEach((a, i) => {
        const below = col[i + 1];
        if (!below || below.net !== a.net || supplies.has(a.net) || grounds.has(a.net)) return;
        if (below.part === a.part || wired.has(key(a)) || wired.has(key(below))) return;
        this.wire(a.pin, below.pin, a.net);
        wired.add(key(a)).add(key(below));
      });
    }
    for (const p of pins) {
      if (wired.has(key(p))) continue;
      const dir = turnDirection(p.part, localDirection(p.part.kind, p.pin.pin));
      if (supplies.has(p.net)) this.naming('vdd', p.net, p.pin, railRotation(dir, 'up'));
      else if (grounds.has(p.net)) this.naming('gnd', p.net, p.pin, railRotation(dir, 'down'));
      // Channel-pin labels point right, never up or down, so stacked labels cannot collide.
      else this.naming('label', p.net, p.pin, p.pin.pin === 'gate' ? railRotation(dir, 'right') : 0);
    }
  }

  /** Pins by row (y), for the clear-run test of output wires; built once all but the outputs are placed. */
  private rowPins: Map<number, { x: number; part: SheetPart }[]> | null = null;

  private pinsOnRow(y: number): readonly { x: number; part: SheetPart }[] {
    if (this.rowPins === null) {
      this.rowPins = new Map();
      for (const part of this.parts)
        for (const q of pinPositions(part))
          (this.rowPins.get(q.y) ?? this.rowPins.set(q.y, []).get(q.y)!).push({ x: q.x, part });
    }
    return this.rowPins.get(y) ?? [];
  }

  /**
   * Draws the output pin's wire when a label of its net sits on the pin's row with a clear run to
   * it (no other pin on the way, which would join a foreign net); otherwise the name joins them.
   * Output pins stand right of everything else, so the ones placed meanwhile never block a run.
   */
  wireToOutput(net: string, at: Point): void {
    const row = this.pinsOnRow(at.y);
    const labels = row.filter(({ part: p }) => p.kind === 'label' && p.name === net && p.x < at.x);
    const start = labels.map((l) => l.part).sort((a, b) => b.x - a.x)[0];
    if (!start) return;
    const blocked = row.some(({ x, part }) => part !== start && x >= start.x && x < at.x);
    if (blocked) return;
    this.wires.push({ id: `w${this.wires.length + 1}`, points: [{ x: start.x, y: at.y }, at] });
    // The label turns to the left so its text does not sit on the new wire.
    this.parts[this.parts.indexOf(start)] = { ...start, rotation: 2 };
  }

  sheet(): Sheet {
    return { parts: this.parts, wires: this.wires };
  }
}

function key(p: { part: SheetPart; pin: { pin: string } }): string {
  return `${p.part.id}.${p.pin.pin}`;
}

/** Unit directions pointing away from a part at each pin, in local units, found once per kind and pin. */
const localDirections = new Map<string, Point>();

function localDirection(kind: PartKind, pin: string): Point {
  const key = `${kind}.${pin}`;
  let d = localDirections.get(key);
  if (d === undefined) {
    const p = partSpec(kind).pins.find((q) => q.name === pin)!;
    d = Math.abs(p.x) >= Math.abs(p.y) ? { x: Math.sign(p.x), y: 0 } : { x: 0, y: Math.sign(p.y) };
    localDirections.set(key, d);
  }
  return d;
}

/** Directions in the order of quarter turns: up, right, down, left. */
const TURN_ORDER: readonly Point[] = [
  { x: 0, y: -1 },
  { x: 1, y: 0 },
  { x: 0, y: 1 },
  { x: -1, y: 0 },
];
const NATURAL_TURN = { up: 0, right: 1, down: 2 } as const;

/** The rotation that turns a symbol drawn towards `natural` so it points along `dir`. */
function railRotation(dir: Point, natural: 'up' | 'down' | 'right'): Rotation {
  const target = TURN_ORDER.findIndex((d) => d.x === dir.x && d.y === dir.y);
  return ((((target - NATURAL_TURN[natural]) % 4) + 4) % 4) as Rotation;
}
