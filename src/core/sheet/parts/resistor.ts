import type { PartSpec } from './spec.ts';

/** A resistor: two ends, a zigzag body. */
export const RESISTOR_SPEC: PartSpec = {
  kind: 'resistor',
  title: 'Resistor',
  namePrefix: 'R',
  pins: [
    { name: 'a', x: 0, y: -2 },
    { name: 'b', x: 0, y: 2 },
  ],
  box: { x0: -0.5, y0: -2, x1: 0.5, y1: 2 },
  symbol: [
    {
      type: 'line',
      points: [0, -2, 0, -1.2, 0.4, -1, -0.4, -0.6, 0.4, -0.2, -0.4, 0.2, 0.4, 0.6, -0.4, 1, 0, 1.2, 0, 2],
    },
  ],
  nameAt: { x: 0.7, y: -0.9 },
  defaults: { ohms: 10e3 },
  role: {
    type: 'device',
    toDevice: (part, netOf) => ({
      kind: 'resistor',
      name: part.name,
      a: netOf('a'),
      b: netOf('b'),
      ohms: part.ohms ?? 10e3,
    }),
  },
};
