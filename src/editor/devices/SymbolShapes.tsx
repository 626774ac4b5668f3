import { Circle, Line } from 'react-konva';
import type { Primitive } from '../../core/sheet/parts/index.ts';
import { STROKE } from '../theme.ts';

interface Props {
  readonly primitives: readonly Primitive[];
  readonly color: string;
}

/** Draws a symbol's primitives in local units; the caller's Group places, turns and mirrors it. */
export function SymbolShapes({ primitives, color }: Props) {
  return (
    <>
      {primitives.map((p, i) => {
        switch (p.type) {
          case 'line':
            return (
              <Line
                key={i}
                points={[...p.points]}
                stroke={color}
                strokeWidth={STROKE}
                lineCap="round"
                lineJoin="round"
              />
            );
          case 'polygon':
            return (
              <Line
                key={i}
                points={[...p.points]}
                closed
                stroke={color}
                strokeWidth={STROKE}
                fill={p.filled ? color : undefined}
                lineJoin="round"
              />
            );
          case 'circle':
            return <Circle key={i} x={p.x} y={p.y} radius={p.r} stroke={color} strokeWidth={STROKE} />;
        }
      })}
    </>
  );
}
