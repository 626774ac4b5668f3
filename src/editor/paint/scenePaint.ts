/**
 * The sheet in neutral ink, painted into an area (sheet units): wires, junction dots, open wire
 * ends, part symbols and their text (the grid dots are painted live under it, by GridLayer). Everything of one look is one path and one stroke,
 * so a thousand parts cost a few canvas calls. Selection and the panels' highlights are painted
 * apart (emphasisPaint.ts); levels by the simulation overlay.
 */
import type { Point, Sheet } from '../../core/sheet/types.ts';
import { partBounds, type Rect } from '../../core/sheet/geometry.ts';
import type { PartText } from '../../core/sheet/parts/index.ts';
import { PART_PAINTERS } from '../devices/index.ts';
import { textDetail, writeTexts } from '../devices/symbolPainter.ts';
import { JUNCTION_RADIUS, SHEET_THEME, STROKE, WIRE_STROKE } from '../theme.ts';
import { itemsMeeting, overlaps, pointInk } from '../canvas/inkBounds.ts';
import type { SheetPart, SheetWire } from '../../core/sheet/types.ts';

export interface SceneContent {
  readonly sheet: Sheet;
  readonly junctions: readonly Point[];
  readonly openEnds: readonly Point[];
}

/** Lines never thinner than this many pixels, so a zoomed-out sheet stays legible. */
const MIN_LINE_PX = 0.8;

/** Below this many pixels per grid unit a part is drawn as its box. */
const OUTLINE_BELOW_PX = 2;

export const lineWidth = (units: number, scale: number): number => Math.max(units, MIN_LINE_PX / scale);

export function traceWires(ctx: CanvasRenderingContext2D, wires: readonly SheetWire[]): void {
  for (const w of wires) {
    w.points.forEach((p, i) => (i === 0 ? ctx.moveTo(p.x, p.y) : ctx.lineTo(p.x, p.y)));
  }
}

/** Parts' outlines stroked and filled shapes filled, all in one colour, then their text (if `text` is given). */
export function paintParts(
  ctx: CanvasRenderingContext2D,
  parts: readonly SheetPart[],
  scale: number,
  colour: string,
  text: ((style: PartText['style']) => string) | null,
): void {
  ctx.beginPath();
  if (scale < OUTLINE_BELOW_PX) {
    // A part a few pixels across: its box says where it is; its symbol would be a smudge.
    for (const p of parts) {
      const b = partBounds(p);
      ctx.rect(b.x0, b.y0, b.x1 - b.x0, b.y1 - b.y0);
    }
  } else for (const p of parts) PART_PAINTERS[p.kind].trace(ctx, p, false);
  ctx.lineWidth = lineWidth(STROKE, scale);
  ctx.strokeStyle = colour;
  ctx.stroke();
  if (scale < OUTLINE_BELOW_PX) return;
  ctx.beginPath();
  for (const p of parts) PART_PAINTERS[p.kind].trace(ctx, p, true);
  ctx.fillStyle = colour;
  ctx.fill();
  const detail = textDetail(scale);
  if (detail !== 'none' && text !== null)
    writeTexts(
      ctx,
      parts.flatMap((p) => PART_PAINTERS[p.kind].texts(p, detail)),
      text,
    );
}

function paintMarks(
  ctx: CanvasRenderingContext2D,
  area: Rect,
  junctions: readonly Point[],
  openEnds: readonly Point[],
  scale: number,
): void {
  ctx.beginPath();
  for (const j of junctions) {
    if (!overlaps(pointInk(j), area)) continue;
    ctx.moveTo(j.x + JUNCTION_RADIUS, j.y);
    ctx.arc(j.x, j.y, JUNCTION_RADIUS, 0, 2 * Math.PI);
  }
  ctx.fillStyle = SHEET_THEME.wire;
  ctx.fill();
  // An unfinished wire end: a small hollow diamond, so it reads without colour.
  const d = 0.25;
  ctx.beginPath();
  for (const e of openEnds) {
    if (!overlaps(pointInk(e), area)) continue;
    ctx.moveTo(e.x, e.y - d);
    ctx.lineTo(e.x + d, e.y);
    ctx.lineTo(e.x, e.y + d);
    ctx.lineTo(e.x - d, e.y);
    ctx.closePath();
  }
  ctx.lineWidth = lineWidth(0.06, scale);
  ctx.strokeStyle = SHEET_THEME.subtleText;
  ctx.stroke();
}

export function sceneTextColour(style: PartText['style']): string {
  return style === 'value' ? SHEET_THEME.subtleText : SHEET_THEME.text;
}

export function paintScene(
  ctx: CanvasRenderingContext2D,
  area: Rect,
  scale: number,
  content: SceneContent,
): void {
  const { parts, wires } = itemsMeeting(content.sheet, area);
  ctx.lineCap = 'round';
  ctx.lineJoin = 'round';
  ctx.beginPath();
  traceWires(ctx, wires);
  ctx.lineWidth = lineWidth(WIRE_STROKE, scale);
  ctx.strokeStyle = SHEET_THEME.wire;
  ctx.stroke();
  paintMarks(ctx, area, content.junctions, content.openEnds, scale);
  paintParts(ctx, parts, scale, SHEET_THEME.ink, sceneTextColour);
}
