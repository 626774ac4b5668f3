import type { NamingPart, PartSpec } from './spec.ts';
import { nameAndValue, noValue } from './text.ts';

/** Input pin: an arrow-shaped tag to the left of its connection point, pointing into the cell. */
export const INPUT_SPEC: PartSpec<NamingPart<'input'>> = {
  kind: 'input',
  title: 'Input pin',
  searchWords: 'port signal',
  naming: { type: 'letters', letters: 'ABCDEFGHJKLMSTUVW', prefix: 'A' },
  pins: [{ name: 'net', x: 0, y: 0 }],
  box: { x0: -3, y0: -0.6, x1: 0, y1: 0.6 },
  symbol: [
    { type: 'polygon', points: [-3, -0.6, -1.6, -0.6, -1, 0, -1.6, 0.6, -3, 0.6], filled: false },
    { type: 'line', points: [-1, 0, 0, 0] },
  ],
  fields: [],
  defaults: {},
  valueLabel: noValue,
  texts: nameAndValue({ x: -2.3, y: -1.5 }, noValue),
  role: { type: 'net-name', role: 'input' },
};
