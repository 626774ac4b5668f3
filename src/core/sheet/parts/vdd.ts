import type { NamingPart, PartSpec } from './spec.ts';
import { nameAndValue, noValue } from './text.ts';

/** Supply rail: a bar above its connection point; the name is the rail's net. */
export const VDD_SPEC: PartSpec<NamingPart<'vdd'>> = {
  kind: 'vdd',
  title: 'VDD rail',
  searchWords: 'supply power rail',
  naming: { type: 'fixed', name: 'VDD' },
  pins: [{ name: 'net', x: 0, y: 0 }],
  box: { x0: -1, y0: -1.2, x1: 1, y1: 0 },
  symbol: [
    { type: 'line', points: [0, 0, 0, -1] },
    { type: 'line', points: [-1, -1, 1, -1] },
  ],
  fields: [],
  defaults: {},
  valueLabel: noValue,
  texts: nameAndValue({ x: 0, y: -1.9 }, noValue),
  role: { type: 'net-name', role: 'supply' },
};
