/**
 * An instance of another cell of the design, drawn as a symbol generated from that cell's pins
 * (docs/semantics.md §1, hierarchy; §9): inputs on the left, outputs on the right, one every two
 * grid units; the cell's rails are not drawn (they join the rails of the same name, as every rail
 * does). The body is a box with its top left corner cut, the instance name above it, the cell's
 * name below, each pin's name inside beside its lead. The part keeps the cell's name and its pins
 * (`cell`, `pins`) as text, so a sheet alone gives its connections; when the cell changes, the
 * design updates both (`core/hierarchy/instanceParts.ts`).
 */
import type { PartPlacement } from '../position.ts';
import { toWorld } from '../placement.ts';
import type { PartShape, PartSpec, PartText, PinSpec, Primitive } from './spec.ts';
import { noValue } from './text.ts';

export interface InstancePart extends PartPlacement {
  readonly kind: 'instance';
  /** The placed cell's name. */
  readonly cell: string;
  /** The placed cell's pins as JSON `{"in":[…],"out":[…]}` (`instancePins`). */
  readonly pins: string;
}

export interface InstancePins {
  readonly inputs: readonly string[];
  readonly outputs: readonly string[];
}

/** The `pins` text of an instance part. */
export function pinsText(pins: InstancePins): string {
  return JSON.stringify({ in: pins.inputs, out: pins.outputs });
}

const strings = (v: unknown): string[] =>
  Array.isArray(v) ? v.filter((s): s is string => typeof s === 'string' && s !== '') : [];

/** The pins an instance part shows; text that is not our JSON shows none. */
export function instancePins(part: Pick<InstancePart, 'pins'>): InstancePins {
  let read: unknown;
  try {
    read = JSON.parse(part.pins);
  } catch {
    return { inputs: [], outputs: [] };
  }
  const record = typeof read === 'object' && read !== null ? (read as Record<string, unknown>) : {};
  const inputs = [...new Set(strings(record['in']))];
  const taken = new Set(inputs);
  return { inputs, outputs: [...new Set(strings(record['out']))].filter((o) => !taken.has(o)) };
}

/** Grid units between pins, and the symbol's width from input lead to output lead. */
const PITCH = 2;
const WIDTH = 8;

function rows(pins: InstancePins): number {
  return Math.max(pins.inputs.length, pins.outputs.length, 1);
}

function shape(part: InstancePart): PartShape {
  const pins = instancePins(part);
  const bottom = (rows(pins) - 1) * PITCH + 1;
  const leads: PinSpec[] = [
    ...pins.inputs.map((name, k) => ({ name, x: 0, y: k * PITCH, lead: { x: 1, y: k * PITCH } })),
    ...pins.outputs.map((name, k) => ({
      name,
      x: WIDTH,
      y: k * PITCH,
      lead: { x: WIDTH - 1, y: k * PITCH },
    })),
  ];
  const symbol: Primitive[] = [
    { type: 'polygon', points: [1.7, -1, 7, -1, 7, bottom, 1, bottom, 1, -0.3], filled: false },
    ...leads.map((p): Primitive => ({
      type: 'line',
      points: p.x === 0 ? [0, p.y, 1, p.y] : [7, p.y, WIDTH, p.y],
    })),
  ];
  return { pins: leads, box: { x0: 0, y0: -1, x1: WIDTH, y1: bottom }, symbol };
}

/** A pin's name inside the body beside its lead, reading away from the lead whatever the turn. */
function pinName(part: InstancePart, pin: PinSpec): PartText {
  const lead = toWorld(part, pin);
  const at = toWorld(part, { x: pin.x === 0 ? 1.4 : WIDTH - 1.4, y: pin.y });
  const align = at.x > lead.x ? 'start' : at.x < lead.x ? 'end' : 'middle';
  return { text: pin.name, x: at.x, y: at.y, align, style: 'value' };
}

function texts(part: InstancePart): PartText[] {
  const { pins, box } = shape(part);
  const name = toWorld(part, { x: 1, y: box.y0 - 0.7 });
  const cell = toWorld(part, { x: 1, y: box.y1 + 0.7 });
  const own: PartText[] =
    part.name === '' ? [] : [{ text: part.name, ...name, align: 'start', style: 'name' }];
  return [
    ...own,
    { text: part.cell, ...cell, align: 'start', style: 'value' },
    ...pins.map((p) => pinName(part, p)),
  ];
}

export const INSTANCE_SPEC: PartSpec<InstancePart> = {
  kind: 'instance',
  title: 'Instance of a cell',
  searchWords: 'subcell hierarchy block',
  naming: { type: 'numbered', prefix: 'X' },
  // Generated per part from its cell's pins (`shape`); the static fields describe a cell with none.
  pins: [],
  box: { x0: 0, y0: -1, x1: WIDTH, y1: 1 },
  symbol: [],
  shape,
  onShelf: false,
  fields: [],
  textProps: ['cell', 'pins'],
  defaults: { cell: '', pins: pinsText({ inputs: [], outputs: [] }) },
  valueLabel: noValue,
  texts,
  role: { type: 'instance' },
};
