/**
 * The command line on netlists written the way open kits publish them (our own made-up fixtures,
 * each reproducing a construct met in published libraries) and checked against a Liberty file's
 * published functions (docs/semantics.md §4–§6).
 *
 * Sources: the functions are Liberty `function` attributes in our own fixture library (the attribute's
 * syntax as open libraries publish it); the verdicts follow from the gates' truth tables (AOI21 and OAI21
 * differ on 2 of their 8 vectors; a tristate buffer is Z when its enable is off): common practice, no source.
 */
import { describe, expect, it } from 'vitest';
import { json, railwise } from './inProcess.ts';

const SPICE = 'tests/cli/fixtures/harbour-kit.spice';
const CDL = 'tests/cli/fixtures/harbour-kit.cdl';
const LIB = 'tests/cli/fixtures/harbour.lib';

type Cell = Record<string, unknown> & { cell: string };

describe('--functions-from', () => {
  it('checks every cell of an extracted netlist against the library, skipping the sequential one', async () => {
    const { status, body } = await json('check', SPICE, '--functions-from', LIB);
    expect(status).toBe(0);
    const cells = body['cells'] as Cell[];
    expect(cells.map((c) => c.cell)).toEqual(['hb_a21oi', 'hb_inv', 'hb_ebufn', 'hb_conb', 'hb_dlatch']);
    expect(cells.find((c) => c.cell === 'hb_dlatch')).toMatchObject({
      skipped: expect.stringMatching(/^sequential \(a latch group/),
    });
    expect(body['summary']).toEqual({
      cells: 5,
      passed: 4,
      failed: 0,
      unusable: 0,
      skipped: 1,
      errors: 0,
      warnings: 0,
    });
    expect(body['notes']).toEqual([`2 cells of ${LIB} are in no netlist given: hb_probe, hb_nand2`]);
  });

  it('takes pins and the tristate function from the library: Z wherever TE_B is 1', async () => {
    const { body } = await json('check', SPICE, '--functions-from', LIB, '--cell', 'hb_ebufn');
    expect(body).toMatchObject({ inputs: ['A', 'TE_B'], outputs: ['Z'] });
    const vectors = body['vectors'] as { inputs: Record<string, number>; outputs: Record<string, string> }[];
    expect(vectors.map((v) => v.outputs['Z'])).toEqual(['0', 'Z', '1', 'Z']);
  });

  it('finds a wrong function: the same AOI checked against an OAI function fails on the vectors that differ', async () => {
    const flags = ['--functions-from', LIB, '--cell', 'hb_a21oi', '--expect', 'Y = !((A1 | A2) & B1)'];
    const { status, body } = await json('check', CDL, ...flags);
    expect(status).toBe(1);
    // AOI21 and OAI21 differ where A1 A2 B1 = 001 and 110 (truth tables worked by hand).
    expect((body['summary'] as Record<string, number>)['mismatch']).toBe(2);
  });

  it('reads the CDL version: bare micrometre sizes, short links, the same verdicts', async () => {
    const { status, body } = await json('check', CDL, '--functions-from', LIB);
    expect(status).toBe(0);
    expect(
      (body['cells'] as Cell[]).map((c) => [c.cell, (c['summary'] as { errors: number }).errors]),
    ).toEqual([
      ['hb_a21oi', 0],
      ['hb_conb', 0],
      ['hb_probe', 0],
    ]);
  });

  it('names the line of a broken library file', async () => {
    const r = await railwise('check', CDL, '--functions-from', 'tests/cli/fixtures/expect-typo.sp');
    expect(r.status).toBe(2);
    expect(r.err).toMatch(
      /--functions-from tests\/cli\/fixtures\/expect-typo\.sp:1: "\*" is followed by neither/,
    );
  });
});

describe('netlists as published', () => {
  it('checks only the top-level cells with --top-only', async () => {
    const { body } = await json('check', SPICE, '--top-only');
    expect((body['cells'] as Cell[]).map((c) => c.cell)).toEqual([
      'hb_a21oi',
      'hb_ebufn',
      'hb_conb',
      'hb_dlatch',
    ]);
  });

  it('refuses a kit device it cannot type, and takes --treat-as', async () => {
    const text = `.subckt inv A Y vdd vss\nX0 Y A vss vss kitdev_a w=1u l=0.15u\nX1 Y A vdd vdd kitdev_b w=2u l=0.15u\n.ends\n`;
    const { writeFileSync, mkdtempSync } = await import('node:fs');
    const dir = mkdtempSync('/tmp/railwise-kit-');
    writeFileSync(`${dir}/inv.sp`, text);
    const refused = await json('check', `${dir}/inv.sp`);
    expect(refused.status).toBe(2);
    expect(refused.body).toMatchObject({
      error: { line: 2, message: expect.stringMatching(/--treat-as kitdev_a=nmos/) },
    });
    const { status, body } = await json(
      'check',
      `${dir}/inv.sp`,
      '--treat-as',
      'kitdev_a=nmos,kitdev_b=pmos',
      '--expect',
      'Y = !A',
    );
    expect(status).toBe(0);
    expect(body).toMatchObject({ inputs: ['A'], outputs: ['Y'] });
  });

  it.each([
    [['--scale', 'big'], /--scale "big" is not a number/],
    [['--scale', '10'], /--scale "10" is outside 1e-12 to 1/],
    [['--treat-as', 'kitdev=bjt'], /--treat-as "kitdev=bjt": write NAME=nmos/],
    [['--functions-from', 'nowhere.lib'], /--functions-from nowhere\.lib: cannot read: no such file/],
    [['--vdd', '1e400'], /--vdd "1e400" is not a positive number/],
    [['--vdd', '500'], /--vdd "500" is outside 0 to 100 V/],
  ])('%j is unusable (exit 2) with a message naming the flag', async (flags, message) => {
    const r = await railwise('check', CDL, ...flags);
    expect(r.status).toBe(2);
    expect(r.err).toMatch(message);
  });

  it('locates an error in a "* railwise: expect" line by file, line and column', async () => {
    const { status, body } = await json('check', 'tests/cli/fixtures/expect-typo.sp');
    expect(status).toBe(2);
    expect(body).toMatchObject({
      cell: 'typo_inv',
      error: {
        line: 4,
        message: expect.stringMatching(
          /^tests\/cli\/fixtures\/expect-typo\.sp:4: expect Y: expression ends too early at column 5/,
        ),
      },
    });
  });
});
