import type { CapacitorDevice } from '../../model/netlist.ts';
import type { PartPlacement } from '../position.ts';
import { deviceRole, type PartSpec } from './spec.ts';
import { FARADS } from './quantities.ts';
import { nameAndValue } from './text.ts';

export interface CapacitorPart extends PartPlacement {
  readonly kind: 'capacitor';
  readonly farads: number;
}

function capacitance(part: CapacitorPart): string {
  return FARADS.show(part.farads);
}

/** A capacitor (a load): two plates. */
export const CAPACITOR_SPEC: PartSpec<CapacitorPart> = {
  kind: 'capacitor',
  title: 'Capacitor',
  searchWords: 'load farads storage',
  naming: { type: 'numbered', prefix: 'C' },
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
  fields: [{ key: 'farads', label: 'Capacitance', quantity: FARADS }],
  defaults: { farads: 10e-15 },
  valueLabel: capacitance,
  texts: nameAndValue({ x: 1, y: -0.9 }, capacitance),
  role: deviceRole<CapacitorPart, CapacitorDevice>({
    deviceKind: 'capacitor',
    toDevice: (part, netOf) => ({
      kind: 'capacitor',
      name: part.name,
      a: netOf('a'),
      b: netOf('b'),
      farads: part.farads,
    }),
    fromDevice: (d) => ({ farads: d.farads }),
  }),
};
