/**
 * Sheet geometry: what the editor draws. Coordinates are in grid units (integers); the editor
 * decides the pixel size of one unit. The netlist of a drawn design is derived from this.
 *
 * A part is its placement (`position.ts`) plus the typed properties of its kind. The union of part
 * records and the list of kinds are derived from the part specs' registry (`parts/index.ts`), so a
 * new kind is declared in one place.
 */
export type { PartKind, SheetPart } from './parts/index.ts';
export type { PartPlacement, Point, Rotation } from './position.ts';
import type { SheetPart } from './parts/index.ts';
import type { Point } from './position.ts';

/** An orthogonal polyline; each segment is horizontal or vertical. */
export interface SheetWire {
  readonly id: string;
  readonly points: readonly Point[];
}

export interface Sheet {
  readonly parts: readonly SheetPart[];
  readonly wires: readonly SheetWire[];
}
