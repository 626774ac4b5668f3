/**
 * Everything the simulation overlay paints for one vector, as plain data the canvas draws grouped
 * by look (a few shapes, not one per wire), which keeps a 5,000-device sheet smooth; and what is
 * drawn can be tested without a canvas.
 *
 * Two phases: the layout (which segment belongs to which net, where marks go) depends only on the
 * drawing and is built once per edit; painting a vector is then one look per drawn net and one
 * state per transistor, and a toggle changes only the entries it moved (paintSolved.ts).
 */
import type { Point, Sheet } from '../sheet/types.ts';
import { toWorld } from '../sheet/geometry.ts';
import { pinLeads } from './pinLeads.ts';
import {
  lookOf,
  PROBLEM_GLYPHS,
  problemMarks,
  type Conduction,
  type LookName,
  type NetState,
} from './visualLanguage.ts';

/** The editor's derived facts the overlay reads. */
export interface PaintGeometry {
  readonly wireNets: Readonly<Record<string, string>>;
  readonly pinNets: ReadonlyMap<string, string>;
  readonly partDevices: Readonly<Record<string, string>>;
}

interface Spot extends Point {
  readonly name: string;
}

export interface PaintLayout {
  /** The nets drawn, each once; segments and marks refer to them by position. */
  readonly nets: readonly string[];
  /** Wire polylines and pin leads, each with its net (flat x, y lists in grid units). */
  readonly segments: readonly { readonly net: number; readonly points: readonly number[] }[];
  /** Where each net's level mark is written: once on its first wire, and at every naming part. */
  readonly marks: readonly (Point & { readonly net: number })[];
  /** Where each transistor's on/off/maybe mark sits, by device name. */
  readonly devices: readonly Spot[];
}

export interface PaintedMark {
  readonly x: number;
  readonly y: number;
  /** The level mark, then any problem badges: `0`, `Z ◌`, `X ⚔`. */
  readonly text: string;
  readonly look: LookName;
}

export interface PaintedDevice {
  readonly x: number;
  readonly y: number;
  readonly conduction: Conduction;
}

/** A drawn net's look and mark text for one vector; one shared object per look and text. */
export interface NetPaint {
  readonly look: LookName;
  readonly text: string;
}

/**
 * One vector's paint on a layout: each drawn net's look and each transistor's state, by position.
 * What is drawn is the layout read through these two lists (`strokesByLook`, `paintedMarks`,
 * `paintedDevices`), so a toggle that changes a few nets changes a few entries (paintSolved.ts).
 */
export interface OverlayPaint {
  /** Each layout net's paint (null: not solved), by its position in `layout.nets`. */
  readonly nets: readonly (NetPaint | null)[];
  /** Each layout device's state, by its position in `layout.devices`. */
  readonly conduction: readonly (Conduction | undefined)[];
}

/** In the empty corner between the gate lead and the drain lead of the MOS symbol (local units). */
export const DEVICE_MARK_AT: Point = { x: -1.4, y: -1.35 };
const NAMING_KINDS: ReadonlySet<string> = new Set(['input', 'output', 'label']);

/** Collects the layout, numbering nets as they are met. */
class LayoutBuilder {
  readonly nets: string[] = [];
  readonly segments: PaintLayout['segments'][number][] = [];
  readonly marks: PaintLayout['marks'][number][] = [];
  readonly devices: Spot[] = [];
  private readonly ids = new Map<string, number>();

  id(net: string): number {
    let id = this.ids.get(net);
    if (id === undefined) {
      id = this.nets.length;
      this.ids.set(net, id);
      this.nets.push(net);
    }
    return id;
  }
}

function layWires(b: LayoutBuilder, sheet: Sheet, geometry: PaintGeometry): void {
  const marked = new Set<string>();
  for (const wire of sheet.wires) {
    const net = geometry.wireNets[wire.id];
    const [a, c] = wire.points;
    if (net === undefined || a === undefined) continue;
    b.segments.push({ net: b.id(net), points: wire.points.flatMap((p) => [p.x, p.y]) });
    if (marked.has(net)) continue;
    marked.add(net);
    const end = c ?? a;
    b.marks.push({ net: b.id(net), x: (a.x + end.x) / 2 + 0.15, y: (a.y + end.y) / 2 - 0.65 });
  }
}

