/** The registry of part kinds: adding a kind is a spec here plus a view in the editor. */
import type { PartKind } from '../types.ts';
import type { PartSpec } from './spec.ts';
import { NMOS_SPEC } from './nmos.ts';
import { PMOS_SPEC } from './pmos.ts';
import { RESISTOR_SPEC } from './resistor.ts';
import { CAPACITOR_SPEC } from './capacitor.ts';
import { VDD_SPEC } from './vdd.ts';
import { GND_SPEC } from './gnd.ts';
import { INPUT_SPEC } from './input.ts';
import { OUTPUT_SPEC } from './output.ts';
import { LABEL_SPEC } from './label.ts';

export type { PartSpec, PinSpec, Primitive, NetRole, PartRole } from './spec.ts';

export const PART_SPECS: Readonly<Record<PartKind, PartSpec>> = {
  nmos: NMOS_SPEC,
  pmos: PMOS_SPEC,
  resistor: RESISTOR_SPEC,
  capacitor: CAPACITOR_SPEC,
  vdd: VDD_SPEC,
  gnd: GND_SPEC,
  input: INPUT_SPEC,
  output: OUTPUT_SPEC,
  label: LABEL_SPEC,
};

/** Shelf order. */
export const PART_KINDS: readonly PartKind[] = [
  'nmos',
  'pmos',
  'resistor',
  'capacitor',
  'vdd',
  'gnd',
  'input',
  'output',
  'label',
];

export function partSpec(kind: PartKind): PartSpec {
  return PART_SPECS[kind];
}

/** Parts that carry a device (and so a generated name like N3) rather than a net name. */
export function isDevicePart(kind: PartKind): boolean {
  return PART_SPECS[kind].role.type === 'device';
}
