import type { PartSpec } from './spec.ts';

/** Input pin: an arrow-shaped tag to the left of its connection point, pointing into the cell. */
export const INPUT_SPEC: PartSpec = {
  kind: 'input',
  title: 'Input pin',
  namePrefix: 'A',
  pins: [{ name: 'net', x: 0, y: 0 }],
  box: { x0: -3, y0: -0.6, x1: 0, y1: 0.6 },
  symbol: [
    { type: 'polygon', points: [-3, -0.6, -1.6, -0.6, -1, 0, -1.6, 0.6, -3, 0.6], filled: false },
    { type: 'line', points: [-1, 0, 0, 0] },
  ],
  nameAt: { x: -2.3, y: -1.5 },
  defaults: {},
  role: { type: 'net-name', role: 'input' },
};
