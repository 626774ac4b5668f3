/**
 * Hostile and out-of-range design files: every refusal names the file and the field, numbers outside
 * their physical range (model/ranges.ts, our own bounds) are refused, and names that are Object
 * members are kept. Behaviour of our own format; no published source applies.
 */
import { describe, expect, it } from 'vitest';
import { DesignFileError, parseDesignFile, serializeDesign } from '../../src/core/format/designFile.ts';
import { circuit } from '../../src/core/model/builder.ts';
import type { Cell, Design } from '../../src/core/document/design.ts';
import { DEFAULT_TECHNOLOGY } from '../../src/core/model/technology.ts';

const cell: Cell = {
  name: 'inv',
  instances: [],
  netlist: circuit('inv')
    .rails()
    .input('A')
    .output('Y')
    .pmos('P1', { g: 'A', d: 'Y', s: 'VDD', w: 2 })
    .nmos('N1', { g: 'A', d: 'Y', s: 'GND' })
    .build(),
  expectations: { Y: '!A' },
  sequences: [],
  sheet: { parts: [], wires: [] },
};
const inverter: Design = { name: 'inv', technology: DEFAULT_TECHNOLOGY, cells: [cell], open: 'inv' };

/** The saved file with one value replaced by raw JSON text (so 1e400 reaches the parser as written). */
function withRaw(path: string, raw: string): string {
  const marker = '"@@RAW@@"';
  const doc = JSON.parse(serializeDesign(inverter)) as Record<string, unknown>;
  const keys = path.split('.');
  let node = doc as Record<string, unknown>;
  for (const k of keys.slice(0, -1)) node = node[k] as Record<string, unknown>;
  node[keys.at(-1) as string] = '@@RAW@@';
  return JSON.stringify(doc).replace(marker, raw);
}

function refusal(text: string): DesignFileError {
  try {
    parseDesignFile(text, 'hostile.railwise.json');
  } catch (e) {
    expect(e).toBeInstanceOf(DesignFileError);
    return e as DesignFileError;
  }
  throw new Error('expected a refusal');
}

describe('numbers outside their physical range', () => {
  it.each([
    ['cells.0.netlist.devices.0.w', '1e400', 'cells[0].netlist.devices[0].w'],
    ['cells.0.netlist.devices.0.w', '1e-320', 'cells[0].netlist.devices[0].w'],
    ['cells.0.netlist.devices.0.l', '10000', 'cells[0].netlist.devices[0].l'],
    ['cells.0.netlist.devices.1.w', '-1', 'cells[0].netlist.devices[1].w'],
    ['technology.vdd', '0', 'technology.vdd'],
    ['technology.rn', '1e-300', 'technology.rn'],
    ['technology.ioffPerWidth', '1e300', 'technology.ioffPerWidth'],
    [
      'cells.0.sheet.wires',
      '[{"id":"w1","points":[{"x":0,"y":0},{"x":10000000,"y":0}]}]',
      'cells[0].sheet.wires[0].points[1].x',
    ],
    [
      'cells.0.sheet.parts',
      '[{"id":"p","kind":"nmos","name":"N1","x":1e300,"y":0,"rotation":0,"mirror":false}]',
      'cells[0].sheet.parts[0].x',
    ],
  ])('%s = %s is refused, naming %s', (path, raw, field) => {
    const e = refusal(withRaw(path, raw));
    expect(e.field).toBe(field);
    expect(e.message).toMatch(/^hostile\.railwise\.json: field /);
    expect(e.message).toMatch(/must be (from|above)/);
  });

  it('a ground rail at a voltage other than 0 is refused; volts 0 on a ground is dropped', () => {
    const rails = (g: string) =>
      withRaw(
        'cells.0.netlist.rails',
        `[{"net":"VDD","role":"supply"},{"net":"GND","role":"ground","volts":${g}}]`,
      );
    expect(refusal(rails('1.8')).field).toBe('cells[0].netlist.rails[1].volts');
    expect(parseDesignFile(rails('0'), 'x').cells[0]?.netlist.rails[1]).toEqual({
      net: 'GND',
      role: 'ground',
    });
  });
});

describe('pin and rail lists', () => {
  it('"inputs": ["VDD"] names the file and the field', () => {
    const e = refusal(withRaw('cells.0.netlist.inputs', '["A", "VDD"]'));
    expect(e.field).toBe('cells[0].netlist.inputs[1]');
    expect(e.message).toBe(
      'hostile.railwise.json: field cells[0].netlist.inputs[1]: input VDD is also a rail (in inv)',
    );
  });

  it('a pin or a rail listed twice names the second', () => {
    expect(refusal(withRaw('cells.0.netlist.outputs', '["Y", "Y"]')).field).toBe(
      'cells[0].netlist.outputs[1]',
    );
    const rails =
      '[{"net":"VDD","role":"supply"},{"net":"GND","role":"ground"},{"net":"VDD","role":"ground"}]';
    expect(refusal(withRaw('cells.0.netlist.rails', rails)).field).toBe('cells[0].netlist.rails[2].net');
  });

  it('a version 1 file is named as that file spells it', () => {
    const v1 = {
      format: 'railwise-design',
      version: 1,
      name: 'inv',
      netlist: { ...cell.netlist, inputs: ['VDD'] },
    };
    expect(refusal(JSON.stringify(v1)).field).toBe('netlist.inputs[0]');
  });

  it('a bare netlist (version 0) is named as the file spells it', () => {
    const bare = JSON.stringify({ ...cell.netlist, inputs: ['VDD'] });
    expect(refusal(bare).field).toBe('inputs[0]');
  });
});

describe('names that are Object members', () => {
  it('keeps expected functions and sequence steps keyed by __proto__, constructor and toString', () => {
    const text = withRaw(
      'cells.0.expectations',
      '{"__proto__": "!A", "constructor": "A", "toString": "1"}',
    ).replace('"sequences":[]', '"sequences":[{"name":"s","steps":[{"__proto__":"1"}]}]');
    const design = parseDesignFile(text, 'x').cells[0] as Cell;
    expect(Object.keys(design.expectations)).toEqual(['__proto__', 'constructor', 'toString']);
    expect(Object.getPrototypeOf(design.expectations)).toBe(null);
    expect(Object.keys(design.sequences[0]?.steps[0] ?? {})).toEqual(['__proto__']);
  });

  it('shows a name with control characters escaped in a refusal', () => {
    const e = refusal(withRaw('cells.0.netlist.inputs', '["\\u001b[2J", "\\u001b[2J"]'));
    expect(e.message).not.toContain('\u001b');
    expect(e.message).toContain('\\u001b[2J is listed twice');
  });
});
