import { memo } from 'react';
import { Line, Text } from 'react-konva';
import type { SheetWire } from '../../core/sheet/types.ts';
import { lookOf, PROBLEM_GLYPHS, problemMarks, type NetState } from '../../core/view/visualLanguage.ts';

/** Level strokes sit over the scene's wires, a little wider so the ink shows as an outline. */
export const LEVEL_STROKE = 0.2;
const MARK_SIZE = 0.55;

interface WireLevelProps {
  readonly wire: SheetWire;
  readonly net: string;
  readonly state: NetState;
  /** Pixels per grid unit: dash lengths are kept constant on screen. */
  readonly scale: number;
  readonly onHover: (hover: { net: string; x: number; y: number } | null) => void;
}

/** One wire in its level's look; hovering it asks for the voltage readout. */
export const WireLevel = memo(function WireLevel({ wire, net, state, scale, onHover }: WireLevelProps) {
  const look = lookOf(state);
  return (
    <Line
      points={wire.points.flatMap((p) => [p.x, p.y])}
      stroke={look.colour}
      strokeWidth={LEVEL_STROKE}
      dash={look.dash.map((d) => d / scale)}
      lineCap="butt"
      lineJoin="round"
      opacity={0.9}
      hitStrokeWidth={0.8}
      onMouseMove={(e) => {
        // Pointer in grid units: the layer inherits the stage's pan and zoom.
        const p = e.target.getLayer()?.getRelativePointerPosition();
        if (p) onHover({ net, x: p.x, y: p.y });
      }}
      onMouseLeave={() => onHover(null)}
    />
  );
});

interface NetMarkProps {
  readonly wire: SheetWire;
  readonly state: NetState;
}

/** The level's text mark and any problem badges, once per net, beside its first wire. */
export const NetMark = memo(function NetMark({ wire, state }: NetMarkProps) {
  const [a, b] = wire.points;
  if (a === undefined) return null;
  const end = b ?? a;
  const at = { x: (a.x + end.x) / 2, y: (a.y + end.y) / 2 };
  const look = lookOf(state);
  const badges = problemMarks(state).map((m) => PROBLEM_GLYPHS[m]);
  const text = [look.mark, ...badges].join(' ');
  return (
    <Text
      x={at.x + 0.15}
      y={at.y - MARK_SIZE - 0.1}
      text={text}
      fontSize={MARK_SIZE}
      fontStyle="bold"
      fill={look.colour}
      stroke="#fbfaf7"
      strokeWidth={0.04}
      listening={false}
    />
  );
});
