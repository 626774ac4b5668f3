/**
 * Sheet geometry: what the editor draws. Coordinates are in grid units (integers); the editor
 * decides the pixel size of one unit. The netlist of a drawn design is derived from this.
 */
export type PartKind =
  'nmos' | 'pmos' | 'resistor' | 'capacitor' | 'vdd' | 'gnd' | 'input' | 'output' | 'label';

/** Quarter turns clockwise. */
export type Rotation = 0 | 1 | 2 | 3;

export interface SheetPart {
  readonly id: string;
  readonly kind: PartKind;
  /** Device name (N1, P2, R1), pin name (A, Y) or label text (net name). */
  readonly name: string;
  readonly x: number;
  readonly y: number;
  readonly rotation: Rotation;
  readonly mirror: boolean;
  /** Transistor width and length, µm. */
  readonly w?: number;
  readonly l?: number;
  readonly ohms?: number;
  readonly farads?: number;
}

export interface Point {
  readonly x: number;
  readonly y: number;
}

/** An orthogonal polyline; each segment is horizontal or vertical. */
export interface SheetWire {
  readonly id: string;
  readonly points: readonly Point[];
}

export interface Sheet {
  readonly parts: readonly SheetPart[];
  readonly wires: readonly SheetWire[];
}
