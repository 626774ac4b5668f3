import type { NamingPart, PartSpec, PartText } from './spec.ts';
import { toWorld, turnDirection } from '../placement.ts';
import { noValue, TEXT_SIZE } from './text.ts';

type LabelPart = NamingPart<'label'>;

/**
 * The net name sits beyond the flag's tip on the side the flag points to, so a label pointing
 * left reads right-aligned towards its wire, and one pointing up or down sits clear of it.
 */
function flagText(part: LabelPart): PartText[] {
  if (part.name === '') return [];
  const dir = turnDirection(part, { x: 1, y: 0 });
  const tip = toWorld(part, { x: 1.4, y: 0 });
  const align = dir.x < 0 ? 'end' : dir.x > 0 ? 'start' : 'middle';
  const half = TEXT_SIZE.net / 2;
  const y = dir.y < 0 ? tip.y - half : dir.y > 0 ? tip.y + half : tip.y;
  return [{ text: part.name, x: tip.x, y, align, style: 'net' }];
}

/** Net label: a short stub ending in a flag; equal label texts join their nets. */
export const LABEL_SPEC: PartSpec<LabelPart> = {
  kind: 'label',
  title: 'Net label',
  searchWords: 'name net flag tag',
  naming: { type: 'letters', letters: '', prefix: 'net' },
  pins: [{ name: 'net', x: 0, y: 0 }],
  box: { x0: 0, y0: -0.4, x1: 1.2, y1: 0.4 },
  symbol: [
    { type: 'line', points: [0, 0, 0.8, 0] },
    { type: 'polygon', points: [0.8, 0, 1.2, -0.3, 1.2, 0.3], filled: true },
  ],
  fields: [],
  defaults: {},
  valueLabel: noValue,
  texts: flagText,
  role: { type: 'net-name', role: 'label' },
};
