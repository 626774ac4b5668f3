import { Layer, Shape } from 'react-konva';
import type { Context } from 'konva/lib/Context';
import { useStore } from '../state/store.ts';
import { screenToSheet } from '../state/viewport.ts';
import { SHEET_THEME } from './theme.ts';

/**
 * Grid dots for the visible area only, drawn in one custom shape (one draw call, not thousands of
 * nodes). At small zoom only every fifth dot is drawn so the sheet does not turn grey.
 */
export function GridLayer() {
  const viewport = useStore((s) => s.viewport);
  const screen = useStore((s) => s.screen);
  const step = viewport.scale < 8 ? 5 : 1;
  const a = screenToSheet(viewport, { x: 0, y: 0 });
  const b = screenToSheet(viewport, { x: screen.width, y: screen.height });
  const r = 1.2 / viewport.scale;
  const draw = (ctx: Context) => {
    ctx.fillStyle = SHEET_THEME.gridDot;
    for (let x = Math.floor(a.x / step) * step; x <= b.x; x += step) {
      for (let y = Math.floor(a.y / step) * step; y <= b.y; y += step)
        ctx.fillRect(x - r, y - r, 2 * r, 2 * r);
    }
  };
  return (
    <Layer listening={false}>
      <Shape sceneFunc={draw} />
    </Layer>
  );
}
