/**
 * The command line under hostile and huge input: one JSON document on standard output in every
 * case, big sweeps written as they run, names printed safely, binary files refused with a short
 * excerpt. Behaviour of our own tool; the pseudo-NMOS NOR and NAND truth tables are common
 * practice, no source.
 */
import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { runCell, type CellJson } from '../../src/cli/runCell.ts';
import { printedCell } from '../../src/cli/checkCommand.ts';
import { writeJson } from '../../src/cli/jsonWriter.ts';
import { loadCells } from '../../src/cli/loadCells.ts';
import { STREAM_ROWS } from '../../src/cli/streamCell.ts';
import { FindingSpool } from '../../src/cli/findingSpool.ts';
import { makeColour, terminalSafe } from '../../src/cli/colour.ts';
import { hasControlCharacter } from '../fixtures/hostileNames.ts';
import { railwise } from './inProcess.ts';

const dir = mkdtempSync(join(tmpdir(), 'railwise-hostile-'));
afterAll(() => rmSync(dir, { recursive: true, force: true }));

function file(name: string, text: string | Buffer): string {
  const path = join(dir, name);
  writeFileSync(path, text);
  return path;
}

/** A static CMOS NOR of n inputs: n series PMOS, n parallel NMOS, and a wrong expected function. */
function norWithWrongExpectation(n: number): string {
  const inputs = Array.from({ length: n }, (_, i) => `A${i}`);
  const joint = (i: number): string => (i === 0 ? 'VDD' : i === n ? 'Y' : `p${i}`);
  return [
    `.subckt nor ${inputs.join(' ')} Y VDD GND`,
    '* railwise: expect Y = !(A0 | A1)',
    ...inputs.map((a, i) => `MP${i} ${joint(i + 1)} ${a} ${joint(i)} VDD pmos W=2u L=0.25u`),
    ...inputs.map((a, i) => `MN${i} Y ${a} GND GND nmos W=1u L=0.25u`),
    '.ends',
    '',
  ].join('\n');
}

describe('a sweep too big to collect', () => {
  const nor = file('nor13.sp', norWithWrongExpectation(13));

  it('is written row by row and reads back as the report collected whole', async () => {
    expect(2 ** 13).toBeGreaterThan(STREAM_ROWS);
    const r = await railwise('check', nor, '--json');
    expect(r.status).toBe(1); // the wrong expected function gives mismatches
    const streamed = JSON.parse(r.out) as Record<string, unknown>;
    const [cell] = loadCells([nor], {
      expect: {},
      supply: [],
      ground: [],
      treatAs: new Map(),
      topOnly: false,
    }).cells;
    const whole = runCell((cell as { job: never }).job, {
      allNets: false,
      undriven: false,
      sizing: false,
      load: 0,
    });
    let printed = '';
    writeJson(printedCell((whole as { json: CellJson }).json), (lines) => (printed += `${lines}\n`));
    expect(streamed).toEqual(JSON.parse(printed));
    const rows = streamed['vectors'] as { outputs: { Y: string } }[];
    // NOR: Y is 1 only when every input is 0; !(A0 | A1) is 1 in a quarter of the rows.
    expect(rows.filter((v) => v.outputs.Y === '1')).toHaveLength(1);
    expect(streamed['summary']).toMatchObject({ vectors: 8192, mismatch: 2048 - 1 });
  });

  it('in text shows the first rows with findings and says how many are left out', async () => {
    const r = await railwise('check', nor);
    expect(r.out).toMatch(/8192 vectors/);
    expect(r.out).toMatch(/\(8128 rows not shown; --json lists every row\)/);
    expect(r.out).toMatch(/FAIL {2}8192 vectors, 2047 errors/);
    expect(r.out).toMatch(/… \d+ more \(--json lists them all\)/);
  });
});

