/**
 * `railwise check --prove` and `railwise compare`: the JSON shapes and exit statuses of
 * docs/semantics.md §5 and §10, on cells whose answers are facts of the trade: the functions of the
 * textbook gates (common practice, no source) and De Morgan's law A | B = !(!A & !B) (any Boolean
 * algebra text).
 */
import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { equalityComparator, equalityExpectation } from '../../bench/generators/proofCells.ts';
import { exportSpice } from '../../src/core/netlist-io/spiceExport.ts';
import { DEFAULT_TECHNOLOGY } from '../../src/core/model/technology.ts';
import { json, railwise } from './inProcess.ts';

const LIB = 'public/examples/tidewater-cells.sp';
const SLIP = 'public/examples/nand2-miswired.sp';
const LATCH = 'public/examples/beacon-sr-latch.railwise.json';
const OR2 = 'tests/cli/fixtures/de-morgan.sp';

interface PropertyJson {
  property: string;
  output: string | null;
  holds: boolean | null;
  vector?: Record<string, 0 | 1>;
  findings?: { kind: string; message: string }[];
  reason?: string;
}
type ProofJson = { properties: PropertyJson[]; seconds: number };
const proofOf = (cell: Record<string, unknown>): ProofJson => cell['proof'] as ProofJson;

/** The equality comparator of the proof bench (bench/generators/proofCells.ts) as a netlist file. */
function comparatorFile(bits: number): string {
  const file = join(mkdtempSync(join(tmpdir(), 'railwise-prove-')), `eq${bits}.sp`);
  const expectations = { EQ: equalityExpectation(bits) };
  writeFileSync(file, exportSpice(equalityComparator(bits), DEFAULT_TECHNOLOGY, { expectations }));
  return file;
}

describe('check --prove', () => {
  it('proves every property of the NAND2 for all vectors (exit 0); a held property has no vector', async () => {
    const { status, body } = await json('check', LIB, '--cell', 'tw_nand2', '--prove');
    expect(status).toBe(0);
    const proof = proofOf(body);
    expect(proof.seconds).toBeGreaterThanOrEqual(0);
    expect(proof.properties).toEqual([
      { property: 'function', output: 'Y', holds: true },
      { property: 'no-static-current', output: null, holds: true },
      { property: 'no-contention', output: null, holds: true },
      { property: 'no-floating', output: 'Y', holds: true },
      { property: 'no-unknown', output: 'Y', holds: true },
      { property: 'no-degraded', output: 'Y', holds: true },
    ]);
  });

  it('a NAND2 with MN1 tied to VDD fails its function at A=B=1, the only vector where NAND is 0 (exit 1)', async () => {
    const { status, body } = await json('check', SLIP, '--prove');
    expect(status).toBe(1);
    const fn = proofOf(body).properties.find((p) => p.property === 'function');
    expect(fn).toMatchObject({ output: 'Y', holds: false, vector: { A: 1, B: 1 } });
    expect(fn?.findings?.map((f) => f.kind)).toContain('mismatch');
  });

  it('a library proves every cell; the ratioed NOR draws static current when an input is high', async () => {
    const { status, body } = await json('check', LIB, '--prove');
    expect(status).toBe(1);
    const cells = body['cells'] as Record<string, unknown>[];
    expect(cells.every((c) => proofOf(c) !== undefined)).toBe(true);
    const pnor = cells.find((c) => c['cell'] === 'tw_pnor2') as Record<string, unknown>;
    const current = proofOf(pnor).properties.find((p) => p.property === 'no-static-current');
    expect(current?.holds).toBe(false);
    expect((current?.vector?.['A'] ?? 0) + (current?.vector?.['B'] ?? 0)).toBeGreaterThan(0);
    expect(current?.findings?.map((f) => f.kind)).toContain('static-current');
    const others = cells.filter((c) => c['cell'] !== 'tw_pnor2');
    expect(others.flatMap((c) => proofOf(c).properties.filter((p) => p.holds !== true))).toEqual([]);
    expect(body['summary']).toMatchObject({ unproved: 1 });
    const text = await railwise('check', LIB, '--prove');
    expect(text.out).toMatch(/not proved: tw_pnor2/);
    expect(text.out).toMatch(/FAILS {3}no-static-current at A=\d B=\d/);
  });

  it('says plainly that a latch is out of scope: every property undecided, one reason, exit 1', async () => {
    const { status, body } = await json('check', LATCH, '--prove');
    expect(status).toBe(1);
    for (const p of proofOf(body).properties) {
      expect(p.holds).toBeNull();
      expect(p.reason).toMatch(/^out of scope for proofs: .*stored state.*sequence/);
    }
    const text = await railwise('check', LATCH, '--prove');
    expect(text.out.match(/undecided: out of scope for proofs/g)).toHaveLength(1);
  });

  it('a sweep written as it runs (2^14 vectors) carries the proof in its one JSON document', async () => {
    const { status, body } = await json('check', comparatorFile(7), '--prove');
    expect(status).toBe(0);
    expect(body['vectors']).toHaveLength(2 ** 14);
    expect(proofOf(body).properties.every((p) => p.holds === true)).toBe(true);
  });

  it('past the exhaustive limit the sweep is skipped and the proof covers all 2^18 vectors', async () => {
    const file = comparatorFile(9);
    expect((await railwise('check', file)).status).toBe(2);
    const { status, body } = await json('check', file, '--prove');
    expect(status).toBe(0);
    expect(body['vectors']).toEqual([]);
    expect(body['notes']).toEqual(
      expect.arrayContaining([expect.stringMatching(/18 inputs .* the sweep was skipped/)]),
    );
    expect(proofOf(body).properties.every((p) => p.holds === true)).toBe(true);
  });
});

