/**
 * Sheet geometry: what the editor draws. Coordinates are in grid units (integers); the editor
 * decides the pixel size of one unit. The netlist of a drawn design is derived from this.
 *
 * A part is its placement (below) plus the typed properties of its kind. The union of part
 * records and the list of kinds are derived from the part specs' registry (`parts/index.ts`), so a
 * new kind is declared in one place.
 */
export type { PartKind, SheetPart } from './parts/index.ts';
import type { SheetPart } from './parts/index.ts';

/** Quarter turns clockwise. */
export type Rotation = 0 | 1 | 2 | 3;

/** What every part has, whatever its kind. */
export interface PartPlacement {
  readonly id: string;
  /** Device name (N1, P2, R1), pin name (A, Y) or label text (net name). */
  readonly name: string;
  readonly x: number;
  readonly y: number;
  readonly rotation: Rotation;
  readonly mirror: boolean;
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
