/**
 * Design file format (version 2, several cells): serialize → parse is the identity, old versions migrate, and every bad
 * file gets an error naming the file and the field (or the line of a JSON syntax error).
 */
import { readFileSync } from 'node:fs';
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { designFileError } from './refusal.ts';
import type { DesignFileError } from '../../src/core/format/designFile.ts';
import {
  CURRENT_DESIGN_VERSION,
  parseDesignFile,
  serializeDesign,
} from '../../src/core/format/designFile.ts';
import { MIGRATIONS } from '../../src/core/format/migrations.ts';
import type { CellDesign, Design } from '../../src/core/document/design.ts';
import { cellDesign, cellOf, designOfCell } from '../../src/core/hierarchy/cellDesign.ts';
import { DEFAULT_TECHNOLOGY } from '../../src/core/model/technology.ts';
import type { SheetPart } from '../../src/core/sheet/types.ts';
import { makeSheetPart, PART_KINDS } from '../../src/core/sheet/parts/index.ts';
import { netlistArb } from '../netlist-io/arbitraries.ts';
import { inverter } from '../cells.ts';

const lamp: CellDesign = {
  name: 'Lamp inverter',
  technology: DEFAULT_TECHNOLOGY,
  netlist: inverter,
  expectations: { Y: '!A' },
  sequences: [{ name: 'toggle', steps: [{ A: '0' }, { A: '1' }] }],
};
const design: Design = designOfCell(lamp);

function errorOf(text: string): DesignFileError {
  return designFileError(text, 'lamp.railwise.json');
}

/** A saved cell, loosely typed so a test can break one field. */
interface Doc {
  [key: string]: unknown;
  netlist: { devices: Record<string, unknown>[]; rails: Record<string, unknown>[] };
  sequences: { name?: string; steps: Record<string, unknown>[] }[];
}

/** The saved JSON with one change to the file (`top`) or to its one cell (`doc`). */
function edited(edit: (doc: Doc, top: Record<string, unknown>) => void): string {
  const top = JSON.parse(serializeDesign(design)) as { cells: Doc[] } & Record<string, unknown>;
  edit(top.cells[0] as Doc, top);
  return JSON.stringify(top, null, 2);
}

/** Sizes anywhere in their physical ranges (RANGES in model/ranges.ts). */
const between = (min: number, max: number) => fc.double({ min, max, noNaN: true });
/** Sheet coordinates span ±1,000,000 grid units (RANGES.coordinate). */
const coordinateArb = fc.integer({ min: -1e6, max: 1e6 });

/** Any kind of part, with whichever sizes (and text) its kind has. */
const partArb: fc.Arbitrary<SheetPart> = fc
  .record({
    id: fc.uuid(),
    kind: fc.constantFrom(...PART_KINDS),
    name: fc.string(),
    x: fc.integer({ min: -500, max: 500 }),
    y: fc.integer({ min: -500, max: 500 }),
    rotation: fc.constantFrom(0 as const, 1 as const, 2 as const, 3 as const),
    mirror: fc.boolean(),
    sizes: fc.record({
      w: between(1e-3, 9999),
      l: between(1e-3, 9999),
      ohms: between(1e-3, 1e12),
      farads: between(1e-21, 1e-6),
    }),
    // An instance's cell and pins are text (read tolerantly: any text shows some pins).
    text: fc.record({ cell: fc.string({ minLength: 1 }), pins: fc.string({ minLength: 1 }) }),
  })
  .map(({ kind, sizes, text, ...placement }) => makeSheetPart(kind, placement, { ...sizes, ...text }));

/** Record keys as a user might type them, names of Object's own members among them. */
const keyArb = fc.oneof(fc.string({ minLength: 1 }), fc.constantFrom('__proto__', 'constructor', 'toString'));

