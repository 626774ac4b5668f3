/**
 * What stands out over the neutral scene: the selection in the selection colour with a dashed box
 * round each selected part, and what the panels asked to highlight in the highlight colour. Only
 * those items are painted; the rest of the bitmap stays clear.
 */
import type { Sheet } from '../../core/sheet/types.ts';
import type { Rect } from '../../core/sheet/geometry.ts';
import { partBounds } from '../../core/sheet/geometry.ts';
import { SHEET_THEME, WIRE_STROKE } from '../theme.ts';
import { itemsMeeting } from '../canvas/inkBounds.ts';
import { lineWidth, paintParts, traceWires } from './scenePaint.ts';

export interface EmphasisContent {
  readonly sheet: Sheet;
  readonly selectedParts: ReadonlySet<string>;
  readonly selectedWires: ReadonlySet<string>;
  readonly highlightParts: ReadonlySet<string>;
  readonly highlightWires: ReadonlySet<string>;
}

export function hasEmphasis(c: EmphasisContent): boolean {
  return c.selectedParts.size + c.selectedWires.size + c.highlightParts.size + c.highlightWires.size > 0;
}

function paintGroup(
  ctx: CanvasRenderingContext2D,
  sheet: Sheet,
  scale: number,
  colour: string,
  parts: ReadonlySet<string>,
  wires: ReadonlySet<string>,
): void {
  ctx.beginPath();
  traceWires(
    ctx,
    sheet.wires.filter((w) => wires.has(w.id)),
  );
  ctx.lineWidth = lineWidth(WIRE_STROKE, scale);
  ctx.strokeStyle = colour;
  ctx.stroke();
  paintParts(
    ctx,
    sheet.parts.filter((p) => parts.has(p.id)),
    scale,
    colour,
    null,
  );
}

export function paintEmphasis(
  ctx: CanvasRenderingContext2D,
  area: Rect,
  scale: number,
  c: EmphasisContent,
): void {
  if (!hasEmphasis(c)) return;
  const near = itemsMeeting(c.sheet, area);
  const sheet = { parts: near.parts, wires: near.wires };
  ctx.lineCap = 'round';
  ctx.lineJoin = 'round';
  paintGroup(ctx, sheet, scale, SHEET_THEME.highlight, c.highlightParts, c.highlightWires);
  paintGroup(ctx, sheet, scale, SHEET_THEME.selected, c.selectedParts, c.selectedWires);
  ctx.beginPath();
  for (const p of near.parts) {
    if (!c.selectedParts.has(p.id)) continue;
    const b = partBounds(p);
    ctx.rect(b.x0 - 0.3, b.y0 - 0.3, b.x1 - b.x0 + 0.6, b.y1 - b.y0 + 0.6);
  }
  ctx.setLineDash([0.3, 0.2]);
  ctx.lineWidth = lineWidth(0.05, scale);
  ctx.strokeStyle = SHEET_THEME.selected;
  ctx.stroke();
  ctx.setLineDash([]);
}
