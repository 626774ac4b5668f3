/**
 * The viewport slice: where the sheet is on screen. `scale` is pixels per grid unit; (x, y) is the
 * screen position of grid point (0, 0). Not part of undo.
 */
import type { Point } from '../core/sheet/types.ts';
import type { Rect } from '../core/sheet/geometry.ts';

export interface Viewport {
  readonly x: number;
  readonly y: number;
  readonly scale: number;
}

export const MIN_SCALE = 4;
export const MAX_SCALE = 120;
export const DEFAULT_VIEWPORT: Viewport = { x: 200, y: 200, scale: 20 };

export function screenToSheet(v: Viewport, p: Point): Point {
  return { x: (p.x - v.x) / v.scale, y: (p.y - v.y) / v.scale };
}

export function sheetToScreen(v: Viewport, p: Point): Point {
  return { x: p.x * v.scale + v.x, y: p.y * v.scale + v.y };
}

/** Zooms by `factor` keeping the sheet point under `screenPoint` still (zoom to cursor). */
export function zoomAt(v: Viewport, screenPoint: Point, factor: number): Viewport {
  const scale = Math.min(MAX_SCALE, Math.max(MIN_SCALE, v.scale * factor));
  const anchor = screenToSheet(v, screenPoint);
  return { scale, x: screenPoint.x - anchor.x * scale, y: screenPoint.y - anchor.y * scale };
}

/** Shows the whole box in a screen of the given size, with a margin in pixels. */
export function fitRect(box: Rect | null, width: number, height: number, margin = 40): Viewport {
  if (!box || width <= 0 || height <= 0) return DEFAULT_VIEWPORT;
  const w = Math.max(box.x1 - box.x0, 4);
  const h = Math.max(box.y1 - box.y0, 4);
  const scale = Math.min(
    MAX_SCALE,
    Math.max(MIN_SCALE, Math.min((width - 2 * margin) / w, (height - 2 * margin) / h)),
  );
  const cx = (box.x0 + box.x1) / 2;
  const cy = (box.y0 + box.y1) / 2;
  return { scale, x: width / 2 - cx * scale, y: height / 2 - cy * scale };
}
