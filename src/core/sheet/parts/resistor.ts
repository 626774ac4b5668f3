import type { ResistorDevice } from '../../model/netlist.ts';
import type { PartPlacement } from '../position.ts';
import { deviceRole, type PartSpec } from './spec.ts';
import { OHMS } from './quantities.ts';
import { nameAndValue } from './text.ts';

export interface ResistorPart extends PartPlacement {
  readonly kind: 'resistor';
  readonly ohms: number;
}

function resistance(part: ResistorPart): string {
  return OHMS.show(part.ohms);
}

/** A resistor: two ends, a zigzag body. */
export const RESISTOR_SPEC: PartSpec<ResistorPart> = {
  kind: 'resistor',
  title: 'Resistor',
  searchWords: 'load pull-up ohms',
  naming: { type: 'numbered', prefix: 'R' },
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
  fields: [{ key: 'ohms', label: 'Resistance', quantity: OHMS }],
  defaults: { ohms: 10e3 },
  valueLabel: resistance,
  texts: nameAndValue({ x: 0.7, y: -0.9 }, resistance),
  role: deviceRole<ResistorPart, ResistorDevice>({
    deviceKind: 'resistor',
    toDevice: (part, netOf) => ({
      kind: 'resistor',
      name: part.name,
      a: netOf('a'),
      b: netOf('b'),
      ohms: part.ohms,
    }),
    fromDevice: (d) => ({ ohms: d.ohms }),
  }),
};
