import { useEffect, useMemo, useRef, useState } from 'react';
import { Group, Label, Layer, Tag, Text } from 'react-konva';
import type Konva from 'konva';
import { hitTest, type Hit } from '../../core/sheet/hitTest.ts';
import type { Point, Sheet } from '../../core/sheet/types.ts';
import { formatVolts } from '../../core/view/format.ts';
import {
  changedPaintAreas,
  overlayPaint,
  paintLayout,
  type OverlayPaint,
  type PaintLayout,
} from '../../core/view/overlayPaint.ts';
import type { Rect } from '../../core/sheet/geometry.ts';
import { traceRoute } from '../../core/view/traceRoute.ts';
import { lookOf } from '../../core/view/visualLanguage.ts';
import { toggleInput, useSimulation } from '../../state/simulation.ts';
import type { SheetGeometry } from '../../state/document.ts';
import { useStore } from '../../state/store.ts';
import { descendInto } from '../../state/navigation.ts';
import { fitToView } from '../../state/view.ts';
import { indexFor } from '../tools/sheetIndex.ts';
import { CurrentTrace } from './CurrentTraces.tsx';
import { CachedShape } from '../canvas/CachedShape.tsx';
import { sheetInk } from '../canvas/inkBounds.ts';
import { paintOverlay } from './overlayPainter.ts';

type Hover = { readonly net: string; readonly at: Point } | null;

function netOfHit(hit: Hit | null, geometry: SheetGeometry): string | undefined {
  if (hit === null) return undefined;
  if (hit.type === 'wire') return geometry.wireNets[hit.wireId];
  if (hit.type === 'pin') return geometry.pinNets.get(`${hit.partId}.${hit.pin}`);
  return geometry.pinNets.get(`${hit.partId}.net`);
}

/** The input pin under the pointer, if any: double-clicking it flips that input. */
function inputOfHit(hit: Hit | null, sheet: Sheet, geometry: SheetGeometry): string | undefined {
  if (hit === null || hit.type === 'wire') return undefined;
  const part = sheet.parts.find((p) => p.id === hit.partId);
  return part?.kind === 'input' ? geometry.pinNets.get(`${part.id}.net`) : undefined;
}

/** The instance whose symbol is under the pointer, if any: double-clicking it descends into it. */
function instanceOfHit(hit: Hit | null, sheet: Sheet): string | undefined {
  if (hit === null || hit.type === 'wire') return undefined;
  const part = sheet.parts.find((p) => p.id === hit.partId);
  return part?.kind === 'instance' ? part.name : undefined;
}

/**
 * Pointer on the sheet, found by pure hit testing: the estimated voltage of the wire or pin under
 * it; a double-click on an input pin flips that input (the same action as its bit in the panel),
 * on an instance's symbol descends into it (as its line in the Instances list does).
 */
export function PointerLayer() {
  const layer = useRef<Konva.Layer>(null);
  const sheet = useStore((s) => s.doc.sheet);
  const geometry = useStore((s) => s.geometry);
  const index = indexFor(sheet); // the editor's cached index of this very sheet
  const [hover, setHover] = useState<Hover>(null);
  const state = useSimulation((s) => (hover === null ? undefined : s.live?.net(hover.net)));
  useEffect(() => {
    const stage = layer.current?.getStage();
    if (!stage) return;
    const onMove = (): void => {
      const at = layer.current?.getRelativePointerPosition();
      const net = at ? netOfHit(hitTest(index, at), geometry) : undefined;
      setHover(at && net !== undefined ? { net, at } : null);
    };
    const onDoubleClick = (): void => {
      const at = layer.current?.getRelativePointerPosition();
      const hit = at ? hitTest(index, at) : null;
      const input = inputOfHit(hit, sheet, geometry);
      if (input !== undefined) return toggleInput(input);
      const instance = instanceOfHit(hit, sheet);
      if (instance !== undefined && descendInto(instance)) fitToView();
    };
    stage.on('mousemove.rwOverlay', onMove);
    stage.on('dblclick.rwOverlay', onDoubleClick);
    stage.on('mouseleave.rwOverlay', () => setHover(null));
    return () => {
      stage.off('.rwOverlay');
    };
  }, [index, sheet, geometry]);
  return (
    <Layer ref={layer} listening={false}>
      {hover !== null && state !== undefined && (
        <Label x={hover.at.x + 0.5} y={hover.at.y - 1.3}>
          <Tag fill="#ffffff" stroke="#2b2d33" strokeWidth={0.04} cornerRadius={0.12} />
          <Text
            text={`${hover.net}  ${formatVolts(state.volts)}  ${lookOf(state).description}`}
            fontSize={0.55}
            padding={0.2}
            fill="#2b2d33"
          />
        </Label>
      )}
    </Layer>
  );
}

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
