/**
 * Where a part sits on the sheet: grid points, quarter turns and the placement every part has. Kept
 * apart from `types.ts` (whose part union is derived from the part specs) so the specs can name a
 * placement without an import cycle; `types.ts` re-exports these for everyone else.
 */

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