const cellArb: fc.Arbitrary<CellDesign> = fc.record(
  {
    name: fc.string({ minLength: 1 }),
    technology: fc.constant(DEFAULT_TECHNOLOGY),
    netlist: netlistArb,
    expectations: fc.dictionary(keyArb, fc.string()),
    sequences: fc.array(
      fc.record({
        name: fc.string(),
        steps: fc.array(fc.dictionary(keyArb, fc.constantFrom('0', '1', 'X', 'Z'))),
      }),
    ),
    sheet: fc.record({
      parts: fc.array(partArb, { maxLength: 5 }),
      wires: fc.array(
        fc.record({
          id: fc.uuid(),
          points: fc.array(fc.record({ x: coordinateArb, y: coordinateArb })),
        }),
        { maxLength: 3 },
      ),
    }),
    notes: fc.string(),
  },
  { requiredKeys: ['name', 'technology', 'netlist', 'expectations', 'sequences'] },
);

/**
 * Designs of one to three cells, each netlist named as its cell; a cell may place the cells after
 * it (never itself or one before it, so there is no loop).
 */
const designArb: fc.Arbitrary<Design> = fc
  .uniqueArray(cellArb, { minLength: 1, maxLength: 3, selector: (c) => c.name })
  .chain((cells) =>
    fc
      .array(fc.tuple(fc.nat(2), fc.nat(2), fc.string({ minLength: 1 })), { maxLength: 3 })
      .map((placements): Design => {
        const base = designOfCell(cells[0] as CellDesign);
        const all = cells.map((c) => ({ ...cellOf(c), netlist: { ...c.netlist, name: c.name } }));
        const withInstances = all.map((cell, i) => ({
          ...cell,
          instances: placements
            .filter(([from, to]) => from % all.length === i && to % all.length > i)
            .map(([, to, net], k) => ({
              name: `X${k}`,
              cell: (all[to % all.length] as { name: string }).name,
              pins: { A: net },
            })),
        }));
        return { ...base, cells: withInstances, open: (all[all.length - 1] as { name: string }).name };
      }),
  );

describe('design file round trip', () => {
  it('parse(serialize(design)) is the design', () => {
    fc.assert(
      fc.property(designArb, (d) => {
        expect(parseDesignFile(serializeDesign(d), 'd.json')).toEqual(d);
      }),
      { numRuns: 200 },
    );
  });

  it('writes the format tag and version first, with two-space indentation', () => {
    const text = serializeDesign(design);
    expect(
      text.startsWith(
        `{\n  "format": "railwise-design",\n  "version": ${CURRENT_DESIGN_VERSION},\n  "name": "Lamp inverter",`,
      ),
    ).toBe(true);
    expect(text.endsWith('}\n')).toBe(true);
  });

  it('does not change the design it writes', () => {
    const before = JSON.stringify(design);
    serializeDesign(design);
    expect(JSON.stringify(design)).toBe(before);
  });

  it('reads the example design files', () => {
    for (const f of [
      'public/examples/beacon-sr-latch.railwise.json',
      'public/examples/lamp-inverter.railwise.json',
    ]) {
      expect(cellDesign(parseDesignFile(readFileSync(f, 'utf8'), f)).netlist.devices.length).toBeGreaterThan(
        0,
      );
    }
  });
});

describe('lenient reading of hand-written files', () => {
  it('fills a missing technology, expectations and sequences with the defaults', () => {
    const text = JSON.stringify({ format: 'railwise-design', version: 1, name: 'x', netlist: inverter });
    expect(cellDesign(parseDesignFile(text, 'x.json'))).toEqual({
      name: inverter.name,
      technology: DEFAULT_TECHNOLOGY,
      netlist: inverter,
      expectations: {},
      sequences: [],
    });
  });

  it('ignores a byte-order mark', () => {
    expect(parseDesignFile(`\uFEFF${serializeDesign(design)}`, 'x.json')).toEqual(design);
  });

  it('fills single missing technology fields and accepts 0 and 1 as numbers in steps', () => {
    const text = edited((doc, top) => {
      top['technology'] = { vdd: 1.8 };
      doc['sequences'] = [{ name: 's', steps: [{ A: 0 }, { A: 1 }] }];
    });
    const d = cellDesign(parseDesignFile(text, 'x.json'));
    // Thresholds follow VDD at 0.35 and 0.65 of it (JEDEC JESD8 family, from memory): 0.63 V and 1.17 V.
    expect(d.technology).toEqual({ ...DEFAULT_TECHNOLOGY, vdd: 1.8, vil: 0.35 * 1.8, vih: 0.65 * 1.8 });
    expect(d.sequences[0]?.steps).toEqual([{ A: '0' }, { A: '1' }]);
  });
});

