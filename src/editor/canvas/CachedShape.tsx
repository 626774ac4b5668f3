import { useEffect, useLayoutEffect, useMemo, useRef } from 'react';
import { Shape } from 'react-konva';
import type Konva from 'konva';
import type { Context } from 'konva/lib/Context';
import type { Rect } from '../../core/sheet/geometry.ts';
import { store } from '../../state/store.ts';
import { ViewCache, type AreaPainter } from './viewCache.ts';

interface CachedLayerProps {
  /** Draws what meets an area; a new painter means new content. */
  readonly paint: AreaPainter;
  /** Extent of the content (sheet units); nothing is drawn outside it. */
  readonly bounds: Rect | null;
  /** Where the new content differs from the last, or 'all'. */
  readonly changed: readonly Rect[] | 'all';
  /** Nothing to show: the layer draws nothing at all (no copy of a clear bitmap). */
  readonly empty?: boolean;
}

/**
 * A Konva shape that shows a ViewCache: each frame copies the bitmap at the current view, which it
 * reads from the store when drawing (so a pan re-renders no React component here). A new painter
 * repaints only the areas it changed. The sheet's layers share one Konva layer (one canvas), so a
 * frame composites one canvas, not five.
 */
export function CachedShape({ paint, bounds, changed, empty = false }: CachedLayerProps) {
  const shape = useRef<Konva.Shape>(null);
  const cache = useMemo(() => new ViewCache(() => shape.current?.getLayer()?.batchDraw()), []);
  const content = useRef({ paint, bounds, empty });
  useEffect(() => () => cache.dispose(), [cache]);
  useLayoutEffect(() => {
    if (content.current.paint !== paint) cache.invalidate(changed);
    content.current = { paint, bounds, empty };
    shape.current?.getLayer()?.batchDraw();
  }, [cache, paint, bounds, changed, empty]);
  const draw = (ctx: Context): void => {
    if (content.current.empty) return;
    const { viewport, screen } = store.getState();
    const ratio = shape.current?.getLayer()?.getCanvas().getPixelRatio() ?? 1;
    cache.draw(ctx._context, viewport, screen, ratio, content.current.paint, content.current.bounds);
  };
  return <Shape ref={shape} sceneFunc={draw} listening={false} perfectDrawEnabled={false} />;
}
