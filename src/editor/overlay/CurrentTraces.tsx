// Indexes read here are in range by construction, so `!` marks them (no run-time cost).
import { Arrow, Group, Label, Line, Tag, Text } from 'react-konva';
import type { Point } from '../../core/sheet/types.ts';
import { formatCurrent } from '../../core/view/format.ts';
import { STATIC_CURRENT_COLOUR as TRACE_COLOUR } from '../../core/view/visualLanguage.ts';

const ARROW_HALF = 0.35;

function arrowsAlong(line: readonly Point[]): number[][] {
  const arrows: number[][] = [];
  for (let i = 0; i + 1 < line.length; i++) {
    const [a, b] = [line[i]!, line[i + 1]!];
    const length = Math.hypot(b.x - a.x, b.y - a.y);
    if (length < 1) continue; // too short for an arrow to read
    const [dx, dy] = [(b.x - a.x) / length, (b.y - a.y) / length];
    const mid = { x: (a.x + b.x) / 2, y: (a.y + b.y) / 2 };
    arrows.push([
      mid.x - dx * ARROW_HALF,
      mid.y - dy * ARROW_HALF,
      mid.x + dx * ARROW_HALF,
      mid.y + dy * ARROW_HALF,
    ]);
  }
  return arrows;
}

const LABEL_FONT = 0.6;

/** The middle of the longest segment: the calmest place to write the current. */
function labelAnchor(route: readonly (readonly Point[])[]): Point | null {
  let best: { at: Point; length: number } | null = null;
  for (const line of route) {
    for (let i = 0; i + 1 < line.length; i++) {
      const [a, b] = [line[i]!, line[i + 1]!];
      const length = Math.hypot(b.x - a.x, b.y - a.y);
      if (best === null || length > best.length)
        best = { at: { x: (a.x + b.x) / 2, y: (a.y + b.y) / 2 }, length };
    }
  }
  return best?.at ?? null;
}

interface CurrentTraceProps {
  /** Polylines in flow order, source to sink. */
  readonly route: readonly (readonly Point[])[];
  readonly current: number;
}

/** One static current path: a soft wide glow, a bright core, flow arrows, and the current written beside it. */
export function CurrentTrace({ route, current }: CurrentTraceProps) {
  const flat = (line: readonly Point[]) => line.flatMap((p) => [p.x, p.y]);
  const labelAt = labelAnchor(route);
  const text = `⇣ ${formatCurrent(current)}`;
  // Written to the left of the trace: device names and values sit to its right.
  const width = text.length * LABEL_FONT * 0.62 + 0.3;
  return (
    <Group listening={false}>
      {route.map((line, i) => (
        <Line
          key={`glow-${i}`}
          points={flat(line)}
          stroke={TRACE_COLOUR}
          strokeWidth={0.5}
          opacity={0.25}
          lineCap="round"
          lineJoin="round"
          shadowColor={TRACE_COLOUR}
          shadowBlur={12}
        />
      ))}
      {route.map((line, i) => (
        <Line
          key={`core-${i}`}
          points={flat(line)}
          stroke={TRACE_COLOUR}
          strokeWidth={0.12}
          lineCap="round"
          lineJoin="round"
        />
      ))}
      {route.flatMap(arrowsAlong).map((points, i) => (
        <Arrow
          key={`arrow-${i}`}
          points={points}
          pointerLength={0.35}
          pointerWidth={0.4}
          fill={TRACE_COLOUR}
          stroke={TRACE_COLOUR}
          strokeWidth={0.1}
        />
      ))}
      {labelAt !== null && (
        <Label x={labelAt.x - 0.6 - width} y={labelAt.y - LABEL_FONT / 2}>
          <Tag fill="#fff7f0" stroke={TRACE_COLOUR} strokeWidth={0.05} cornerRadius={0.15} />
          <Text text={text} fontSize={LABEL_FONT} padding={0.15} fill="#8a2c06" fontStyle="bold" />
        </Label>
      )}
    </Group>
  );
}
