import { useMemo, useRef } from 'react';
import type { Rect } from '../core/sheet/geometry.ts';
import { sheetConnectivity } from '../core/sheet/connectivity.ts';
import { useStore } from '../state/store.ts';
import { CachedShape } from './canvas/CachedShape.tsx';
import { changedAreas, sheetInk } from './canvas/inkBounds.ts';
import { paintScene, type SceneContent } from './paint/scenePaint.ts';
import { hasEmphasis, paintEmphasis, type EmphasisContent } from './paint/emphasisPaint.ts';

/** Parts up to which junction dots follow a drag frame by frame (a few ms per frame at most). */
const LIVE_DOTS_LIMIT = 400;

/** The areas between the last content and this one, remembered across renders. */
function useChangedAreas(content: SceneContent): readonly Rect[] | 'all' {
  const last = useRef<SceneContent | null>(null);
  return useMemo(() => {
    const before = last.current;
    last.current = content;
    if (before === null) return 'all';
    return changedAreas(
      { sheet: before.sheet, marks: [before.junctions, before.openEnds] },
      { sheet: content.sheet, marks: [content.junctions, content.openEnds] },
    );
  }, [content]);
}

/**
 * Devices, wires, junction dots and open ends in neutral ink, as a cached bitmap: a pan copies it,
 * an edit repaints only what the edit touched. Nothing here listens for events: hit testing is
 * pure geometry.
 */
export function SceneLayer() {
  const sheet = useStore((s) => s.doc.sheet);
  const derivedSheet = useStore((s) => s.design.sheet);
  const junctions = useStore((s) => s.geometry.junctions);
  const openEnds = useStore((s) => s.geometry.openEnds);
  // During a drag the design is derived only at the end; small sheets get live dots meanwhile.
  const content = useMemo((): SceneContent => {
    const live = sheet !== derivedSheet && sheet.parts.length <= LIVE_DOTS_LIMIT;
    return live ? { sheet, ...sheetConnectivity(sheet) } : { sheet, junctions, openEnds };
  }, [sheet, derivedSheet, junctions, openEnds]);
  const changed = useChangedAreas(content);
  const paint = useMemo(
    () => (ctx: CanvasRenderingContext2D, area: Rect, scale: number) => paintScene(ctx, area, scale, content),
    [content],
  );
  const bounds = useMemo(() => sheetInk(sheet), [sheet]);
  return <CachedShape paint={paint} bounds={bounds} changed={changed} />;
}

/** The selection and the panels' highlights, over the scene and under the levels. */
export function EmphasisLayer() {
  const sheet = useStore((s) => s.doc.sheet);
  const selected = useStore((s) => s.selection.selected);
  const highlight = useStore((s) => s.selection.highlight);
  const deviceParts = useStore((s) => s.geometry.deviceParts);
  const wireNets = useStore((s) => s.geometry.wireNets);
  const content = useMemo((): EmphasisContent => {
    const nets = new Set(highlight.nets);
    return {
      sheet,
      selectedParts: new Set(selected.parts),
      selectedWires: new Set(selected.wires),
      highlightParts: new Set(highlight.devices.flatMap((d) => deviceParts[d] ?? [])),
      highlightWires: new Set(
        nets.size === 0 ? [] : Object.keys(wireNets).filter((id) => nets.has(wireNets[id]!)),
      ),
    };
  }, [sheet, selected, highlight, deviceParts, wireNets]);
  const paint = useMemo(
    () => (ctx: CanvasRenderingContext2D, area: Rect, scale: number) =>
      paintEmphasis(ctx, area, scale, content),
    [content],
  );
  const bounds = useMemo(() => sheetInk(sheet), [sheet]);
  return <CachedShape paint={paint} bounds={bounds} changed="all" empty={!hasEmphasis(content)} />;
}
