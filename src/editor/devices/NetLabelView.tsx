import { useContext } from 'react';
import { Text } from 'react-konva';
import { TextDetailContext } from './detail.ts';
import type { PartViewProps } from './PartFrame.tsx';
import { PartFrame } from './PartFrame.tsx';
import { toWorld, turnDirection } from '../../core/sheet/geometry.ts';
import { NAME_SIZE, SHEET_THEME } from '../theme.ts';

/**
 * Net label: the flag follows the part's turn, and the text sits beyond the flag's tip on that
 * side, so a label pointing left reads right-aligned towards its wire.
 */
export function NetLabelView({ part, color }: PartViewProps) {
  const dir = turnDirection(part, { x: 1, y: 0 });
  const tip = toWorld(part, { x: 1.4, y: 0 });
  // Generous box, no wrapping: the text is aligned inside it towards the flag.
  const width = (part.name.length + 2) * NAME_SIZE * 0.7;
  const x = dir.x < 0 ? tip.x - width : dir.x > 0 ? tip.x : tip.x - width / 2;
  const y = dir.y < 0 ? tip.y - NAME_SIZE : dir.y > 0 ? tip.y : tip.y - NAME_SIZE / 2;
  const detail = useContext(TextDetailContext);
  return (
    <>
      <PartFrame part={{ ...part, name: '' }} color={color} />
      {detail === 'none' ? null : (
        <Text
          x={x}
          y={y}
          width={width}
          align={dir.x < 0 ? 'right' : dir.x > 0 ? 'left' : 'center'}
          text={part.name}
          wrap="none"
          fontSize={NAME_SIZE}
          fill={SHEET_THEME.text}
          fontStyle="italic"
        />
      )}
    </>
  );
}