describe('--json prints exactly one JSON document', () => {
  it.each([
    [['check', '--json', '--frobnicate', 'x.sp'], /frobnicate/],
    [['check', '--json'], /FILE/],
    [['check', '--json', 'public/examples/tidewater-cells.sp', '--vdd', '1e400'], /--vdd "1e400"/],
    [
      ['check', '--json', 'public/examples/tidewater-cells.sp', '--power', '--load', '1e400'],
      /--load "1e400"/,
    ],
    [['check', '--json', 'public/examples/tidewater-cells.sp', '--inputs', 'A'], /add --cell NAME/],
  ])('for %j, with the message also on standard error', async (argv, message) => {
    const r = await railwise(...argv);
    expect(r.status).toBe(2);
    const doc = JSON.parse(r.out) as { error: { message: string } };
    expect(doc.error.message).toMatch(message);
    expect(r.err).toMatch(message);
  });

  it('for a file that is not there, a binary file and a broken design file', async () => {
    const binary = file(
      'ls.sp',
      Buffer.from([0x7f, 0x45, 0x4c, 0x46, 2, 1, 1, 0, 0, 0, 0x1b, 0x5b, 0x32, 0x4a]),
    );
    const broken = file(
      'broken.json',
      '{"format": "railwise-design", "version": 1, "name": "\\u001b[2J", "netlist": 3}',
    );
    for (const [f, message] of [
      [join(dir, 'missing.sp'), /cannot read: no such file/],
      [binary, /not a text file \(it holds binary data; it begins "\\u007fELF/],
      [broken, /field netlist: /],
    ] as const) {
      const r = await railwise('check', f, '--json');
      expect(r.status).toBe(2);
      const doc = JSON.parse(r.out) as { error: { message: string } };
      expect(doc.error.message).toMatch(message);
      expect(r.out).not.toContain('\u001b');
    }
  });
});

describe('hostile names', () => {
  /** A NAND2 whose pins and nodes are named like Object members and terminal escapes. */
  const nand = (a: string, b: string, y: string, mid: string, expect = true): string =>
    JSON.stringify({
      format: 'railwise-design',
      version: 1,
      name: y,
      netlist: {
        name: y,
        devices: [
          { kind: 'pmos', name: `${a}P`, gate: a, drain: y, source: 'VDD', w: 2, l: 0.25 },
          { kind: 'pmos', name: `${b}P`, gate: b, drain: y, source: 'VDD', w: 2, l: 0.25 },
          { kind: 'nmos', name: a, gate: a, drain: y, source: mid, w: 2, l: 0.25 },
          { kind: 'nmos', name: b, gate: b, drain: mid, source: 'GND', w: 2, l: 0.25 },
        ],
        rails: [
          { net: 'VDD', role: 'supply' },
          { net: 'GND', role: 'ground' },
        ],
        inputs: [a, b],
        outputs: [y],
      },
      expectations: expect ? { [y]: `!(${a} & ${b})` } : {},
    });

  it('an input called __proto__ is driven: the same truth table and verdict as plain names', async () => {
    const checked = (name: string, text: string) =>
      railwise('check', file(name, text), '--json', '--power', '--sizing');
    const plain = await checked('plain.json', nand('A', 'B', 'Y', 'n1'));
    const odd = await checked('odd.json', nand('__proto__', 'constructor', 'toString', 'hasOwnProperty'));
    expect(odd.status).toBe(plain.status);
    type Body = {
      vectors: { inputs: Record<string, number>; outputs: Record<string, string> }[];
      summary: object;
      power: { totalWatts: number };
      sizing: { logicalEffort: Record<string, number> };
    };
    const [p, o] = [JSON.parse(plain.out) as Body, JSON.parse(odd.out) as Body];
    expect(
      o.vectors.map((v) => [v.inputs['__proto__'], v.inputs['constructor'], v.outputs['toString']]),
    ).toEqual(p.vectors.map((v) => [v.inputs['A'], v.inputs['B'], v.outputs['Y']]));
    expect(o.summary).toEqual(p.summary);
    expect(o.power.totalWatts).toBe(p.power.totalWatts);
    expect(o.sizing.logicalEffort['__proto__']).toBe(p.sizing.logicalEffort['A']);
  });

  it('terminal escape sequences in names are printed escaped, never raw', async () => {
    const r = await railwise(
      'check',
      file('esc.json', nand('\u001b[2J', 'B\u0007', 'Y\u001b]0;pwned\u0007', 'n\r1', false)),
    );
    expect(r.status).toBe(0);
    expect(hasControlCharacter(r.out, '\n')).toBe(false);
    expect(r.out).toContain('\\u001b[2J');
  });
});

describe('the finding spool', () => {
  it('gives back every finding in order, from memory and from its temporary file', () => {
    const spool = new FindingSpool(200);
    const findings = Array.from({ length: 2000 }, (_, i) => ({
      kind: 'mismatch',
      vector: i,
      message: `é ${'x'.repeat(i % 7)}`,
    }));
    findings.forEach((f) => spool.add(f));
    const back: unknown[] = [];
    spool.replay((raw) => back.push(JSON.parse(raw.json)));
    expect(back).toEqual(findings);
    expect(spool.count).toBe(2000);
  });
});

describe('the last guard before a terminal', () => {
  it('escapes every control character but its own colours, line breaks and tabs', () => {
    const own = makeColour(true).bold('pass');
    expect(terminalSafe(`a\u001b[2Jb\u0007\n\t${own}`, true)).toBe(`a\\u001b[2Jb\\u0007\n\t${own}`);
    expect(terminalSafe(own, false)).toBe('\\u001b[1mpass\\u001b[0m');
    expect(terminalSafe('x\u202ey', true)).toBe('x\\u202ey');
  });
});
