/**
 * The levels of one vector painted into an area (sheet units): every wire and pin lead in its
 * level's look, the level marks with their problem badges, each transistor's on/off/maybe shape.
 * One path and one stroke per look, so a big sheet costs a few canvas calls; what to paint comes
 * from the pure paint model (core/view/overlayPaint.ts), which tests read without a canvas, and
 * only the shapes filed near the area (core/view/paintTiles.ts) are visited.
 */
import type { Rect } from '../../core/sheet/geometry.ts';
import type { OverlayPaint, PaintLayout } from '../../core/view/overlayPaint.ts';
import { shapesIn, type ShapesIn } from '../../core/view/paintTiles.ts';
import { LOOKS, type Conduction, type LookName } from '../../core/view/visualLanguage.ts';
import { SHEET_THEME } from '../theme.ts';

/** Level strokes sit over the scene's wires, a little wider so the ink shows as an outline. */
export const LEVEL_STROKE = 0.2;
const MARK_FONT = 0.55;
const RADIUS = 0.28;
const DEVICE_STYLE: Readonly<Record<Conduction, { fill: string; stroke: string; text: string }>> = {
  on: { fill: '#2f6b3a', stroke: '#2f6b3a', text: '' },
  off: { fill: SHEET_THEME.background, stroke: '#8d8d8d', text: '' },
  maybe: { fill: SHEET_THEME.background, stroke: '#b3243c', text: '?' },
};

/** Whether a polyline's box meets the area; a whole sheet's segments are tested on every paint. */
function meets(points: readonly number[], area: Rect): boolean {
  let left = true;
  let right = true;
  let above = true;
  let below = true;
  for (let i = 0; i + 1 < points.length; i += 2) {
    const x = points[i]!;
    const y = points[i + 1]!;
    left &&= x < area.x0;
    right &&= x > area.x1;
    above &&= y < area.y0;
    below &&= y > area.y1;
  }
  return !(left || right || above || below);
}

/** What the overlay paints: the drawing's layout and one vector's paint on it. */
export interface LevelScene {
  readonly layout: PaintLayout;
  readonly paint: OverlayPaint;
}

/** The scene with the layout entries near the area being painted (all of them when it is large). */
export interface Near extends LevelScene {
  readonly near: ShapesIn | null;
}

/** Calls `visit` on the listed positions, or on every position below `count` when there is no list. */
function eachOf(list: readonly number[] | undefined, count: number, visit: (i: number) => void): void {
  if (list !== undefined) for (const i of list) visit(i);
  else for (let i = 0; i < count; i++) visit(i);
}

function paintStrokes(ctx: CanvasRenderingContext2D, area: Rect, scale: number, scene: Near): void {
  const { layout, paint } = scene;
  const byLook = new Map<LookName, (readonly number[])[]>();
  eachOf(scene.near?.segments, layout.segments.length, (s) => {
    const segment = layout.segments[s]!;
    const entry = paint.nets[segment.net];
    if (entry == null || !meets(segment.points, area)) return;
    const list = byLook.get(entry.look);
    if (list) list.push(segment.points);
    else byLook.set(entry.look, [segment.points]);
  });
  ctx.lineCap = 'butt';
  ctx.lineJoin = 'round';
  ctx.lineWidth = LEVEL_STROKE;
  ctx.globalAlpha = 0.9;
  for (const [look, lines] of byLook) {
    const style = LOOKS[look];
    ctx.beginPath();
    for (const l of lines) {
      ctx.moveTo(l[0]!, l[1]!);
      for (let i = 2; i + 1 < l.length; i += 2) ctx.lineTo(l[i]!, l[i + 1]!);
    }
    // Dash lengths are in pixels, so they read the same at every zoom.
    ctx.setLineDash(style.dash.map((d) => d / scale));
    ctx.strokeStyle = style.colour;
    ctx.stroke();
  }
  ctx.setLineDash([]);
  ctx.globalAlpha = 1;
}

/** Level marks and problem badges as text, haloed in the sheet colour so they read over ink. */
function paintMarks(ctx: CanvasRenderingContext2D, area: Rect, { layout, paint, near }: Near): void {
  ctx.font = `bold ${MARK_FONT}px sans-serif`;
  ctx.textBaseline = 'top';
  ctx.textAlign = 'left';
  ctx.lineWidth = 0.12;
  ctx.strokeStyle = SHEET_THEME.background;
  eachOf(near?.marks, layout.marks.length, (k) => {
    const m = layout.marks[k]!;
    const entry = paint.nets[m.net];
    if (entry == null || m.x > area.x1 || m.y > area.y1 || m.x + 3 < area.x0 || m.y + 1 < area.y0) return;
    ctx.strokeText(entry.text, m.x, m.y);
    ctx.fillStyle = LOOKS[entry.look].colour;
    ctx.fillText(entry.text, m.x, m.y);
  });
}

/**
 * Transistor states as shapes: filled dot = conducting, hollow ring = off, ring with "?" = maybe
 * (its gate is unknown). Colour repeats the shape; it never carries the meaning alone.
 */
function paintDevices(ctx: CanvasRenderingContext2D, area: Rect, { layout, paint, near }: Near): void {
  ctx.lineWidth = 0.08;
  ctx.font = 'bold 0.42px sans-serif';
  ctx.textAlign = 'center';
  ctx.textBaseline = 'middle';
  eachOf(near?.devices, layout.devices.length, (i) => {
    const d = layout.devices[i]!;
    const conduction = paint.conduction[i];
    if (
      conduction === undefined ||
      d.x + RADIUS < area.x0 ||
      d.x - RADIUS > area.x1 ||
      d.y + RADIUS < area.y0 ||
      d.y - RADIUS > area.y1
    )
      return;
    const style = DEVICE_STYLE[conduction];
    ctx.beginPath();
    ctx.arc(d.x, d.y, RADIUS, 0, 2 * Math.PI, false);
    ctx.fillStyle = style.fill;
    ctx.strokeStyle = style.stroke;
    ctx.fill();
    ctx.stroke();
    if (style.text !== '') {
      ctx.fillStyle = style.stroke;
      ctx.fillText(style.text, d.x, d.y + 0.02);
    }
  });
}

/** Below these zooms (pixels per grid unit) device marks, then level marks, would be specks: left out. */
const DEVICES_FROM_PX = 3;
const MARKS_FROM_PX = 6;

export function paintOverlay(
  ctx: CanvasRenderingContext2D,
  area: Rect,
  scale: number,
  scene: LevelScene,
): void {
  // Only what lies near the area is visited: a toggle's repaint of a few tiles reads a few shapes.
  paintNear(ctx, area, scale, { ...scene, near: shapesIn(scene.layout, area) });
}

/** Paints the scene's shapes listed in `near` (every shape when it is null) that meet the area. */
export function paintNear(ctx: CanvasRenderingContext2D, area: Rect, scale: number, scene: Near): void {
  paintStrokes(ctx, area, scale, scene);
  if (scale >= DEVICES_FROM_PX) paintDevices(ctx, area, scene);
  if (scale >= MARKS_FROM_PX) paintMarks(ctx, area, scene);
}
