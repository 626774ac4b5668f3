/**
 * The registry of part kinds, in shelf order. A kind is declared once, in its spec file; the union
 * of part records (`SheetPart`) and the list of kinds are derived from this list, so adding a kind
 * is its spec here plus its view in `src/editor/devices/`.
 */
import type { Device } from '../../model/netlist.ts';
import type { PartPlacement } from '../position.ts';
import type { PartShape, PartSpec, PropKey } from './spec.ts';
import { NMOS_SPEC } from './nmos.ts';
import { PMOS_SPEC } from './pmos.ts';
import { RESISTOR_SPEC } from './resistor.ts';
import { CAPACITOR_SPEC } from './capacitor.ts';
import { VDD_SPEC } from './vdd.ts';
import { GND_SPEC } from './gnd.ts';
import { INPUT_SPEC } from './input.ts';
import { OUTPUT_SPEC } from './output.ts';
import { LABEL_SPEC } from './label.ts';
import { DIODE_SPEC } from './diode.ts';
import { INSTANCE_SPEC } from './instance.ts';

export type * from './spec.ts';
export type { Quantity, ReadResult } from './quantities.ts';

const SPECS = [
  NMOS_SPEC,
  PMOS_SPEC,
  RESISTOR_SPEC,
  CAPACITOR_SPEC,
  VDD_SPEC,
  GND_SPEC,
  INPUT_SPEC,
  OUTPUT_SPEC,
  LABEL_SPEC,
  DIODE_SPEC,
  INSTANCE_SPEC,
] as const;

type PartOfSpec<S> = S extends PartSpec<infer P> ? P : never;

/** A part on the sheet: one record type per kind, told apart by `kind`. */
export type SheetPart = PartOfSpec<(typeof SPECS)[number]>;
export type PartKind = SheetPart['kind'];
/** The properties of any kind ('w', 'l', 'ohms', …, and the text 'model'). */
export type PartPropKey = PropKey<SheetPart>;
/** Text properties (see `PartSpec.textProps`); every other property is a number in model units. */
export type TextPropKey = 'model' | 'cell' | 'pins';
export type PartProps = Readonly<
  Partial<Record<Exclude<PartPropKey, TextPropKey>, number> & Record<TextPropKey, string>>
>;

/** A spec seen over every kind. Each spec's functions are only ever given parts of its own kind. */
export type AnyPartSpec = PartSpec<SheetPart>;

/** Every kind, in shelf order. */
export const PART_KINDS: readonly PartKind[] = SPECS.map((s) => s.kind);

/** The kinds the parts shelf and the place commands offer (not an instance: it is placed from its cell). */
export const SHELF_KINDS: readonly PartKind[] = SPECS.filter((s) => !('onShelf' in s)).map((s) => s.kind);

const BY_KIND: ReadonlyMap<string, AnyPartSpec> = new Map(
  SPECS.map((s) => [s.kind, s as unknown as AnyPartSpec]),
);

export function partSpec(kind: PartKind): AnyPartSpec {
  const spec = BY_KIND.get(kind);
  // Only data that skipped the design-file reader can get here.
  if (spec === undefined) throw new Error(`no part kind ${String(kind)}`);
  return spec;
}

export function isPartKind(kind: string): kind is PartKind {
  return BY_KIND.has(kind);
}

/** Parts that carry a device (and so a generated name like N3) rather than a net name. */
export function isDevicePart(kind: PartKind): boolean {
  return partSpec(kind).role.type === 'device';
}

/**
 * A part record of `kind`: the placement, then each of the kind's properties from `props` or its
 * default. Every part is built here, so a record always has exactly its kind's properties.
 */
export function makeSheetPart(kind: PartKind, placement: PartPlacement, props: PartProps = {}): SheetPart {
  const spec = partSpec(kind);
  const values: Record<string, number | string> = { ...spec.defaults };
  for (const field of spec.fields) {
    const v: unknown = Reflect.get(props, field.key);
    if (typeof v === 'number') values[field.key] = v;
  }
  for (const key of spec.textProps ?? []) {
    const v: unknown = Reflect.get(props, key);
    if (typeof v === 'string' && v !== '') values[key] = v;
  }
  const { id, name, x, y, rotation, mirror } = placement;
  return { id, kind, name, x, y, rotation, mirror, ...values } as SheetPart;
}

/** A part's pins, body box and symbol: its kind's, or its own when the kind generates them. */
export function partShape(part: SheetPart): PartShape {
  const spec = partSpec(part.kind);
  return spec.shape === undefined ? spec : spec.shape(part);
}

/** Parts whose name is theirs alone on a sheet: devices and instances (not a net's name). */
export function isNamedOnce(kind: PartKind): boolean {
  return partSpec(kind).role.type !== 'net-name';
}

/** A part's value of one property, undefined when its kind has no such property. */
export function partProp(part: SheetPart, key: PartPropKey): number | undefined {
  const value: unknown = Reflect.get(part, key);
  return typeof value === 'number' ? value : undefined;
}

/** The sheet kind that draws a model device, or null when none does. */
export function partKindForDevice(device: Device): PartKind | null {
  const spec = SPECS.find((s) => s.role.type === 'device' && s.role.deviceKind === device.kind);
  return spec?.kind ?? null;
}

/** The part that stands for an imported device, or null when no kind draws it. */
export function partForDevice(device: Device, placement: Omit<PartPlacement, 'name'>): SheetPart | null {
  const kind = partKindForDevice(device);
  if (kind === null) return null;
  const role = partSpec(kind).role;
  const props = role.type === 'device' ? role.fromDevice(device) : {};
  return makeSheetPart(kind, { ...placement, name: device.name }, props);
}
