/**
 * Everything the simulation overlay paints for one vector, as plain numbers grouped by look. The
 * canvas then draws each group in one pass (a few shapes, not one per wire), which keeps a
 * 2,000-device sheet smooth; and what is drawn can be tested without a canvas.
 *
 * Two phases: the layout (which segment belongs to which net, where marks go) depends only on the
 * drawing and is built once per edit; painting a vector then only looks up each net's state.
 */
import type { Point, Sheet } from '../sheet/types.ts';
import { toWorld, type Rect } from '../sheet/geometry.ts';
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

/** A drawn net's look and mark text for one vector. */
export interface NetPaint {
  readonly look: LookName;
  readonly text: string;
}

export interface OverlayPaint {
  /** Polylines per look. */
  readonly strokes: ReadonlyMap<LookName, readonly (readonly number[])[]>;
  readonly marks: readonly PaintedMark[];
  readonly devices: readonly PaintedDevice[];
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

function markText(state: NetState): string {
  return [lookOf(state).mark, ...problemMarks(state).map((m) => PROBLEM_GLYPHS[m])].join(' ');
}

/** One vector's paint: each segment filed under its net's look. Nets without a state are skipped. */
export function overlayPaint(
  layout: PaintLayout,
  net: (name: string) => NetState | undefined,
  device: (name: string) => Conduction | undefined,
): OverlayPaint {
  // Each drawn net's look and mark, worked out once: a net has many segments.
  const looks = layout.nets.map((name): NetPaint | null => {
    const state = net(name);
    return state === undefined ? null : { look: lookOf(state).name, text: markText(state) };
  });
  const strokes = new Map<LookName, (readonly number[])[]>();
  for (const segment of layout.segments) {
    const entry = looks[segment.net];
    if (entry === null || entry === undefined) continue;
    let list = strokes.get(entry.look);
    if (list === undefined) strokes.set(entry.look, (list = []));
    list.push(segment.points);
  }
  const marks: PaintedMark[] = [];
  for (const m of layout.marks) {
    const entry = looks[m.net];
    if (entry !== null && entry !== undefined)
      marks.push({ x: m.x, y: m.y, text: entry.text, look: entry.look });
  }
  const devices: PaintedDevice[] = [];
  const conduction = layout.devices.map((d) => device(d.name));
  layout.devices.forEach((d, i) => {
    const c = conduction[i];
    if (c !== undefined) devices.push({ x: d.x, y: d.y, conduction: c });
  });
  return { strokes, marks, devices, nets: looks, conduction };
}

/** The box around a flat x, y list. */
export function segmentBox(points: readonly number[]): Rect {
  let x0 = Infinity;
  let y0 = Infinity;
  let x1 = -Infinity;
  let y1 = -Infinity;
  for (let i = 0; i + 1 < points.length; i += 2) {
    const x = points[i]!;
    const y = points[i + 1]!;
    if (x < x0) x0 = x;
    if (x > x1) x1 = x;
    if (y < y0) y0 = y;
    if (y > y1) y1 = y;
  }
  return { x0, y0, x1, y1 };
}

/** How far a level mark's text reaches from its anchor (bold, 0.55 units high; generous). */
const MARK_REACH = { x: 3, y: 1 };
/** A device mark's radius, with its stroke. */
const DEVICE_REACH = 0.45;

function sameNetPaint(a: NetPaint | null | undefined, b: NetPaint | null | undefined): boolean {
  return a === b || (a != null && b != null && a.look === b.look && a.text === b.text);
}

/**
 * Where two paints of one layout differ: the segments and marks of every net whose look or mark
 * changed, and every device whose state changed (sheet units). A toggle that changes a few nets
 * repaints a few small areas.
 */
export function changedPaintAreas(layout: PaintLayout, before: OverlayPaint, after: OverlayPaint): Rect[] {
  const changed = layout.nets.map((_, i) => !sameNetPaint(before.nets[i], after.nets[i]));
  const areas: Rect[] = [];
  for (const segment of layout.segments) if (changed[segment.net]) areas.push(segmentBox(segment.points));
  for (const m of layout.marks)
    if (changed[m.net])
      areas.push({
        x0: m.x - 0.5,
        y0: m.y - MARK_REACH.y / 2,
        x1: m.x + MARK_REACH.x,
        y1: m.y + MARK_REACH.y,
      });
  layout.devices.forEach((d, i) => {
    if (before.conduction[i] !== after.conduction[i])
      areas.push({
        x0: d.x - DEVICE_REACH,
        y0: d.y - DEVICE_REACH,
        x1: d.x + DEVICE_REACH,
        y1: d.y + DEVICE_REACH,
      });
  });
  return areas;
}
