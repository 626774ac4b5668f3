/**
 * The shared MOS outline: gate on the left at (-2, 0), channel terminals at (0, -2) and (0, 2).
 * Only the gate lead differs: the PMOS one ends in the inversion bubble.
 */
import type { PartSpec, Primitive } from './spec.ts';

const BODY: readonly Primitive[] = [
  // gate plate
  { type: 'line', points: [-0.7, -0.8, -0.7, 0.8] },
  // channel
  { type: 'line', points: [-0.3, -1, -0.3, 1] },
  // upper and lower terminal leads
  { type: 'line', points: [-0.3, -0.8, 0, -0.8, 0, -2] },
  { type: 'line', points: [-0.3, 0.8, 0, 0.8, 0, 2] },
];

export const NMOS_SYMBOL: readonly Primitive[] = [
  ...BODY,
  { type: 'line', points: [-2, 0, -0.7, 0] },
  // arrow on the source lead, pointing out of the channel (NMOS source at the bottom)
  { type: 'polygon', points: [-0.05, 0.8, -0.3, 0.6, -0.3, 1.0], filled: true },
];

export const PMOS_SYMBOL: readonly Primitive[] = [
  ...BODY,
  { type: 'line', points: [-2, 0, -1.2, 0] },
  { type: 'circle', x: -0.95, y: 0, r: 0.25 },
  // arrow on the source lead, pointing into the channel (PMOS source at the top)
  { type: 'polygon', points: [-0.3, -0.8, -0.05, -0.6, -0.05, -1.0], filled: true },
];

export const MOS_BOX = { x0: -2, y0: -2, x1: 0.4, y1: 2 };

/**
 * The part spec of a transistor. The two kinds differ only in which channel end sits on top (the
 * end towards the rail it usually meets), the symbol and the default width (PMOS twice the NMOS,
 * the γ = 2 convention).
 */
export function mosSpec(kind: 'nmos' | 'pmos'): PartSpec {
  const nmos = kind === 'nmos';
  const defaultW = nmos ? 1 : 2;
  const [top, bottom] = nmos ? ['drain', 'source'] : ['source', 'drain'];
  return {
    kind,
    title: kind.toUpperCase(),
    namePrefix: nmos ? 'N' : 'P',
    pins: [
      { name: 'gate', x: -2, y: 0 },
      { name: top, x: 0, y: -2 },
      { name: bottom, x: 0, y: 2 },
    ],
    box: MOS_BOX,
    symbol: nmos ? NMOS_SYMBOL : PMOS_SYMBOL,
    nameAt: { x: 0.6, y: -0.9 },
    defaults: { w: defaultW, l: 0.25 },
    role: {
      type: 'device',
      toDevice: (part, netOf) => ({
        kind,
        name: part.name,
        gate: netOf('gate'),
        drain: netOf('drain'),
        source: netOf('source'),
        w: part.w ?? defaultW,
        l: part.l ?? 0.25,
      }),
    },
  };
}
