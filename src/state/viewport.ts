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

/** Zooming out stops here, or lower where a cell is too big to show whole at this scale. */
export const MIN_SCALE = 4;
export const MAX_SCALE = 120;
/** The floor under any fit: a cell of 100,000 grid units still fits a 2,000-pixel screen. */
export const FLOOR_SCALE = 0.02;
export const DEFAULT_VIEWPORT: Viewport = { x: 200, y: 200, scale: 20 };

export function screenToSheet(v: Viewport, p: Point): Point {
  return { x: (p.x - v.x) / v.scale, y: (p.y - v.y) / v.scale };
}

export function sheetToScreen(v: Viewport, p: Point): Point {
  return { x: p.x * v.scale + v.x, y: p.y * v.scale + v.y };
}

/**
 * Zooms by `factor` keeping the sheet point under `screenPoint` still (zoom to cursor). `minScale`
 * is how far out the zoom may go: MIN_SCALE, or less for a cell that needs it (minScaleFor).
 */
export function zoomAt(v: Viewport, screenPoint: Point, factor: number, minScale = MIN_SCALE): Viewport {
  const scale = Math.min(MAX_SCALE, Math.max(minScale, v.scale * factor));
  const anchor = screenToSheet(v, screenPoint);
  return { scale, x: screenPoint.x - anchor.x * scale, y: screenPoint.y - anchor.y * scale };
}

/** The scale at which the box just fits the screen with its margin (at most MAX_SCALE). */
function fittingScale(box: Rect, width: number, height: number, margin: number): number {
  const w = Math.max(box.x1 - box.x0, 4);
  const h = Math.max(box.y1 - box.y0, 4);
  const fit = Math.min((width - 2 * margin) / w, (height - 2 * margin) / h);
  return Math.min(MAX_SCALE, Math.max(FLOOR_SCALE, fit));
}

/** How far out zooming may go for a cell: far enough to see all of it, and never less than the floor. */
export function minScaleFor(box: Rect | null, width: number, height: number): number {
  return box === null || width <= 0 || height <= 0
    ? MIN_SCALE
    : Math.min(MIN_SCALE, fittingScale(box, width, height, 40));
}

/** Shows the whole box in a screen of the given size, with a margin in pixels, however big the box. */
export function fitRect(box: Rect | null, width: number, height: number, margin = 40): Viewport {
  if (!box || width <= 0 || height <= 0) return DEFAULT_VIEWPORT;
  const scale = fittingScale(box, width, height, margin);
  const cx = (box.x0 + box.x1) / 2;
  const cy = (box.y0 + box.y1) / 2;
  return { scale, x: width / 2 - cx * scale, y: height / 2 - cy * scale };
}
