/**
 * Everything the simulation overlay paints for one vector, as plain numbers grouped by look. The
 * canvas then draws each group in one pass (a few shapes, not one per wire), which keeps a
 * 2,000-device sheet smooth; and what is drawn can be tested without a canvas.
 */
import type { Point, Sheet, SheetPart } from '../sheet/types.ts';
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
  readonly pinNets: Readonly<Record<string, string>>;
  readonly partDevices: Readonly<Record<string, string>>;
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

export interface OverlayPaint {
  /** Polylines (flat x, y lists in grid units) per look. */
  readonly strokes: ReadonlyMap<LookName, readonly (readonly number[])[]>;
  readonly marks: readonly PaintedMark[];
  readonly devices: readonly PaintedDevice[];
}

/** In the empty corner between the gate lead and the drain lead of the MOS symbol (local units). */
export const DEVICE_MARK_AT: Point = { x: -1.4, y: -1.35 };
const NAMING_KINDS: ReadonlySet<string> = new Set(['input', 'output', 'label']);

function markText(state: NetState): string {
  return [lookOf(state).mark, ...problemMarks(state).map((m) => PROBLEM_GLYPHS[m])].join(' ');
}

function mark(at: Point, state: NetState): PaintedMark {
  return { x: at.x, y: at.y, text: markText(state), look: lookOf(state).name };
}

class PaintBuilder {
  readonly strokes = new Map<LookName, number[][]>();
  readonly marks: PaintedMark[] = [];
  readonly devices: PaintedDevice[] = [];
  private readonly marked = new Set<string>();

  constructor(private readonly nets: ReadonlyMap<string, NetState>) {}

  stroke(net: string | undefined, points: readonly Point[]): NetState | undefined {
    const state = net === undefined ? undefined : this.nets.get(net);
    if (state === undefined || points.length < 2) return state;
    const look = lookOf(state).name;
    const list = this.strokes.get(look) ?? [];
    list.push(points.flatMap((p) => [p.x, p.y]));
    this.strokes.set(look, list);
    return state;
  }

  /** One mark per net on the wires; naming parts always carry their own. */
  markOnce(net: string, at: Point, state: NetState): void {
    if (this.marked.has(net)) return;
    this.marked.add(net);
    this.marks.push(mark(at, state));
  }
}

function paintPart(
  b: PaintBuilder,
  part: SheetPart,
  geometry: PaintGeometry,
  devices: ReadonlyMap<string, Conduction>,
): void {
  for (const lead of pinLeads(part)) {
    const state = b.stroke(geometry.pinNets[`${part.id}.${lead.pin}`], [lead.from, lead.to]);
    if (state !== undefined && NAMING_KINDS.has(part.kind))
      b.marks.push(mark({ x: lead.from.x + 0.2, y: lead.from.y + 0.25 }, state));
  }
  const conduction =
    part.kind === 'nmos' || part.kind === 'pmos'
      ? devices.get(geometry.partDevices[part.id] ?? '')
      : undefined;
  if (conduction !== undefined) b.devices.push({ ...toWorld(part, DEVICE_MARK_AT), conduction });
}

export function overlayPaint(
  sheet: Sheet,
  geometry: PaintGeometry,
  nets: ReadonlyMap<string, NetState>,
  devices: ReadonlyMap<string, Conduction>,
): OverlayPaint {
  const b = new PaintBuilder(nets);
  for (const wire of sheet.wires) {
    const net = geometry.wireNets[wire.id];
    const state = b.stroke(net, wire.points);
    const [a, c] = wire.points;
    if (net !== undefined && state !== undefined && a !== undefined) {
      const end = c ?? a;
      b.markOnce(net, { x: (a.x + end.x) / 2 + 0.15, y: (a.y + end.y) / 2 - 0.65 }, state);
    }
  }
  for (const part of sheet.parts) paintPart(b, part, geometry, devices);
  return { strokes: b.strokes, marks: b.marks, devices: b.devices };
}
