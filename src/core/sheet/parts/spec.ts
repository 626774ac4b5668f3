/**
 * What every part kind declares: its pins and drawing in local grid units (rotation 0), its
 * default properties, and what it contributes to the netlist. Views and the SVG export draw the
 * same primitives, so a symbol is defined once.
 */
import type { Device } from '../../model/netlist.ts';
import type { Point, SheetPart, PartKind } from '../types.ts';

/** Drawing primitives in local grid units. `points` are flat x,y pairs. */
export type Primitive =
  | { readonly type: 'line'; readonly points: readonly number[] }
  | { readonly type: 'polygon'; readonly points: readonly number[]; readonly filled: boolean }
  | { readonly type: 'circle'; readonly x: number; readonly y: number; readonly r: number };

export interface PinSpec extends Point {
  /** Terminal name as the netlist knows it: gate, drain, source, a, b, or `net` for naming parts. */
  readonly name: string;
}

/** Naming parts contribute no device; they give their net a name (and a role). */
export type NetRole = 'supply' | 'ground' | 'input' | 'output' | 'label';

export type PartRole =
  | {
      readonly type: 'device';
      readonly toDevice: (part: SheetPart, netOf: (pin: string) => string) => Device;
    }
  | { readonly type: 'net-name'; readonly role: NetRole };

export interface PartSpec {
  readonly kind: PartKind;
  /** Shown on the parts shelf and in the properties form. */
  readonly title: string;
  /** Prefix of generated names: N1, P1, R1, C1; naming parts use a default name instead. */
  readonly namePrefix: string;
  readonly pins: readonly PinSpec[];
  /** Body box for hit testing and box select, local units. */
  readonly box: { readonly x0: number; readonly y0: number; readonly x1: number; readonly y1: number };
  readonly symbol: readonly Primitive[];
  /** Where the name text sits, local units; the text itself is never rotated. */
  readonly nameAt: Point;
  readonly defaults: Partial<Pick<SheetPart, 'w' | 'l' | 'ohms' | 'farads'>>;
  readonly role: PartRole;
}
