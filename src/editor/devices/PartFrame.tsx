import { useContext, type ReactNode } from 'react';
import { Group, Text } from 'react-konva';
import type { SheetPart } from '../../core/sheet/types.ts';
import { partSpec } from '../../core/sheet/parts/index.ts';
import { toWorld } from '../../core/sheet/geometry.ts';
import { NAME_SIZE, SHEET_THEME, VALUE_SIZE } from '../theme.ts';
import { SymbolShapes } from './SymbolShapes.tsx';
import { TextDetailContext } from './detail.ts';

export interface PartViewProps {
  readonly part: SheetPart;
  readonly color: string;
}

/**
 * The common frame of every part view: the symbol turned and mirrored into place, then upright
 * text (name and an optional value line) at the spec's text anchor.
 */
export function PartFrame({
  part,
  color,
  value,
  children,
}: PartViewProps & { value?: string; children?: ReactNode }) {
  const spec = partSpec(part.kind);
  const at = toWorld(part, spec.nameAt);
  const detail = useContext(TextDetailContext);
  return (
    <Group>
      <Group x={part.x} y={part.y} rotation={part.rotation * 90} scaleX={part.mirror ? -1 : 1}>
        <SymbolShapes primitives={spec.symbol} color={color} />
        {children}
      </Group>
      {detail !== 'none' && part.name !== '' ? (
        <Text
          x={at.x}
          y={at.y - NAME_SIZE / 2}
          text={part.name}
          fontSize={NAME_SIZE}
          fill={SHEET_THEME.text}
          fontStyle="bold"
        />
      ) : null}
      {value && detail === 'full' ? (
        <Text
          x={at.x}
          y={at.y + NAME_SIZE * 0.6}
          text={value}
          fontSize={VALUE_SIZE}
          fill={SHEET_THEME.subtleText}
        />
      ) : null}
    </Group>
  );
}
