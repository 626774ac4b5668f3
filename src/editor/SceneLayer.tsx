import { memo, useMemo } from 'react';
import { Circle, Layer, Line, Rect } from 'react-konva';
import type { SheetPart, SheetWire } from '../core/sheet/types.ts';
import { useStore } from '../state/store.ts';
import { PART_VIEWS } from './devices/index.ts';
import { JUNCTION_RADIUS, SHEET_THEME, WIRE_STROKE } from './theme.ts';
import { textDetail, visibleItems, visibleRect } from './visible.ts';
import { TextDetailContext } from './devices/detail.ts';
import { sheetConnectivity } from '../core/sheet/connectivity.ts';

/** Parts up to which junction dots follow a drag frame by frame (a few ms per frame at most). */
const LIVE_DOTS_LIMIT = 400;

const PartNode = memo(function PartNode({ part, color }: { part: SheetPart; color: string }) {
  const View = PART_VIEWS[part.kind];
  return <View part={part} color={color} />;
});

const WireNode = memo(function WireNode({ wire, color }: { wire: SheetWire; color: string }) {
  return (
    <Line
      points={wire.points.flatMap((p) => [p.x, p.y])}
      stroke={color}
      strokeWidth={WIRE_STROKE}
      lineCap="round"
      lineJoin="round"
    />
  );
});

/**
 * Devices, wires and junction dots in neutral ink; the selection in the selection colour and the
 * panels' highlights in theirs. Nothing here listens for events: hit testing is pure geometry.
 */
export function SceneLayer() {
  const sheet = useStore((s) => s.doc.sheet);
  const derivedSheet = useStore((s) => s.design.sheet);
  const derived = useStore((s) => s.geometry);
  // During a drag the design is derived only at the end; small sheets get live dots meanwhile.
  const { junctions, openEnds } = useMemo(
    () =>
      sheet !== derivedSheet && sheet.parts.length <= LIVE_DOTS_LIMIT ? sheetConnectivity(sheet) : derived,
    [sheet, derivedSheet, derived],
  );
  const selected = useStore((s) => s.selection.selected);
  const highlight = useStore((s) => s.selection.highlight);
  const deviceParts = useStore((s) => s.geometry.deviceParts);
  const wireNets = useStore((s) => s.geometry.wireNets);
  const viewport = useStore((s) => s.viewport);
  const screen = useStore((s) => s.screen);
  const shown = useMemo(() => visibleItems(sheet, visibleRect(viewport, screen)), [sheet, viewport, screen]);
  const selParts = new Set(selected.parts);
  const selWires = new Set(selected.wires);
  const hiParts = new Set(highlight.devices.flatMap((d) => deviceParts[d] ?? []));
  const hiNets = new Set(highlight.nets);
  const partColor = (id: string) =>
    selParts.has(id) ? SHEET_THEME.selected : hiParts.has(id) ? SHEET_THEME.highlight : SHEET_THEME.ink;
  const wireColor = (id: string) =>
    selWires.has(id)
      ? SHEET_THEME.selected
      : hiNets.has(wireNets[id] ?? '')
        ? SHEET_THEME.highlight
        : SHEET_THEME.wire;
  return (
    <Layer listening={false}>
      <TextDetailContext.Provider value={textDetail(viewport.scale)}>
        {shown.wires.map((w) => (
          <WireNode key={w.id} wire={w} color={wireColor(w.id)} />
        ))}
        {junctions.map((j) => (
          <Circle key={`${j.x},${j.y}`} x={j.x} y={j.y} radius={JUNCTION_RADIUS} fill={SHEET_THEME.wire} />
        ))}
        {openEnds.map((j) => (
          // An unfinished wire end: a small hollow diamond, so it reads without colour.
          <Rect
            key={`open:${j.x},${j.y}`}
            x={j.x}
            y={j.y}
            width={0.36}
            height={0.36}
            offsetX={0.18}
            offsetY={0.18}
            rotation={45}
            stroke={SHEET_THEME.subtleText}
            strokeWidth={0.06}
          />
        ))}
        {shown.parts.map((p) => (
          <PartNode key={p.id} part={p} color={partColor(p.id)} />
        ))}
      </TextDetailContext.Provider>
    </Layer>
  );
}