describe('compare', () => {
  it('De Morgan: an OR drawn as a NAND of inverted inputs equals a NOR with an inverter (exit 0)', async () => {
    const { status, body } = await json('compare', OR2, OR2, '--cell-a', 'or2_nand', '--cell-b', 'or2_nor');
    expect(status).toBe(0);
    expect(body).toMatchObject({ equivalent: true, vector: null, outputs: null });
    expect(typeof body['seconds']).toBe('number');
    const text = await railwise('compare', OR2, OR2, '--cell-a', 'or2_nand', '--cell-b', 'or2_nor');
    expect(text.out).toMatch(/equivalent: every output has the same level for all 4 vectors/);
  });

  it('NAND2 against NOR2 differ exactly where A ≠ B: NAND gives 1, NOR gives 0 (exit 1)', async () => {
    const { status, body } = await json('compare', LIB, LIB, '--cell-a', 'tw_nand2', '--cell-b', 'tw_nor2');
    expect(status).toBe(1);
    const vector = body['vector'] as Record<string, number>;
    expect(vector['A']).not.toBe(vector['B']);
    expect(body['outputs']).toEqual({ a: { Y: '1' }, b: { Y: '0' } });
    const text = await railwise('compare', LIB, LIB, '--cell-a', 'tw_nand2', '--cell-b', 'tw_nor2');
    expect(text.out).toMatch(/DIFFER at A=\d B=\d[\s\S]*Y: 1 in tw_nand2, 0 in tw_nor2/);
  });

  it.each([
    [['compare', LIB], /exactly two files/],
    [['compare', LIB, OR2, '--cell-b', 'or2_nor'], /is a library: pick one cell with --cell-a NAME/],
    [
      ['compare', LIB, LIB, '--cell-a', 'tw_inv', '--cell-b', 'tw_nand2'],
      /inputs differ \(tw_nand2 only: B\)/,
    ],
  ])('%j is unusable (exit 2) with a message naming the cause', async (argv, message) => {
    const r = await railwise(...argv);
    expect(r.status).toBe(2);
    expect(r.err).toMatch(message);
  });

  it('an unusable comparison with --json still prints one JSON document', async () => {
    const { status, body } = await json('compare', LIB, LIB, '--cell-a', 'tw_inv', '--cell-b', 'tw_nand2');
    expect(status).toBe(2);
    expect((body['error'] as { message: string }).message).toMatch(/inputs differ/);
  });

  it('is in the help', async () => {
    expect((await railwise('help')).out).toMatch(/railwise compare FILE_A FILE_B/);
    const r = await railwise('help', 'compare');
    expect(r.status).toBe(0);
    expect(r.out).toMatch(/--cell-a NAME/);
    expect((await railwise('help', 'check')).out).toMatch(/--prove/);
  });
});
