/**
 * What every part kind declares about itself: its pins and drawing in local grid units (rotation
 * 0), its typed properties with their defaults and editable fields, the text drawn beside it, how
 * new parts of the kind are named, and what it contributes to the netlist. The canvas, the SVG
 * export, the properties form, the design-file reader and auto-placement all read these, so a kind
 * is described once.
 */
import type { Device } from '../../model/netlist.ts';
import type { PartPlacement, Point } from '../position.ts';
import type { Quantity } from './quantities.ts';

/** Drawing primitives in local grid units. `points` are flat x,y pairs. */
export type Primitive =
  | { readonly type: 'line'; readonly points: readonly number[] }
  | { readonly type: 'polygon'; readonly points: readonly number[]; readonly filled: boolean }
  | { readonly type: 'circle'; readonly x: number; readonly y: number; readonly r: number };

export interface PinSpec extends Point {
  /** Terminal name as the netlist knows it (gate, drain, source, a, b, anode, cathode), or `net`. */
  readonly name: string;
  /** Where the pin's lead meets the body, when not the usual (core/view/pinLeads.ts). */
  readonly lead?: Point;
}

/** The smallest shape of a part record: a placement and a kind. */
export type AnyPart = PartPlacement & { readonly kind: string };

/** A part's own properties: everything but its placement and kind (numbers in model units, and text). */
export type PartProps<P> = P extends unknown ? Omit<P, keyof PartPlacement | 'kind'> : never;
export type PropKey<P> = P extends unknown ? Exclude<keyof P, keyof PartPlacement | 'kind'> : never;

/** One editable property: the label beside its box (without the unit) and the quantity it holds. */
export interface FieldSpec<K extends string = string> {
  readonly key: K;
  readonly label: string;
  readonly quantity: Quantity;
}

/** One line of text drawn with a part, in world grid units; `y` is the middle of the line. */
export interface PartText {
  readonly text: string;
  readonly x: number;
  readonly y: number;
  readonly align: 'start' | 'middle' | 'end';
  /** name: the part's name (bold); value: its size (small, subdued); net: a label's net (italic). */
  readonly style: 'name' | 'value' | 'net';
}

/**
 * How a new part is named: devices are numbered per prefix (N1, N2, …), rails take one fixed
 * name, pins take the next unused letter and then numbered names.
 */
export type PartNaming =
  | { readonly type: 'numbered'; readonly prefix: string }
  | { readonly type: 'fixed'; readonly name: string }
  | { readonly type: 'letters'; readonly letters: string; readonly prefix: string };

/** Naming parts contribute no device; they give their net a name (and a role). */
export type NetRole = 'supply' | 'ground' | 'input' | 'output' | 'label';

export interface DeviceRole<P> {
  readonly type: 'device';
  /** The model device kind this part stands for (auto-placement maps imported devices back). */
  readonly deviceKind: Device['kind'];
  readonly toDevice: (part: P, netOf: (pin: string) => string) => Device;
  /** The part properties of an imported device of `deviceKind`. */
  readonly fromDevice: (device: Device) => PartProps<P>;
}

export interface NetNameRole {
  readonly type: 'net-name';
  readonly role: NetRole;
}

/** An instance of another cell: it contributes an instance of that cell, wired by its pins. */
export interface InstanceRole {
  readonly type: 'instance';
}

export type PartRole<P> = DeviceRole<P> | NetNameRole | InstanceRole;

/** Pins, body box and symbol of one part, in local units (see `PartSpec.shape`). */
export interface PartShape {
  readonly pins: readonly PinSpec[];
  readonly box: { readonly x0: number; readonly y0: number; readonly x1: number; readonly y1: number };
  readonly symbol: readonly Primitive[];
}

export interface PartSpec<P extends AnyPart> {
  readonly kind: P['kind'];
  /** Shown on the parts shelf, in the properties form and in the command list. */
  readonly title: string;
  /** Other words the shelf's search matches (lower case, space separated). */
  readonly searchWords: string;
  readonly naming: PartNaming;
  readonly pins: readonly PinSpec[];
  /** Body box for hit testing and box select, local units. */
  readonly box: { readonly x0: number; readonly y0: number; readonly x1: number; readonly y1: number };
  readonly symbol: readonly Primitive[];
  /** A kind whose pins depend on the part (an instance's cell) gives them per part. */
  readonly shape?: (part: P) => PartShape;
  /** False for a kind placed by other means than the parts shelf (an instance, from its cell). */
  readonly onShelf?: false;
  /** The editable properties beyond the name, in form order. */
  readonly fields: readonly FieldSpec<PropKey<P> & string>[];
  /**
   * Text properties the part keeps as they came and never edits (a transistor's model card name,
   * from an imported netlist); absent when the part has none.
   */
  readonly textProps?: readonly (PropKey<P> & string)[];
  readonly defaults: PartProps<P>;
  /** The part's size as one short line ("2/0.25", "10 kΩ"), '' when it has none. */
  readonly valueLabel: (part: P) => string;
  /** Every line of text drawn with the part; the text itself is never rotated. */
  readonly texts: (part: P) => readonly PartText[];
  readonly role: PartRole<P>;
}

/**
 * A device role whose conversions are typed by the device kind. The registry hands `fromDevice`
 * any model device; the guard refuses one of another kind instead of reading missing fields.
 */
export function deviceRole<P, D extends Device>(role: {
  readonly deviceKind: D['kind'];
  readonly toDevice: (part: P, netOf: (pin: string) => string) => D;
  readonly fromDevice: (device: D) => PartProps<P>;
}): DeviceRole<P> {
  const isMine = (d: Device): d is D => d.kind === role.deviceKind;
  return {
    type: 'device',
    deviceKind: role.deviceKind,
    toDevice: role.toDevice,
    fromDevice: (device) => {
      if (!isMine(device)) throw new Error(`a ${device.kind} is not a ${role.deviceKind}`);
      return role.fromDevice(device);
    },
  };
}

/** Rails, pins and labels: a placement and a kind, nothing more. */
export interface NamingPart<K extends string> extends PartPlacement {
  readonly kind: K;
}
