import type { PartSpec } from './spec.ts';

/** Output pin: a tag to the right of its connection point with a double arrow tip. */
export const OUTPUT_SPEC: PartSpec = {
  kind: 'output',
  title: 'Output pin',
  namePrefix: 'Y',
  pins: [{ name: 'net', x: 0, y: 0 }],
  box: { x0: 0, y0: -0.6, x1: 3, y1: 0.6 },
  symbol: [
    { type: 'line', points: [0, 0, 1, 0] },
    { type: 'polygon', points: [1, -0.6, 2.4, -0.6, 3, 0, 2.4, 0.6, 1, 0.6], filled: false },
    { type: 'line', points: [1.9, -0.6, 2.5, 0, 1.9, 0.6] },
  ],
  nameAt: { x: 1.7, y: -1.5 },
  defaults: {},
  role: { type: 'net-name', role: 'output' },
};
