import type { PartSpec } from './spec.ts';

/** A capacitor (a load): two plates. */
export const CAPACITOR_SPEC: PartSpec = {
  kind: 'capacitor',
  title: 'Capacitor',
  namePrefix: 'C',
  pins: [
    { name: 'a', x: 0, y: -2 },
    { name: 'b', x: 0, y: 2 },
  ],
  box: { x0: -0.8, y0: -2, x1: 0.8, y1: 2 },
  symbol: [
    { type: 'line', points: [0, -2, 0, -0.25] },
    { type: 'line', points: [-0.8, -0.25, 0.8, -0.25] },
    { type: 'line', points: [-0.8, 0.25, 0.8, 0.25] },
    { type: 'line', points: [0, 0.25, 0, 2] },
  ],
  nameAt: { x: 1, y: -0.9 },
  defaults: { farads: 10e-15 },
  role: {
    type: 'device',
    toDevice: (part, netOf) => ({
      kind: 'capacitor',
      name: part.name,
      a: netOf('a'),
      b: netOf('b'),
      farads: part.farads ?? 10e-15,
    }),
  },
};
