import { Circle, Group, Line, Rect, Shape } from 'react-konva';
import { useStore, type ContactMarks } from '../state/store.ts';
import type { Point } from '../core/sheet/types.ts';
import { normalizeRect } from '../core/sheet/geometry.ts';
import { makePart } from '../core/sheet/edits.ts';
import { paintParts } from './paint/scenePaint.ts';
import { SHEET_THEME, WIRE_STROKE } from './theme.ts';

/**
 * Where the last edit connected on purpose (a ring with a plus) or was refused because it would have
 * joined or cut nets (a ring with a cross): shapes, so they read without colour.
 */
function ContactMark({ at, kind }: { at: Point; kind: ContactMarks['kind'] }) {
  const colour = kind === 'made' ? SHEET_THEME.selected : SHEET_THEME.refused;
  const r = 0.55;
  const arm =
    kind === 'made'
      ? [0, -0.3, 0, 0.3, -0.3, 0, 0.3, 0]
      : [-0.25, -0.25, 0.25, 0.25, -0.25, 0.25, 0.25, -0.25];
  return (
    <>
      <Circle
        x={at.x}
        y={at.y}
        radius={r}
        stroke={colour}
        strokeWidth={0.1}
        dash={kind === 'made' ? [] : [0.2, 0.12]}
      />
      <Line
        points={[at.x + arm[0]!, at.y + arm[1]!, at.x + arm[2]!, at.y + arm[3]!]}
        stroke={colour}
        strokeWidth={0.1}
      />
      <Line
        points={[at.x + arm[4]!, at.y + arm[5]!, at.x + arm[6]!, at.y + arm[7]!]}
        stroke={colour}
        strokeWidth={0.1}
      />
    </>
  );
}

/** Contact marks and the gesture in progress: box, wire preview, pin ring, part ghost. */
export function InteractionLayer() {
  const gesture = useStore((s) => s.gesture);
  const marks = useStore((s) => s.contactMarks);
  return (
    <Group listening={false}>
      {marks?.at.map((p, i) => (
        <ContactMark key={`mark-${i}`} at={p} kind={marks.kind} />
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
    </Group>
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

/** The part about to be placed, in the ghost colour, drawn by its kind's painter. */
function Ghost({ kind, x, y }: { kind: Parameters<typeof makePart>[1]['kind']; x: number; y: number }) {
  const sheet = useStore((s) => s.doc.sheet);
  const part = makePart(sheet, { kind, at: { x, y } });
  const scale = useStore((s) => s.viewport.scale);
  return (
    <Shape
      sceneFunc={(ctx) => {
        const c = ctx._context;
        c.lineCap = 'round';
        c.lineJoin = 'round';
        paintParts(c, [part], scale, SHEET_THEME.ghost, () => SHEET_THEME.ghost);
      }}
      listening={false}
    />
  );
}
