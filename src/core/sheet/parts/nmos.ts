import type { PartSpec } from './spec.ts';
import { MOS_BOX, NMOS_SYMBOL } from './mosSymbol.ts';

/** NMOS: drain at the top, source at the bottom, as it sits in a pull-down network. */
export const NMOS_SPEC: PartSpec = {
  kind: 'nmos',
  title: 'NMOS',
  namePrefix: 'N',
  pins: [
    { name: 'gate', x: -2, y: 0 },
    { name: 'drain', x: 0, y: -2 },
    { name: 'source', x: 0, y: 2 },
  ],
  box: MOS_BOX,
  symbol: NMOS_SYMBOL,
  nameAt: { x: 0.6, y: -0.9 },
  defaults: { w: 1, l: 0.25 },
  role: {
    type: 'device',
    toDevice: (part, netOf) => ({
      kind: 'nmos',
      name: part.name,
      gate: netOf('gate'),
      drain: netOf('drain'),
      source: netOf('source'),
      w: part.w ?? 1,
      l: part.l ?? 0.25,
    }),
  },
};
