/**
 * Short lead segments at each pin of a part, pointing into its body: where the overlay paints a
 * net's level when the net is joined by labels or pin-to-pin contact rather than a drawn wire.
 */
import { partShape } from '../sheet/parts/index.ts';
import { toWorld } from '../sheet/geometry.ts';
import type { Point, SheetPart } from '../sheet/types.ts';

/** Grid units: long enough to show a dash pattern, short of the symbol body. */
export const LEAD_LENGTH = 1.2;

export interface PinLead {
  readonly pin: string;
  /** From the pin toward the body, world grid units. */
  readonly from: Point;
  readonly to: Point;
}

function towardBody(pin: Point, box: { x0: number; y0: number; x1: number; y1: number }): Point {
  // A pin at the origin (rails, pins, labels) points at the middle of the body; others at the origin.
  const target =
    pin.x === 0 && pin.y === 0 ? { x: (box.x0 + box.x1) / 2, y: (box.y0 + box.y1) / 2 } : { x: 0, y: 0 };
  const dx = target.x - pin.x;
  const dy = target.y - pin.y;
  const length = Math.hypot(dx, dy);
  if (length === 0) return pin;
  const step = Math.min(LEAD_LENGTH, length) / length;
  return { x: pin.x + dx * step, y: pin.y + dy * step };
}

export function pinLeads(part: SheetPart): PinLead[] {
  const spec = partShape(part);
  return spec.pins.map((pin) => ({
    pin: pin.name,
    from: toWorld(part, pin),
    to: toWorld(part, pin.lead ?? towardBody(pin, spec.box)),
  }));
}