describe('migrations', () => {
  it('numbers each migration by the version it starts from', () => {
    MIGRATIONS.forEach((m, i) => expect(m.from).toBe(i));
    expect(CURRENT_DESIGN_VERSION).toBe(MIGRATIONS.length);
  });

  it('reads a bare netlist (version 0) as a netlist-only design', () => {
    const d = parseDesignFile(JSON.stringify(inverter), 'inv.json');
    expect(d).toEqual(
      designOfCell({
        name: 'inv',
        technology: DEFAULT_TECHNOLOGY,
        netlist: inverter,
        expectations: {},
        sequences: [],
      }),
    );
  });

  it('names fields of a bare netlist as that file spells them', () => {
    const bad = { ...inverter, devices: [inverter.devices[0], { ...inverter.devices[1], l: 0 }] };
    const e = errorOf(JSON.stringify(bad));
    expect(e.field).toBe('devices[1].l');
    expect(e.message).toMatch(/in N1/);
  });
});

describe('errors name the file and the field', () => {
  it('a JSON syntax error gives the line', () => {
    const text = serializeDesign(design).replace('"w": 2,', '"w": 2');
    const e = errorOf(text);
    const line = text.split('\n').findIndex((l) => l.includes('"w": 2')) + 2;
    expect(e.line).toBe(line);
    expect(e.message.startsWith(`lamp.railwise.json:${line}: not valid JSON`)).toBe(true);
  });

  it.each([
    ['a negative width', (doc: Doc) => (doc.netlist.devices[0]!.w = -1), 'netlist.devices[0].w', /P1/],
    [
      'an unknown device kind',
      (doc: Doc) => (doc.netlist.devices[1]!.kind = 'bjt'),
      'netlist.devices[1].kind',
      /./,
    ],
    ['a bad step value', (doc: Doc) => (doc.sequences[0]!.steps[1]!.A = '2'), 'sequences[0].steps[1].A', /./],
    ['a rail role', (doc: Doc) => (doc.netlist.rails[0]!.role = 'power'), 'netlist.rails[0].role', /./],
    [
      'a sheet rotation',
      (doc: Doc) =>
        (doc.sheet = {
          parts: [{ id: 'p', kind: 'nmos', name: 'N1', x: 0, y: 0, rotation: 5, mirror: false }],
          wires: [],
        }),
      'sheet.parts[0].rotation',
      /N1/,
    ],
    [
      'an empty net name',
      (doc: Doc) => (doc.netlist.devices[0]!.gate = ''),
      'netlist.devices[0].gate',
      /empty/,
    ],
  ])('%s', (_what, edit, cellField, detail) => {
    const e = errorOf(edited(edit));
    const field = `cells[0].${cellField}`;
    expect(e.field).toBe(field);
    expect(e.message).toMatch(
      new RegExp(`^lamp\\.railwise\\.json: field ${field.replace(/[[\].]/g, '\\$&')}: `),
    );
    expect(e.message).toMatch(detail);
  });

  it('a file of another kind, a newer version, and a non-object', () => {
    expect(errorOf('{"devices": 3, "format": "other"}').field).toBe('format');
    expect(errorOf(edited((_doc, top) => (top['version'] = 99))).message).toMatch(
      /newer Railwise \(version 99\)/,
    );
    expect(errorOf('[1, 2]').message).toMatch(/one JSON object/);
  });
});
