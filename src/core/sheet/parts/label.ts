import type { PartSpec } from './spec.ts';

/** Net label: a short stub ending in a flag; equal label texts join their nets. */
export const LABEL_SPEC: PartSpec = {
  kind: 'label',
  title: 'Net label',
  namePrefix: 'net',
  pins: [{ name: 'net', x: 0, y: 0 }],
  box: { x0: 0, y0: -0.4, x1: 1.2, y1: 0.4 },
  symbol: [
    { type: 'line', points: [0, 0, 0.8, 0] },
    { type: 'polygon', points: [0.8, 0, 1.2, -0.3, 1.2, 0.3], filled: true },
  ],
  nameAt: { x: 1.6, y: 0 },
  defaults: {},
  role: { type: 'net-name', role: 'label' },
};
