import type { NamingPart, PartSpec } from './spec.ts';
import { nameAndValue, noValue } from './text.ts';

/** Output pin: a tag to the right of its connection point with a double arrow tip. */
export const OUTPUT_SPEC: PartSpec<NamingPart<'output'>> = {
  kind: 'output',
  title: 'Output pin',
  searchWords: 'port signal',
  naming: { type: 'letters', letters: 'YZQOUTVW', prefix: 'Y' },
  pins: [{ name: 'net', x: 0, y: 0 }],
  box: { x0: 0, y0: -0.6, x1: 3, y1: 0.6 },
  symbol: [
    { type: 'line', points: [0, 0, 1, 0] },
    { type: 'polygon', points: [1, -0.6, 2.4, -0.6, 3, 0, 2.4, 0.6, 1, 0.6], filled: false },
    { type: 'line', points: [1.9, -0.6, 2.5, 0, 1.9, 0.6] },
  ],
  fields: [],
  defaults: {},
  valueLabel: noValue,
  texts: nameAndValue({ x: 1.7, y: -1.5 }, noValue),
  role: { type: 'net-name', role: 'output' },
};