export function paintLayout(sheet: Sheet, geometry: PaintGeometry): PaintLayout {
  const b = new LayoutBuilder();
  layWires(b, sheet, geometry);
  for (const part of sheet.parts) {
    for (const lead of pinLeads(part)) {
      const net = geometry.pinNets.get(`${part.id}.${lead.pin}`);
      if (net === undefined) continue;
      b.segments.push({ net: b.id(net), points: [lead.from.x, lead.from.y, lead.to.x, lead.to.y] });
      // Pins, rails, labels and an instance's pins show their level as a mark beside the lead.
      if (NAMING_KINDS.has(part.kind) || part.kind === 'instance')
        b.marks.push({ net: b.id(net), x: lead.from.x + 0.2, y: lead.from.y + 0.25 });
    }
    const device = geometry.partDevices[part.id];
    if (device !== undefined && (part.kind === 'nmos' || part.kind === 'pmos')) {
      b.devices.push({ name: device, ...toWorld(part, DEVICE_MARK_AT) });
    }
  }
  return { nets: b.nets, segments: b.segments, marks: b.marks, devices: b.devices };
}

const LEVEL_KEY: Readonly<Record<NetState['level'], number>> = { '0': 0, '1': 1, X: 2, Z: 3 };

/** The facts a net's paint depends on, as a number below 128. */
function paintKey(s: NetState): number {
  const bit = (on: boolean, at: number): number => (on ? 1 << at : 0);
  return (
    LEVEL_KEY[s.level] |
    bit(s.degraded, 2) |
    bit(s.contention, 3) |
    bit(s.chargeShared, 4) |
    bit(s.oscillating, 5) |
    bit(s.stored, 6)
  );
}

/** Paint by key (paintKey); dense, so looking one up is fast. */
const shared: (NetPaint | null)[] = new Array<NetPaint | null>(128).fill(null);

/** A net state's look and mark text, the same object for the same look and text. */
export function netPaint(state: NetState): NetPaint {
  const key = paintKey(state);
  let paint = shared[key];
  if (paint === null || paint === undefined) {
    const look = lookOf(state);
    const text = [look.mark, ...problemMarks(state).map((m) => PROBLEM_GLYPHS[m])].join(' ');
    shared[key] = paint = { look: look.name, text };
  }
  return paint;
}

/** One vector's paint, read by name. Nets without a state are not painted. */
export function overlayPaint(
  layout: PaintLayout,
  net: (name: string) => NetState | undefined,
  device: (name: string) => Conduction | undefined,
): OverlayPaint {
  return {
    nets: layout.nets.map((name) => {
      const state = net(name);
      return state === undefined ? null : netPaint(state);
    }),
    conduction: layout.devices.map((d) => device(d.name)),
  };
}

/** The painted segments filed by look: one polyline list per look, drawn in one pass each. */
export function strokesByLook(
  layout: PaintLayout,
  paint: OverlayPaint,
): Map<LookName, (readonly number[])[]> {
  const strokes = new Map<LookName, (readonly number[])[]>();
  for (const segment of layout.segments) {
    const entry = paint.nets[segment.net];
    if (entry == null) continue;
    let list = strokes.get(entry.look);
    if (list === undefined) strokes.set(entry.look, (list = []));
    list.push(segment.points);
  }
  return strokes;
}

/** The level marks of the painted nets, in layout order. */
export function paintedMarks(layout: PaintLayout, paint: OverlayPaint): PaintedMark[] {
  const marks: PaintedMark[] = [];
  for (const m of layout.marks) {
    const entry = paint.nets[m.net];
    if (entry != null) marks.push({ x: m.x, y: m.y, text: entry.text, look: entry.look });
  }
  return marks;
}

/** The transistor marks of the solved devices, in layout order. */
export function paintedDevices(layout: PaintLayout, paint: OverlayPaint): PaintedDevice[] {
  const devices: PaintedDevice[] = [];
  layout.devices.forEach((d, i) => {
    const c = paint.conduction[i];
    if (c !== undefined) devices.push({ x: d.x, y: d.y, conduction: c });
  });
  return devices;
}
