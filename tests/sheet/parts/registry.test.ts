/**
 * What every part kind must satisfy, checked over the whole registry so a new kind is held to it
 * without new tests. Our own invariants: no published source applies.
 */
import { describe, expect, it } from 'vitest';
import {
  makeSheetPart,
  PART_KINDS,
  partKindForDevice,
  partSpec,
  type PartKind,
} from '../../../src/core/sheet/parts/index.ts';
import { deviceTerminals } from '../../../src/core/model/netlist.ts';
import { sheetToSvg } from '../../../src/core/sheet/svg.ts';
import { part } from '../fixtures.ts';

const PLACEMENT = { id: 'p1', name: 'Q1', x: 3, y: 4, rotation: 1 as const, mirror: true };

describe.each(PART_KINDS.map((k) => [k] as [PartKind]))('part kind %s', (kind) => {
  const spec = partSpec(kind);

  it('is filed under its own kind and has pins with distinct names', () => {
    expect(spec.kind).toBe(kind);
    expect(new Set(spec.pins.map((p) => p.name)).size).toBe(spec.pins.length);
  });

  it('has one field per property, each with a default its own check accepts', () => {
    // Text properties (a model card name) have no field; an instance's cell and pins have defaults.
    const text = new Set<string>(spec.textProps ?? []);
    const defaults = Object.fromEntries(
      Object.entries(spec.defaults).filter(([key]) => !text.has(key)),
    ) as Record<string, number>;
    expect(spec.fields.map((f) => f.key)).toEqual(Object.keys(defaults));
    for (const f of spec.fields) expect(f.quantity.check(defaults[f.key]!)).toBeNull();
  });

  it('builds records with exactly its placement and its properties', () => {
    const record = makeSheetPart(kind, PLACEMENT, { w: 9, l: 9, ohms: 9, farads: 9 });
    expect(Object.keys(record)).toEqual([
      'id',
      'kind',
      'name',
      'x',
      'y',
      'rotation',
      'mirror',
      ...Object.keys(spec.defaults),
    ]);
  });

  it('draws its name as text and writes the same lines in the SVG export', () => {
    const p = part('p1', kind, 'Q1', 0, 0);
    const lines = spec.texts(p).map((t) => t.text);
    expect(lines[0]).toBe('Q1');
    const svg = sheetToSvg({ parts: [p], wires: [] });
    expect([...svg.matchAll(/<text [^>]*>([^<]*)<\/text>/g)].map((m) => m[1])).toEqual(lines);
  });

  it('contributes a device on nets named for its pins, and reads it back (device kinds)', () => {
    const role = spec.role;
    if (role.type !== 'device') return expect(['net-name', 'instance']).toContain(role.type);
    const p = part('p1', kind, 'Q1', 0, 0);
    const device = role.toDevice(p, (pin) => `n_${pin}`);
    expect(deviceTerminals(device).map((t) => [t.terminal, t.net])).toEqual(
      expect.arrayContaining(spec.pins.map((pin) => [pin.name, `n_${pin.name}`])),
    );
    expect(partKindForDevice(device)).toBe(kind);
    expect(role.fromDevice(device)).toEqual(spec.defaults);
  });
});
