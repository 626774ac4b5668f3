/**
 * `railwise check --transfer` and `--dc`, called in-process: the JSON shapes, the text figures, and
 * the flags' errors. The figures here are checked for consistency only (NML = VIL − VOL and
 * NMH = VOH − VIH by definition; a pseudo-NMOS NOR with every input low has its pull-down off and
 * draws no current; both common practice, no source); their values are checked against published
 * ones in tests/dc.
 */
import { describe, expect, it } from 'vitest';
import { json, railwise } from './inProcess.ts';

const LIB = 'public/examples/tidewater-cells.sp';
const LATCH = 'public/examples/beacon-sr-latch.railwise.json';

interface Curve {
  points: [number, number | null][];
  vm: number | null;
  vil: number | null;
  vih: number | null;
  vol: number | null;
  voh: number | null;
  nml: number | null;
  nmh: number | null;
}

interface Json {
  transfer: {
    input: string;
    hold: Record<string, number>;
    convention: string;
    curves: Record<string, Curve>;
  };
  vectors: {
    inputs: Record<string, number>;
    voltages: Record<string, number>;
    dc: { voltages: Record<string, number | null>; supplyCurrent: number | null };
  }[];
  steps: { dc: { voltages: Record<string, number | null> } }[];
}

/** The cell's JSON, which must have been usable (exit status 0 or 1). */
async function cellJson(...argv: string[]): Promise<Json> {
  const { status, body } = await json(...argv);
  expect(status).toBeLessThan(2);
  return body as unknown as Json;
}

describe('--transfer', () => {
  it('adds input, hold, convention and per-output curves with their figures', async () => {
    const body = await cellJson('check', LIB, '--cell', 'tw_nand2', '--transfer', 'A');
    expect(body.transfer.input).toBe('A');
    expect(body.transfer.hold).toEqual({ B: 1 });
    expect(body.transfer.convention).toBe('unity-gain');
    const y = body.transfer.curves['Y'] as Curve;
    expect(y.points).toHaveLength(201);
    expect(y.points[0]).toEqual([0, expect.closeTo(2.5, 6)]);
    expect(y.points[200]).toEqual([2.5, expect.closeTo(0, 6)]);
    const { vm, vil, vih, vol, voh, nml, nmh } = y as unknown as Record<
      'vm' | 'vil' | 'vih' | 'vol' | 'voh' | 'nml' | 'nmh',
      number
    >;
    expect(0 < vil && vil < vm && vm < vih && vih < 2.5).toBe(true);
    expect(nml).toBeCloseTo(vil - vol, 12);
    expect(nmh).toBeCloseTo(voh - vih, 12);
  });

  it('takes --hold, --convention rails and --points', async () => {
    const body = await cellJson(
      'check',
      LIB,
      '--cell',
      'tw_pnor2',
      '--transfer',
      'a',
      '--hold',
      'b=0',
      '--convention',
      'rails',
      '--points',
      '11',
      '--dc',
    );
    expect(body.transfer.hold).toEqual({ B: 0 });
    expect(body.transfer.convention).toBe('rails');
    const y = body.transfer.curves['Y'] as Curve;
    expect(y.points).toHaveLength(11);
    // With the input at VDD the curve's end is the DC operating point of that vector.
    const aHigh = body.vectors.find((v) => v.inputs['A'] === 1 && v.inputs['B'] === 0);
    expect(y.vol).toBeCloseTo(aHigh?.dc.voltages['Y'] as number, 6);
  });

  it('prints the figures in text mode', async () => {
    const r = await railwise('check', LIB, '--cell', 'tw_inv', '--transfer', 'A');
    expect(r.out).toMatch(/transfer of A, level-1 model \(nothing held; VOL\/VOH at the unity-gain points\)/);
    expect(r.out).toMatch(
      /Y {2}VM \d\.\d{3} V {2}VIL \d\.\d{3} V {2}VIH .* NML \d\.\d{3} V {2}NMH \d\.\d{3} V/,
    );
  });
});

describe('--dc', () => {
  it('adds voltages and supply current from the level-1 operating point to every vector', async () => {
    const body = await cellJson('check', LIB, '--cell', 'tw_pnor2', '--dc');
    expect(body.vectors).toHaveLength(4);
    for (const v of body.vectors) {
      expect(Object.keys(v.dc.voltages)).toEqual(['Y']);
      expect(typeof v.dc.supplyCurrent).toBe('number');
    }
    expect(body.vectors[0]?.dc.supplyCurrent).toBe(0);
    expect(body.vectors[3]?.dc.supplyCurrent).toBeGreaterThan(1e-6);
  });
  it('follows a sequence, keeping the latch state', async () => {
    const body = await cellJson('check', LATCH, '--sequence', 'set, hold, reset, hold', '--dc');
    expect(body.steps.map((s) => s.dc.voltages['Q'])).toEqual([
      expect.closeTo(2.5, 6),
      expect.closeTo(2.5, 6),
      expect.closeTo(0, 6),
      expect.closeTo(0, 6),
    ]);
  });
  it('prints each vector beside the switch-level estimate, marking disagreement', async () => {
    const r = await railwise('check', LIB, '--cell', 'tw_pnor2', '--dc');
    expect(r.out).toMatch(/level-1 DC \(switch-level estimate in brackets/);
    expect(r.out).toMatch(/A=1 B=0 │ Y 0\.\d{3} V \(0\.\d{3} V\) │ I [\d.]+ µA \([\d.]+ µA\) {2}≠/);
  });
});

describe('flags', () => {
  it('are listed in check --help', async () => {
    const r = await railwise('check', '--help');
    for (const flag of ['--transfer IN', '--hold', '--convention', '--points', '--dc'])
      expect(r.out).toContain(flag);
  });
  it.each([
    [['check', LIB, '--cell', 'tw_inv', '--hold', 'A=1'], /--hold goes with --transfer IN/],
    [
      ['check', LIB, '--cell', 'tw_inv', '--transfer', 'A', '--convention', 'middle'],
      /--convention must be unity-gain or rails/,
    ],
    [['check', LIB, '--cell', 'tw_inv', '--transfer', 'A', '--points', '2'], /--points 2: give 3 to/],
    [['check', LIB, '--transfer', 'A'], /--transfer applies to one cell: add --cell NAME/],
  ])('%j is unusable (exit 2), naming the flag', async (argv, message) => {
    const r = await railwise(...argv);
    expect(r.status).toBe(2);
    expect(r.err).toMatch(message);
  });
  it('an unknown input or a bad hold makes the cell unusable, naming --transfer', async () => {
    const unknown = await railwise('check', LIB, '--cell', 'tw_nand2', '--transfer', 'Q', '--json');
    expect(unknown.status).toBe(2);
    expect(JSON.parse(unknown.out).error).toEqual({
      message: "--transfer: 'Q' is not an input (inputs: A, B)",
      field: 'transfer',
    });
    const hold = await railwise('check', LIB, '--cell', 'tw_nand2', '--transfer', 'A', '--hold', 'B=X');
    expect(hold.status).toBe(2);
    expect(hold.out).toMatch(/--transfer: held 'B=X' is not NAME=0 or NAME=1/);
  });
});
