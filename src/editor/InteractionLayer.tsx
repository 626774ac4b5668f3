import { Circle, Layer, Line, Rect } from 'react-konva';
import { useStore } from '../state/store.ts';
import { normalizeRect, partBounds } from '../core/sheet/geometry.ts';
import { makePart } from '../core/sheet/edits.ts';
import { PART_VIEWS } from './devices/index.ts';
import { SHEET_THEME, WIRE_STROKE } from './theme.ts';

/** Selection outlines and the gesture in progress: box, wire preview, part ghost. */
export function InteractionLayer() {
  const gesture = useStore((s) => s.gesture);
  const sheet = useStore((s) => s.doc.sheet);
  const selected = useStore((s) => s.selection.selected);
  const outlines = sheet.parts.filter((p) => selected.parts.includes(p.id)).map(partBounds);
  return (
    <Layer listening={false}>
      {outlines.map((b, i) => (
        <Rect
          key={i}
          x={b.x0 - 0.3}
          y={b.y0 - 0.3}
          width={b.x1 - b.x0 + 0.6}
          height={b.y1 - b.y0 + 0.6}
          stroke={SHEET_THEME.selected}
          strokeWidth={0.05}
          dash={[0.3, 0.2]}
        />
      ))}
      {gesture?.type === 'box' ? <BoxGesture from={gesture.from} to={gesture.to} /> : null}
      {gesture?.type === 'wiring' ? (
        <>
          <Line
            points={gesture.points.flatMap((p) => [p.x, p.y])}
            stroke={SHEET_THEME.selected}
            strokeWidth={WIRE_STROKE}
            dash={[0.4, 0.2]}
          />
          <Circle
            x={gesture.cursor.x}
            y={gesture.cursor.y}
            radius={0.25}
            stroke={SHEET_THEME.selected}
            strokeWidth={0.06}
          />
        </>
      ) : null}
      {gesture?.type === 'pin' ? (
        <Circle
          x={gesture.at.x}
          y={gesture.at.y}
          radius={0.35}
          stroke={SHEET_THEME.selected}
          strokeWidth={0.08}
        />
      ) : null}
      {gesture?.type === 'ghost' ? <Ghost kind={gesture.kind} x={gesture.at.x} y={gesture.at.y} /> : null}
    </Layer>
  );
}

function BoxGesture({ from, to }: { from: { x: number; y: number }; to: { x: number; y: number } }) {
  const r = normalizeRect(from, to);
  return (
    <Rect
      x={r.x0}
      y={r.y0}
      width={r.x1 - r.x0}
      height={r.y1 - r.y0}
      fill={SHEET_THEME.boxFill}
      stroke={SHEET_THEME.boxStroke}
      strokeWidth={0.05}
    />
  );
}

function Ghost({ kind, x, y }: { kind: Parameters<typeof makePart>[1]['kind']; x: number; y: number }) {
  const sheet = useStore((s) => s.doc.sheet);
  const part = makePart(sheet, { kind, at: { x, y } });
  const View = PART_VIEWS[kind];
  return <View part={part} color={SHEET_THEME.ghost} />;
}
