import type { NamingPart, PartSpec } from './spec.ts';
import { nameAndValue, noValue } from './text.ts';

/** Ground rail: a lead down to three shortening bars. */
export const GND_SPEC: PartSpec<NamingPart<'gnd'>> = {
  kind: 'gnd',
  title: 'GND rail',
  searchWords: 'ground vss rail',
  naming: { type: 'fixed', name: 'GND' },
  pins: [{ name: 'net', x: 0, y: 0 }],
  box: { x0: -1, y0: 0, x1: 1, y1: 1.6 },
  symbol: [
    { type: 'line', points: [0, 0, 0, 1] },
    { type: 'line', points: [-1, 1, 1, 1] },
    { type: 'line', points: [-0.6, 1.3, 0.6, 1.3] },
    { type: 'line', points: [-0.2, 1.6, 0.2, 1.6] },
  ],
  fields: [],
  defaults: {},
  valueLabel: noValue,
  texts: nameAndValue({ x: 1.3, y: 1 }, noValue),
  role: { type: 'net-name', role: 'ground' },
};
