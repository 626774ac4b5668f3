import { useMemo, useRef } from 'react';
import { Group } from 'react-konva';
import type { Sheet } from '../../core/sheet/types.ts';
import { paintLayout, type OverlayPaint, type PaintLayout } from '../../core/view/overlayPaint.ts';
import { changedAreas } from '../../core/view/paintAreas.ts';
import { bindPaint, paintSolved, repaintSolved } from '../../core/view/paintSolved.ts';
import type { SolvedView } from '../../core/view/solvedView.ts';
import type { Rect } from '../../core/sheet/geometry.ts';
import { traceRoute } from '../../core/view/traceRoute.ts';
import { useSimulation } from '../../state/simulation.ts';
import { useStore } from '../../state/store.ts';
import { CurrentTrace } from './CurrentTraces.tsx';
import { CachedShape } from '../canvas/CachedShape.tsx';
import { sheetInk } from '../canvas/inkBounds.ts';
import { paintOverlay } from './overlayPainter.ts';

/** One vector's paint and where it differs from the paint shown before it (or 'all'). */
interface LevelPaint {
  readonly paint: OverlayPaint;
  readonly changed: readonly Rect[] | 'all';
}

/**
 * The paint of the live vector, made from the last one's when the drawing and netlist are the same:
 * a toggle then touches only the nets and devices it changed. Keyed by the view it was made from,
 * so working it out twice for one view gives the same answer.
 */
function useLevelPaint(layout: PaintLayout | null, live: SolvedView | null): LevelPaint | null {
  const last = useRef<{ live: SolvedView; layout: PaintLayout; made: LevelPaint } | null>(null);
  return useMemo(() => {
    if (layout === null || live === null) return null;
    const before = last.current;
    if (before !== null && before.live === live && before.layout === layout) return before.made;
    const binding = bindPaint(layout, live.compiled);
    const step =
      before !== null && before.layout === layout && before.live.compiled === live.compiled
        ? repaintSolved(binding, before.made.paint, live.result)
        : null;
    const made: LevelPaint =
      step === null
        ? { paint: paintSolved(binding, live.result), changed: 'all' }
        : { paint: step.paint, changed: changedAreas(layout, step) };
    last.current = { live, layout, made };
    return made;
  }, [layout, live]);
}

/** The levels as a cached bitmap: a toggle repaints the areas of the nets it changed. */
function LevelLayer({ layout, made, sheet }: { layout: PaintLayout; made: LevelPaint; sheet: Sheet }) {
  const { paint, changed } = made;
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
  const made = useLevelPaint(layout, live);
  const routes = useMemo(
    () =>
      live === null || dragging
        ? []
        : live.traces.map((t) => ({ trace: t, route: traceRoute(sheet, geometry, t.chain) })),
    [live, dragging, sheet, geometry],
  );
  if (made === null || layout === null) return null;
  return (
    <>
      <LevelLayer layout={layout} made={made} sheet={sheet} />
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
