import { memo } from 'react';
import { Circle, Group, Text } from 'react-konva';
import { toWorld } from '../../core/sheet/geometry.ts';
import type { SheetPart } from '../../core/sheet/types.ts';
import type { Conduction } from '../../core/view/visualLanguage.ts';

/** In the empty corner between the gate lead and the drain lead of the MOS symbol (local units). */
const MARK_AT = { x: -1.4, y: -1.35 };
const RADIUS = 0.28;

const STYLE: Readonly<Record<Conduction, { fill: string; stroke: string; text: string }>> = {
  on: { fill: '#2f6b3a', stroke: '#2f6b3a', text: '' },
  off: { fill: '#fbfaf7', stroke: '#8d8d8d', text: '' },
  maybe: { fill: '#fbfaf7', stroke: '#b3243c', text: '?' },
};

/**
 * A transistor's state as a shape: filled dot = conducting, hollow ring = off, ring with "?" = maybe
 * (its gate is unknown). Colour repeats the shape; it never carries the meaning alone.
 */
export const DeviceMark = memo(function DeviceMark({
  part,
  conduction,
}: {
  part: SheetPart;
  conduction: Conduction;
}) {
  const at = toWorld(part, MARK_AT);
  const style = STYLE[conduction];
  return (
    <Group x={at.x} y={at.y} listening={false}>
      <Circle radius={RADIUS} fill={style.fill} stroke={style.stroke} strokeWidth={0.08} />
      {style.text !== '' && (
        <Text text={style.text} fontSize={0.45} fontStyle="bold" fill={style.stroke} x={-0.12} y={-0.22} />
      )}
    </Group>
  );
});
