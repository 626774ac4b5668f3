import { Shape } from 'react-konva';
import type { Context } from 'konva/lib/Context';
import { store } from '../state/store.ts';
import { screenToSheet } from '../state/viewport.ts';
import { paintGrid } from './paint/scenePaint.ts';

/**
 * Grid dots for the visible area, drawn each frame as a few dashed rows (one stroke): cheaper than
 * a bitmap, and it reads the view from the store when drawing, so a pan renders no React here.
 */
export function GridLayer() {
  const draw = (ctx: Context): void => {
    const { viewport, screen } = store.getState();
    const a = screenToSheet(viewport, { x: 0, y: 0 });
    const b = screenToSheet(viewport, { x: screen.width, y: screen.height });
    paintGrid(ctx._context, { x0: a.x, y0: a.y, x1: b.x, y1: b.y }, viewport.scale);
  };
  return <Shape sceneFunc={draw} listening={false} perfectDrawEnabled={false} />;
}
