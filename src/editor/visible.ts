/**
 * Culling: only what intersects the screen (plus a margin) is handed to Konva, so a large sheet
 * costs what is visible, not what exists. Text is dropped when too small to read.
 */
import type { Sheet, SheetPart, SheetWire } from '../core/sheet/types.ts';
import { partBounds, pointsBounds, type Rect } from '../core/sheet/geometry.ts';
import { screenToSheet, type Viewport } from '../state/viewport.ts';

/** Grid units kept beyond the screen edge, so text hanging off a part is not clipped. */
const MARGIN = 4;

export function visibleRect(v: Viewport, screen: { width: number; height: number }): Rect {
  const a = screenToSheet(v, { x: 0, y: 0 });
  const b = screenToSheet(v, { x: screen.width, y: screen.height });
  return { x0: a.x - MARGIN, y0: a.y - MARGIN, x1: b.x + MARGIN, y1: b.y + MARGIN };
}

function overlaps(a: Rect, b: Rect): boolean {
  return a.x0 <= b.x1 && b.x0 <= a.x1 && a.y0 <= b.y1 && b.y0 <= a.y1;
}

export function visibleItems(sheet: Sheet, view: Rect): { parts: SheetPart[]; wires: SheetWire[] } {
  return {
    parts: sheet.parts.filter((p) => overlaps(partBounds(p), view)),
    wires: sheet.wires.filter((w) => {
      const b = pointsBounds(w.points);
      return b !== null && overlaps(b, view);
    }),
  };
}

/** How much text to draw at a zoom: values need ~10 px per unit to be legible, names ~6. */
export type TextDetail = 'full' | 'names' | 'none';

export function textDetail(scale: number): TextDetail {
  return scale >= 10 ? 'full' : scale >= 6 ? 'names' : 'none';
}
