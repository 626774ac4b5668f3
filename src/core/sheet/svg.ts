/**
 * The sheet as a standalone SVG document (W3C SVG 1.1): symbols from the same primitives the
 * editor draws, wires, junction dots and upright text. Neutral ink only: levels are not exported.
 */
import type { Sheet, SheetPart } from './types.ts';
import { partShape, partSpec, type PartText, type Primitive } from './parts/index.ts';
import { TEXT_SIZE } from './parts/text.ts';
import { partBounds, pointsBounds, toWorld, unionRects } from './geometry.ts';
import { printable } from '../text/printable.ts';
import { sheetConnectivity } from './connectivity.ts';

export interface SvgOptions {
  /** Pixels per grid unit. */
  readonly scale: number;
  readonly margin: number;
  readonly ink: string;
  readonly background: string;
}

const DEFAULTS: SvgOptions = { scale: 20, margin: 2, ink: '#2b2d33', background: '#ffffff' };

/**
 * Text as XML 1.0 character data or an attribute value: markup characters as entities, and every
 * character XML forbids (controls, lone surrogates, U+FFFE/FFFF) or a reader would not see (format
 * characters, separators) as a visible escape (printable.ts), so the file always parses.
 */
function escapeXml(text: string): string {
  return printable(text).replace(
    /[<>&"']/g,
    (c) => ({ '<': '&lt;', '>': '&gt;', '&': '&amp;', '"': '&quot;', "'": '&apos;' })[c]!,
  );
}

const n = (v: number): string => String(Math.round(v * 1000) / 1000);

function primitiveSvg(part: SheetPart, p: Primitive): string {
  const pts = (flat: readonly number[]): string => {
    const out: string[] = [];
    for (let i = 0; i < flat.length; i += 2) {
      const w = toWorld(part, { x: flat[i]!, y: flat[i + 1]! });
      out.push(`${n(w.x)},${n(w.y)}`);
    }
    return out.join(' ');
  };
  switch (p.type) {
    case 'line':
      return `<polyline points="${pts(p.points)}" fill="none"/>`;
    case 'polygon':
      return `<polygon points="${pts(p.points)}"${p.filled ? ' fill="currentColor"' : ' fill="none"'}/>`;
    case 'circle': {
      const c = toWorld(part, p);
      return `<circle cx="${n(c.x)}" cy="${n(c.y)}" r="${n(p.r)}" fill="none"/>`;
    }
  }
}

const TEXT_LOOK: Readonly<Record<PartText['style'], string>> = {
  name: ' font-weight="bold"',
  value: '',
  net: ' font-style="italic"',
};

/**
 * A part's text as its spec lays it out for the canvas. SVG places text by its baseline, which sits
 * about 0.35 of the font size below the middle of the line.
 */
function partTexts(part: SheetPart): string {
  return partSpec(part.kind)
    .texts(part)
    .map((t) => {
      const size = TEXT_SIZE[t.style];
      const anchor = t.align === 'start' ? '' : ` text-anchor="${t.align}"`;
      return `<text x="${n(t.x)}" y="${n(t.y + size * 0.35)}" font-size="${size}"${anchor}${TEXT_LOOK[t.style]}>${escapeXml(t.text)}</text>`;
    })
    .join('');
}

export function sheetToSvg(sheet: Sheet, options: Partial<SvgOptions> = {}): string {
  const o = { ...DEFAULTS, ...options };
  const box = unionRects([
    ...sheet.parts.map(partBounds),
    ...sheet.wires.flatMap((w) => pointsBounds(w.points) ?? []),
  ]) ?? {
    x0: 0,
    y0: 0,
    x1: 10,
    y1: 10,
  };
  const x0 = box.x0 - o.margin - 2;
  const y0 = box.y0 - o.margin;
  const w = box.x1 - box.x0 + 2 * o.margin + 4;
  const h = box.y1 - box.y0 + 2 * o.margin;
  const wires = sheet.wires.map(
    (wire) => `<polyline points="${wire.points.map((p) => `${n(p.x)},${n(p.y)}`).join(' ')}" fill="none"/>`,
  );
  const dots = sheetConnectivity(sheet).junctions.map(
    (j) => `<circle cx="${n(j.x)}" cy="${n(j.y)}" r="0.2" fill="currentColor"/>`,
  );
  const symbols = sheet.parts.map(
    (part) =>
      `<g data-part="${escapeXml(part.id)}">${partShape(part)
        .symbol.map((p) => primitiveSvg(part, p))
        .join('')}</g>`,
  );
  const texts = sheet.parts.map(partTexts);
  return [
    '<?xml version="1.0" encoding="UTF-8"?>',
    `<svg xmlns="http://www.w3.org/2000/svg" width="${n(w * o.scale)}" height="${n(h * o.scale)}" viewBox="${n(x0)} ${n(y0)} ${n(w)} ${n(h)}">`,
    `<rect x="${n(x0)}" y="${n(y0)}" width="${n(w)}" height="${n(h)}" fill="${o.background}"/>`,
    `<g color="${o.ink}" stroke="currentColor" stroke-width="0.09" stroke-linecap="round" stroke-linejoin="round">`,
    ...wires,
    ...dots,
    ...symbols,
    '</g>',
    `<g fill="${o.ink}" font-family="sans-serif">`,
    ...texts,
    '</g>',
    '</svg>',
    '',
  ].join('\n');
}
