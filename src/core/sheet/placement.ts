/**
 * Local → world transforms of a placed part. Kept apart from `geometry.ts` (which reads the part
 * specs) so the specs themselves can place their text without an import cycle.
 */
import type { PartPlacement, Point } from './position.ts';

export type Placement = Pick<PartPlacement, 'x' | 'y' | 'rotation' | 'mirror'>;

/** Local → world: mirror across the vertical axis first, then quarter turns clockwise, then move. */
export function toWorld(place: Placement, p: Point): Point {
  let x = place.mirror ? -p.x : p.x;
  let y = p.y;
  for (let i = 0; i < place.rotation; i++) {
    // One clockwise quarter turn with y down: right becomes down.
    const t = x;
    x = -y;
    y = t;
  }
  // `+ 0` turns -0 into 0 so equal points print and compare alike.
  return { x: x + place.x + 0, y: y + place.y + 0 };
}

/** Direction (unit vector) of a local direction after placement, without the translation. */
export function turnDirection(place: Pick<Placement, 'rotation' | 'mirror'>, d: Point): Point {
  return toWorld({ x: 0, y: 0, rotation: place.rotation, mirror: place.mirror }, d);
}
