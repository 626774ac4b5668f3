import type { PartSpec } from './spec.ts';
import { MOS_BOX, PMOS_SYMBOL } from './mosSymbol.ts';

/** PMOS: source at the top (towards the supply), drain at the bottom, bubble on the gate. */
export const PMOS_SPEC: PartSpec = {
  kind: 'pmos',
  title: 'PMOS',
  namePrefix: 'P',
  pins: [
    { name: 'gate', x: -2, y: 0 },
    { name: 'source', x: 0, y: -2 },
    { name: 'drain', x: 0, y: 2 },
  ],
  box: MOS_BOX,
  symbol: PMOS_SYMBOL,
  nameAt: { x: 0.6, y: -0.9 },
  defaults: { w: 2, l: 0.25 },
  role: {
    type: 'device',
    toDevice: (part, netOf) => ({
      kind: 'pmos',
      name: part.name,
      gate: netOf('gate'),
      drain: netOf('drain'),
      source: netOf('source'),
      w: part.w ?? 2,
      l: part.l ?? 0.25,
    }),
  },
};
