/**
 * The two transistor kinds. They share one outline: gate on the left at (-2, 0), channel terminals
 * at (0, -2) and (0, 2); only the gate lead differs (the PMOS one ends in the inversion bubble).
 */
import type { MosDevice, MosKind } from '../../model/netlist.ts';
import type { PartPlacement } from '../types.ts';
import { deviceRole, type PartSpec, type Primitive } from './spec.ts';
import { MICROMETRES } from './quantities.ts';
import { nameAndValue } from './text.ts';

export interface MosPart<K extends MosKind = MosKind> extends PartPlacement {
  readonly kind: K;
  /** Channel width and length, µm. */
  readonly w: number;
  readonly l: number;
  /** The model card an imported device named (`MosDevice.model`); kept, never edited. */
  readonly model?: string;
}

const BODY: readonly Primitive[] = [
  // gate plate
  { type: 'line', points: [-0.7, -0.8, -0.7, 0.8] },
  // channel
  { type: 'line', points: [-0.3, -1, -0.3, 1] },
  // upper and lower terminal leads
  { type: 'line', points: [-0.3, -0.8, 0, -0.8, 0, -2] },
  { type: 'line', points: [-0.3, 0.8, 0, 0.8, 0, 2] },
];

const NMOS_SYMBOL: readonly Primitive[] = [
  ...BODY,
  { type: 'line', points: [-2, 0, -0.7, 0] },
  // arrow on the source lead, pointing out of the channel (NMOS source at the bottom)
  { type: 'polygon', points: [-0.05, 0.8, -0.3, 0.6, -0.3, 1.0], filled: true },
];

const PMOS_SYMBOL: readonly Primitive[] = [
  ...BODY,
  { type: 'line', points: [-2, 0, -1.2, 0] },
  { type: 'circle', x: -0.95, y: 0, r: 0.25 },
  // arrow on the source lead, pointing into the channel (PMOS source at the top)
  { type: 'polygon', points: [-0.3, -0.8, -0.05, -0.6, -0.05, -1.0], filled: true },
];

/** W/L in µm, the way cell designers write a transistor's size. */
function sizeLabel(part: MosPart): string {
  return `${MICROMETRES.show(part.w)}/${MICROMETRES.show(part.l)}`;
}

/**
 * The part spec of a transistor. The two kinds differ only in which channel end sits on top (the
 * end towards the rail it usually meets), the symbol and the default width (PMOS twice the NMOS,
 * the γ = 2 convention; common practice, no source).
 */
export function mosSpec<K extends MosKind>(kind: K): PartSpec<MosPart<K>> {
  const nmos = kind === 'nmos';
  const [top, bottom] = nmos ? ['drain', 'source'] : ['source', 'drain'];
  return {
    kind,
    title: kind.toUpperCase(),
    searchWords: nmos ? 'n-channel transistor mosfet pull-down' : 'p-channel transistor mosfet pull-up',
    naming: { type: 'numbered', prefix: nmos ? 'N' : 'P' },
    pins: [
      { name: 'gate', x: -2, y: 0 },
      { name: top, x: 0, y: -2 },
      { name: bottom, x: 0, y: 2 },
    ],
    box: { x0: -2, y0: -2, x1: 0.4, y1: 2 },
    symbol: nmos ? NMOS_SYMBOL : PMOS_SYMBOL,
    fields: [
      { key: 'w', label: 'W', quantity: MICROMETRES },
      { key: 'l', label: 'L', quantity: MICROMETRES },
    ],
    textProps: ['model'],
    defaults: { w: nmos ? 1 : 2, l: 0.25 },
    valueLabel: sizeLabel,
    texts: nameAndValue({ x: 0.6, y: -0.9 }, sizeLabel),
    role: deviceRole<MosPart<K>, MosDevice>({
      deviceKind: kind,
      toDevice: (part, netOf) => ({
        kind,
        name: part.name,
        gate: netOf('gate'),
        drain: netOf('drain'),
        source: netOf('source'),
        w: part.w,
        l: part.l,
        ...(part.model === undefined ? {} : { model: part.model }),
      }),
      fromDevice: (d) => ({ w: d.w, l: d.l, ...(d.model === undefined ? {} : { model: d.model }) }),
    }),
  };
}
