import { useContext } from 'react';
import { Group, Text } from 'react-konva';
import type { SheetPart } from '../../core/sheet/types.ts';
import { partSpec, type PartText } from '../../core/sheet/parts/index.ts';
import { TEXT_SIZE } from '../../core/sheet/parts/text.ts';
import type { TextDetail } from '../visible.ts';
import { SHEET_THEME } from '../theme.ts';
import { SymbolShapes } from './SymbolShapes.tsx';
import { TextDetailContext } from './detail.ts';

export interface PartViewProps {
  readonly part: SheetPart;
  readonly color: string;
}

/** Values need the most room to be legible; names and net labels stay down to the 'names' zoom. */
function shown(detail: TextDetail, style: PartText['style']): boolean {
  return detail === 'full' || (detail === 'names' && style !== 'value');
}

/**
 * One line of a part's text, upright, placed by the middle of its height as the spec lays it out.
 * Right- and centre-aligned lines get a generous box (no wrapping) to align inside.
 */
function PartTextView({ line }: { line: PartText }) {
  const size = TEXT_SIZE[line.style];
  const width = (line.text.length + 2) * size * 0.7;
  const x = line.align === 'start' ? line.x : line.align === 'end' ? line.x - width : line.x - width / 2;
  return (
    <Text
      x={x}
      y={line.y - size / 2}
      {...(line.align === 'start' ? {} : { width, align: line.align === 'end' ? 'right' : 'center' })}
      text={line.text}
      wrap="none"
      fontSize={size}
      fill={line.style === 'value' ? SHEET_THEME.subtleText : SHEET_THEME.text}
      fontStyle={line.style === 'name' ? 'bold' : line.style === 'net' ? 'italic' : 'normal'}
    />
  );
}

/**
 * A part drawn from its spec alone: the symbol turned and mirrored into place, then the spec's
 * text (name, value, net label), the same lines the SVG export writes.
 */
export function SymbolView({ part, color }: PartViewProps) {
  const spec = partSpec(part.kind);
  const detail = useContext(TextDetailContext);
  return (
    <Group>
      <Group x={part.x} y={part.y} rotation={part.rotation * 90} scaleX={part.mirror ? -1 : 1}>
        <SymbolShapes primitives={spec.symbol} color={color} />
      </Group>
      {spec
        .texts(part)
        .filter((line) => shown(detail, line.style))
        .map((line, i) => (
          <PartTextView key={i} line={line} />
        ))}
    </Group>
  );
}
