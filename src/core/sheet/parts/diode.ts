import type { DiodeDevice } from '../../model/netlist.ts';
import type { PartPlacement } from '../position.ts';
import { deviceRole, type PartSpec } from './spec.ts';
import { nameAndValue, noValue } from './text.ts';

/** A diode has no size of its own in the switch-level model. */
export interface DiodePart extends PartPlacement {
  readonly kind: 'diode';
}

/**
 * A protection diode: anode on top, cathode below, drawn as the trade draws a diode, a triangle
 * pointing along forward current to a bar at the cathode (hollow here, the bar a little wider than
 * the triangle). It never conducts in steady state (docs/semantics.md §1); it is kept so the netlist
 * and its exports stay whole.
 */
export const DIODE_SPEC: PartSpec<DiodePart> = {
  kind: 'diode',
  title: 'Diode',
  searchWords: 'protection clamp junction esd',
  naming: { type: 'numbered', prefix: 'D' },
  pins: [
    { name: 'anode', x: 0, y: -2 },
    { name: 'cathode', x: 0, y: 2 },
  ],
  box: { x0: -0.7, y0: -2, x1: 0.7, y1: 2 },
  symbol: [
    { type: 'line', points: [0, -2, 0, -0.5] },
    { type: 'polygon', points: [-0.6, -0.5, 0.6, -0.5, 0, 0.5], filled: false },
    { type: 'line', points: [-0.75, 0.5, 0.75, 0.5] },
    { type: 'line', points: [0, 0.5, 0, 2] },
  ],
  fields: [],
  defaults: {},
  valueLabel: noValue,
  texts: nameAndValue({ x: 1, y: -0.9 }, noValue),
  role: deviceRole<DiodePart, DiodeDevice>({
    deviceKind: 'diode',
    toDevice: (part, netOf) => ({
      kind: 'diode',
      name: part.name,
      anode: netOf('anode'),
      cathode: netOf('cathode'),
    }),
    fromDevice: () => ({}),
  }),
};
