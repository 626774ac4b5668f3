import { useMemo, useRef } from 'react';
import { Group } from 'react-konva';
import type { Sheet } from '../../core/sheet/types.ts';
import {
  changedPaintAreas,
  overlayPaint,
  paintLayout,
  type OverlayPaint,
  type PaintLayout,
} from '../../core/view/overlayPaint.ts';
import type { Rect } from '../../core/sheet/geometry.ts';
import { traceRoute } from '../../core/view/traceRoute.ts';
import { useSimulation } from '../../state/simulation.ts';
import { useStore } from '../../state/store.ts';
import { CurrentTrace } from './CurrentTraces.tsx';
import { CachedShape } from '../canvas/CachedShape.tsx';
import { sheetInk } from '../canvas/inkBounds.ts';
import { paintOverlay } from './overlayPainter.ts';

/** What changed since the last paint: only the nets and devices a toggle moved, or all of it. */
function usePaintChanges(layout: PaintLayout | null, paint: OverlayPaint | null): readonly Rect[] | 'all' {
  const last = useRef<{ layout: PaintLayout | null; paint: OverlayPaint | null }>({
    layout: null,
    paint: null,
  });
  return useMemo(() => {
    const before = last.current;
    last.current = { layout, paint };
    if (layout === null || paint === null || before.layout !== layout || before.paint === null) return 'all';
    return changedPaintAreas(layout, before.paint, paint);
  }, [layout, paint]);
}

/** The levels as a cached bitmap: a toggle repaints the areas of the nets it changed. */
function LevelLayer({ layout, paint, sheet }: { layout: PaintLayout; paint: OverlayPaint; sheet: Sheet }) {
  const changed = usePaintChanges(layout, paint);
  const painter = useMemo(
    () => (ctx: CanvasRenderingContext2D, area: Rect, scale: number) =>
      paintOverlay(ctx, area, scale, { layout, paint }),
    [layout, paint],
  );
  const bounds = useMemo(() => sheetInk(sheet), [sheet]);
  return <CachedShape paint={painter} bounds={bounds} changed={changed} />;
}

/**
 * The simulation drawn over the sheet for the selected vector: every wire and pin lead in its
 * level's look with a mark, each transistor's on/off/maybe shape, static current paths as glowing
 * traces with arrows and their current, and the estimated voltage of what is under the pointer.
 */
export function SimulationOverlay() {
  const live = useSimulation((s) => s.live);
  const sheet = useStore((s) => s.doc.sheet);
  const geometry = useStore((s) => s.geometry);
  // While a drag is in progress the levels are stale until it ends (the design is re-derived then),
  // so the overlay steps aside rather than re-laying every wire on every frame.
  const dragging = useStore((s) => s.history.gestureStart !== null);
  // The layout follows the drawing; a toggle only re-files segments by look.
  const layout = useMemo(() => (dragging ? null : paintLayout(sheet, geometry)), [dragging, sheet, geometry]);
  const paint = useMemo(
    () =>
      live === null || layout === null
        ? null
        : overlayPaint(
            layout,
            (n) => live.net(n),
            (d) => live.device(d),
          ),
    [live, layout],
  );
  const routes = useMemo(
    () =>
      live === null || dragging
        ? []
        : live.traces.map((t) => ({ trace: t, route: traceRoute(sheet, geometry, t.chain) })),
    [live, dragging, sheet, geometry],
  );
  if (paint === null || layout === null) return null;
  return (
    <>
      <LevelLayer layout={layout} paint={paint} sheet={sheet} />
      <Group listening={false}>
        {routes.map(({ trace, route }, i) =>
          route === null ? null : (
            <CurrentTrace key={`${trace.chain.join('>')}-${i}`} route={route} current={trace.current} />
          ),
        )}
      </Group>
    </>
  );
}
