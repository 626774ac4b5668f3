/**
 * A part drawn from its spec alone, onto a 2D canvas in sheet units: the symbol's primitives turned
 * and mirrored into place (the same primitives the SVG export writes), then the spec's upright text
 * lines. Paths are added to a caller's path, so a painter can stroke every part of one colour at
 * once.
 */
import type { SheetPart } from '../../core/sheet/types.ts';
import { partShape, partSpec, type PartText } from '../../core/sheet/parts/index.ts';
import { TEXT_SIZE } from '../../core/sheet/parts/text.ts';
import { toWorld } from '../../core/sheet/geometry.ts';

/** How much text to draw at a zoom: values need ~10 px per unit to be legible, names ~6. */
export type TextDetail = 'full' | 'names' | 'none';

export function textDetail(scale: number): TextDetail {
  return scale >= 10 ? 'full' : scale >= 6 ? 'names' : 'none';
}

/** Values need the most room to be legible; names and net labels stay down to the 'names' zoom. */
export function textShown(detail: TextDetail, style: PartText['style']): boolean {
  return detail === 'full' || (detail === 'names' && style !== 'value');
}

/** Adds a part's outline primitives (lines, polygons, circles) to `path`; `filled` picks the filled polygons instead. */
export function traceSymbol(path: CanvasPath, part: SheetPart, filled: boolean): void {
  for (const p of partShape(part).symbol) {
    if (p.type === 'circle') {
      if (filled) continue;
      const c = toWorld(part, p);
      path.moveTo(c.x + p.r, c.y);
      path.arc(c.x, c.y, p.r, 0, 2 * Math.PI);
      continue;
    }
    if (filled !== (p.type === 'polygon' && p.filled)) continue;
    for (let i = 0; i + 1 < p.points.length; i += 2) {
      const w = toWorld(part, { x: p.points[i]!, y: p.points[i + 1]! });
      if (i === 0) path.moveTo(w.x, w.y);
      else path.lineTo(w.x, w.y);
    }
    if (p.type === 'polygon') path.closePath();
  }
}

export const TEXT_FONT: Readonly<Record<PartText['style'], string>> = {
  name: `bold ${TEXT_SIZE.name}px sans-serif`,
  value: `${TEXT_SIZE.value}px sans-serif`,
  net: `italic ${TEXT_SIZE.net}px sans-serif`,
};

const ALIGN: Readonly<Record<PartText['align'], CanvasTextAlign>> = {
  start: 'left',
  middle: 'center',
  end: 'right',
};

/** The part's text lines that show at this detail. */
export function shownTexts(part: SheetPart, detail: TextDetail): PartText[] {
  return detail === 'none'
    ? []
    : partSpec(part.kind)
        .texts(part)
        .filter((t) => textShown(detail, t.style));
}

/** Writes text lines, upright, each placed by the middle of its height as the spec lays it out. */
export function writeTexts(
  ctx: CanvasRenderingContext2D,
  lines: readonly PartText[],
  colours: (style: PartText['style']) => string,
): void {
  ctx.textBaseline = 'middle';
  for (const line of lines) {
    ctx.font = TEXT_FONT[line.style];
    ctx.textAlign = ALIGN[line.align];
    ctx.fillStyle = colours(line.style);
    ctx.fillText(line.text, line.x, line.y);
  }
}
