import { memo } from 'react';
import { Group, Line, Text } from 'react-konva';
import type { SheetPart } from '../../core/sheet/types.ts';
import { pinLeads } from '../../core/view/pinLeads.ts';
import { lookOf, PROBLEM_GLYPHS, problemMarks, type NetState } from '../../core/view/visualLanguage.ts';
import { LEVEL_STROKE } from './WireLevels.tsx';

/** Parts that name a net: their level is also written out beside them. */
const NAMING_KINDS: ReadonlySet<string> = new Set(['input', 'output', 'label']);

interface PartLevelsProps {
  readonly part: SheetPart;
  /** Net state of each of the part's pins, by pin name. */
  readonly pinStates: Readonly<Record<string, NetState | undefined>>;
  readonly scale: number;
}

/**
 * A part's pin leads painted in their nets' looks, so a net joined by labels rather than wires
 * still shows its level at every terminal; naming parts also carry the level's text mark.
 */
export const PartLevels = memo(function PartLevels({ part, pinStates, scale }: PartLevelsProps) {
  const leads = pinLeads(part);
  return (
    <Group listening={false}>
      {leads.map((lead) => {
        const state = pinStates[lead.pin];
        if (state === undefined) return null;
        const look = lookOf(state);
        return (
          <Line
            key={lead.pin}
            points={[lead.from.x, lead.from.y, lead.to.x, lead.to.y]}
            stroke={look.colour}
            strokeWidth={LEVEL_STROKE}
            dash={look.dash.map((d) => d / scale)}
          />
        );
      })}
      {NAMING_KINDS.has(part.kind) &&
        leads.map((lead) => {
          const state = pinStates[lead.pin];
          if (state === undefined) return null;
          const text = [lookOf(state).mark, ...problemMarks(state).map((m) => PROBLEM_GLYPHS[m])].join(' ');
          return (
            <Text
              key={`mark-${lead.pin}`}
              x={lead.from.x + 0.2}
              y={lead.from.y + 0.25}
              text={text}
              fontSize={0.55}
              fontStyle="bold"
              fill={lookOf(state).colour}
            />
          );
        })}
    </Group>
  );
});
