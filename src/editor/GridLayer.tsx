import { useMemo } from 'react';
import { Shape } from 'react-konva';
import type { Context } from 'konva/lib/Context';
import { store } from '../state/store.ts';
import { SHEET_THEME } from './theme.ts';

/** Grid dots at least this many pixels apart: every 1, 5, 25… units as the zoom falls. */
const MIN_DOT_SPACING_PX = 8;
const DOT_PX = 2.4;

/** A square tile of `size` device pixels with one dot in its middle. */
function dotTile(size: number, ratio: number): HTMLCanvasElement {
  const tile = document.createElement('canvas');
  tile.width = tile.height = size;
  const ctx = tile.getContext('2d');
  if (ctx !== null) {
    const d = DOT_PX * ratio;
    ctx.fillStyle = SHEET_THEME.gridDot;
    ctx.fillRect(size / 2 - d / 2, size / 2 - d / 2, d, d);
  }
  return tile;
}

/**
 * Grid dots for the visible area: one fill with a repeating dot pattern, placed so the dots sit
 * exactly on grid points (a few hundred thousand pixels, one canvas call, at any zoom). It reads
 * the view from the store when drawing, so a pan renders no React here.
 */
export function GridLayer() {
  const tiles = useMemo(() => new Map<number, HTMLCanvasElement>(), []);
  const draw = (kctx: Context): void => {
    const ctx = kctx._context;
    const { viewport, screen } = store.getState();
    const ratio = kctx.canvas.getPixelRatio();
    let step = 1;
    while (step * viewport.scale < MIN_DOT_SPACING_PX) step *= 5;
    const spacing = step * viewport.scale * ratio; // device pixels between dots
    const size = Math.max(2, Math.round(spacing));
    let tile = tiles.get(size);
    if (tile === undefined) tiles.set(size, (tile = dotTile(size, ratio)));
    const pattern = ctx.createPattern(tile, 'repeat');
    if (pattern === null) return;
    const k = spacing / size;
    // Tile middle (size / 2) on the grid point at world (0, 0), screen (viewport.x, viewport.y).
    pattern.setTransform(
      new DOMMatrix([k, 0, 0, k, viewport.x * ratio - spacing / 2, viewport.y * ratio - spacing / 2]),
    );
    ctx.save();
    ctx.setTransform(1, 0, 0, 1, 0, 0);
    ctx.fillStyle = pattern;
    ctx.fillRect(0, 0, screen.width * ratio, screen.height * ratio);
    ctx.restore();
  };
  return <Shape sceneFunc={draw} listening={false} perfectDrawEnabled={false} />;
}
