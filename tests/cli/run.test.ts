/**
 * The railwise command, called in-process through `run` (fast): argument handling, exit statuses
 * 0 / 1 / 2 of docs/semantics.md §5, the JSON shape, and the exports. bin.test.ts runs the real executable.
 */
import { describe, expect, it } from 'vitest';
import { json, railwise } from './inProcess.ts';
import { colourWanted, formatSi } from '../../src/cli/colour.ts';

const LIB = 'public/examples/tidewater-cells.sp';
const BROKEN_LIB = 'tests/cli/fixtures/buoy-lib-with-broken-cell.sp';
const DIVIDER = 'tests/cli/fixtures/divider.sp';
const TG = 'tests/cli/fixtures/tg.sp';

describe('arguments', () => {
  it('prints help with exit status 0', async () => {
    for (const argv of [[], ['--help'], ['help', 'check'], ['check', '--help'], ['export', '-h']]) {
      const r = await railwise(...argv);
      expect(r.status).toBe(0);
      expect(r.out).toMatch(/railwise/);
    }
  });

  it.each([
    [['frobnicate'], /unknown command "frobnicate"/],
    [['check'], /at least one FILE/],
    [['check', LIB, '--colour'], /--colour/],
    [['check', LIB, '--expect', 'Y is !A'], /--expect "Y is !A": write OUTPUT = EXPRESSION/],
    [['check', LIB, '--vdd', 'high'], /--vdd "high" is not a positive number/],
    [['check', LIB, '--freq', '1meg'], /--freq and --activity go with --power/],
    [['check', LIB, '--power', '--activity', 'bursty'], /--activity must be sequence or random/],
    [['check', LIB, '--jobs', '0'], /--jobs "0"/],
    [['check', LIB, '--inputs', 'A'], /apply to one cell: add --cell NAME/],
    [['check', LIB, '--cell', 'tw_xor'], /--cell tw_xor: no such cell .*tw_inv, tw_nand2/],
    [['export', LIB, '--to', 'gds'], /--to must be spice, verilog or csv \(got "gds"\)/],
    [['export', LIB, '--to', 'spice'], /is a library: pick one cell with --cell NAME/],
  ])('%j is unusable (exit 2) with a message naming the flag', async (argv, message) => {
    const r = await railwise(...argv);
    expect(r.status).toBe(2);
    expect(r.err).toMatch(message);
  });

  it('names a missing file', async () => {
    const r = await railwise('check', 'nowhere/cell.sp');
    expect(r.status).toBe(2);
    expect(r.out).toMatch(/nowhere\/cell\.sp: cannot read: no such file/);
  });
});

describe('check', () => {
  it('gives the single-cell JSON shape of docs/semantics.md §5', async () => {
    const { status, body } = await json('check', LIB, '--cell', 'tw_nand2');
    expect(status).toBe(0);
    expect(body).toMatchObject({ cell: 'tw_nand2', inputs: ['A', 'B'], outputs: ['Y'], findings: [] });
    const vectors = body['vectors'] as Record<string, unknown>[];
    // NAND truth table (common practice, no source), outputs at the rails of VDD 2.5 V.
    expect(vectors.map((v) => [v['inputs'], v['outputs'], v['voltages']])).toEqual([
      [{ A: 0, B: 0 }, { Y: '1' }, { Y: 2.5 }],
      [{ A: 0, B: 1 }, { Y: '1' }, { Y: 2.5 }],
      [{ A: 1, B: 0 }, { Y: '1' }, { Y: 2.5 }],
      [{ A: 1, B: 1 }, { Y: '0' }, { Y: 0 }],
    ]);
    expect(vectors[0]).toHaveProperty('supplyCurrent', 0);
    expect(vectors[0]).toHaveProperty('findings', []);
    expect(body['summary']).toMatchObject({ vectors: 4, errors: 0, warnings: 0, contention: 0, mismatch: 0 });
  });

  it('reports every net with --all-nets and steps with --sequence', async () => {
    const all = await json('check', LIB, '--cell', 'tw_nand2', '--all-nets');
    const first = (all.body['vectors'] as { voltages: Record<string, number> }[])[0];
    expect(Object.keys(first?.voltages ?? {})).toEqual(expect.arrayContaining(['Y', 'n1', 'VDD', 'VSS']));
    const seq = await json('check', LIB, '--cell', 'tw_inv', '--sequence', 'A=0; A=1; A=0');
    expect(seq.body).not.toHaveProperty('vectors');
    const steps = seq.body['steps'] as { outputs: Record<string, string> }[];
    expect(steps.map((s) => s.outputs['Y'])).toEqual(['1', '0', '1']);
  });

  it('--inputs and --outputs override the inferred pins', async () => {
    const { status, body } = await json('check', TG, '--inputs', 'D,EN,ENB', '--outputs', 'Y');
    expect(body).toMatchObject({ inputs: ['D', 'EN', 'ENB'], outputs: ['Y'] });
    // With EN = 1 and ENB = 0 the gate passes D to Y (common practice, no source).
    const rows = body['vectors'] as { inputs: Record<string, number>; outputs: Record<string, string> }[];
    const on = rows.filter((r) => r.inputs['EN'] === 1 && r.inputs['ENB'] === 0);
    expect(on.map((r) => [r.inputs['D'], r.outputs['Y']])).toEqual([
      [0, '0'],
      [1, '1'],
    ]);
    expect(status).toBe(1); // EN = ENB leaves Y floating or half-passed: error findings
    const bad = await railwise('check', TG, '--inputs', 'D,EN,Q');
    expect(bad.status).toBe(2);
    expect(bad.out).toMatch(/--inputs: cell tg has no net "Q"/);
  });

  it('a port that --expect reads but does not describe is an input', async () => {
    // The carry of a full adder is the majority of A, B and CI (common practice, no source); A
    // drives pass-gate channels, so without the expectation it would be taken for an output.
    const tgc = 'tests/cli/fixtures/tgc-bare.sp';
    const { status, body } = await json('check', tgc, '--expect', 'CO = A & B | A & CI | B & CI');
    expect([...(body['inputs'] as string[])].sort()).toEqual(['A', 'B', 'CI']);
    expect(body['outputs']).toEqual(['CO']);
    expect((body['vectors'] as unknown[]).length).toBe(8);
    expect(status).toBe(0);
  });

  it('--supply and --ground name rails, and --vdd sets the supply voltage', async () => {
    const unnamed = await json('check', 'tests/cli/fixtures/inv-vpwr.sp');
    expect(unnamed.body['outputs']).toEqual(['Y', 'VPWR', 'VGND']);
    const { status, body } = await json(
      'check',
      'tests/cli/fixtures/inv-vpwr.sp',
      '--supply',
      'vpwr',
      '--ground',
      'VGND',
      '--vdd',
      '1.8',
    );
    expect(status).toBe(0);
    expect(body).toMatchObject({ inputs: ['A'], outputs: ['Y'], technology: { vdd: 1.8 } });
    const rows = body['vectors'] as { voltages: Record<string, number> }[];
    expect(rows.map((r) => r.voltages['Y'])).toEqual([1.8, 0]);
  });

  it('solves a resistive divider held by a V line: 10 kΩ over 40 kΩ at 5 V gives 4.00 V and 0.1 mA', async () => {
    // Common practice, no source: V = 5 · 40k / (10k + 40k) = 4 V; I = 5 V / 50 kΩ = 0.1 mA; P = 0.5 mW.
    const { body } = await json('check', DIVIDER);
    const [vector] = body['vectors'] as {
      voltages: Record<string, number>;
      supplyCurrent: number;
      staticPower: number;
    }[];
    expect(vector?.voltages['out']).toBeCloseTo(4.0, 6);
    expect(vector?.supplyCurrent).toBeCloseTo(1e-4, 10);
    expect(vector?.staticPower).toBeCloseTo(5e-4, 10);
  });

  it('gives the static current path of a ratioed NOR with its current', async () => {
    const { body } = await json('check', LIB, '--cell', 'tw_pnor2');
    const row = (
      body['vectors'] as { currentPaths: { chain: string[]; current: number }[]; supplyCurrent: number }[]
    )[1];
    // Derived: on-resistance R_unit·L/W with RCN 0.25 µm values (tables 3.2–3.3, from memory):
    // load PMOS 31 kΩ·0.5/0.5 = 31 kΩ, NMOS 13 kΩ·0.25/1 = 3.25 kΩ; I = 2.5 V / 34.25 kΩ = 73.0 µA.
    expect(row?.currentPaths).toEqual([
      { chain: ['VDD', 'MPL', 'Y', 'MN2', 'VSS'], current: expect.any(Number) },
    ]);
    expect(row?.currentPaths[0]?.current).toBeCloseTo(2.5 / 34.25e3, 9);
    expect(row?.supplyCurrent).toBeCloseTo(2.5 / 34.25e3, 9);
  });

  it('exit status 1 for error findings, with the mismatch named', async () => {
    const { status, body } = await json('check', LIB, '--cell', 'tw_inv', '--expect', 'Y = A');
    expect(status).toBe(1);
    expect(body['summary']).toMatchObject({ errors: 2, mismatch: 2 });
  });

  it('a bad expected function makes the cell unusable (exit 2), naming it', async () => {
    const { status, body } = await json('check', LIB, '--cell', 'tw_inv', '--expect', 'Y = !(A');
    expect(status).toBe(2);
    expect(body).toMatchObject({ cell: 'tw_inv', error: { field: 'expect' } });
  });

  it('adds power with --power', async () => {
    const { body } = await json(
      'check',
      LIB,
      '--cell',
      'tw_pnor2',
      '--power',
      '--freq',
      '100meg',
      '--load',
      '10f',
    );
    expect(body['power']).toMatchObject({ frequency: 1e8, load: 1e-14, activitySource: 'random' });
  });

  it('adds sizing with --sizing: the NAND2 sized like its 2:1 inverter has g = 4/3 per input', async () => {
    // Weste & Harris, CMOS VLSI Design, 4th ed., table 4.2 (also Sutherland, Sproull, Harris, Logical
    // Effort, table 1.1): a two-input NAND has logical effort 4/3 on each input.
    const { body } = await json('check', LIB, '--cell', 'tw_nand2', '--sizing');
    const sizing = body['sizing'] as { logicalEffort: Record<string, number> };
    expect(sizing.logicalEffort['A']).toBeCloseTo(4 / 3, 6);
    expect(sizing.logicalEffort['B']).toBeCloseTo(4 / 3, 6);
  });

  it('reports a library: every cell, the broken one with its file and line, and a summary', async () => {
    const { status, body } = await json('check', BROKEN_LIB);
    expect(status).toBe(2);
    const cells = body['cells'] as Record<string, unknown>[];
    expect(cells.map((c) => c['cell'])).toEqual([
      'buoy_inv',
      'buoy_bandgap_stub',
      'buoy_nor2',
      'buoy_nand2_wrong_expect',
    ]);
    expect(cells[1]).toMatchObject({ file: BROKEN_LIB, error: { line: 9 } });
    expect(body['summary']).toEqual({ cells: 4, passed: 2, failed: 1, unusable: 1, errors: 4, warnings: 0 });
  });

  it('--cell picks one cell of a library and prints the single-cell object', async () => {
    const { status, body } = await json('check', BROKEN_LIB, '--cell', 'BUOY_NOR2');
    expect(status).toBe(0);
    expect(body).toMatchObject({ cell: 'buoy_nor2', inputs: ['A', 'B'] });
    expect(body).not.toHaveProperty('cells');
  });

  it('treats several files as a library', async () => {
    const { body } = await json('check', DIVIDER, 'public/examples/buffer-x2.sp');
    expect((body['cells'] as { cell: string }[]).map((c) => c.cell)).toEqual(['divider', 'lamp_buf']);
  });
});

describe('human report', () => {
  it('prints the truth table, findings with their current path, and a summary line', async () => {
    const r = await railwise('check', LIB, '--cell', 'tw_pnor2');
    expect(r.status).toBe(0);
    expect(r.out).toMatch(/A B │ Y │ I\(supply\)/);
    expect(r.out).toMatch(/0 1 │ 0 │ \d+(\.\d+)? µA +! static-current/);
    expect(r.out).toContain('VDD → MPL → Y → MN2 → VSS');
    expect(r.out).toMatch(/pass {2}4 vectors, 0 errors, 4 warnings/);
    expect(r.out).toMatch(/not sign-off/);
    expect(r.out.includes('\u001b[')).toBe(false);
  });

  it('colours only a terminal, and NO_COLOR turns it off (no-color.org)', () => {
    expect(colourWanted(true, {})).toBe(true);
    expect(colourWanted(false, {})).toBe(false);
    expect(colourWanted(true, { NO_COLOR: '1' })).toBe(false);
    expect(colourWanted(true, { NO_COLOR: '' })).toBe(true);
  });

  it('writes currents with SI prefixes', () => {
    expect(formatSi(7.3e-5, 'A')).toBe('73 µA');
    expect(formatSi(1.234e-3, 'W')).toBe('1.23 mW');
    expect(formatSi(0, 'A')).toBe('0 A');
  });
});

describe('export', () => {
  it('writes SPICE, Verilog and CSV of one cell', async () => {
    const spice = await railwise('export', LIB, '--cell', 'tw_inv', '--to', 'spice');
    expect(spice.status).toBe(0);
    expect(spice.out).toContain('.subckt tw_inv A Y VDD VSS');
    const verilog = await railwise('export', LIB, '--cell', 'tw_inv', '--to', 'verilog');
    expect(verilog.out).toContain('pmos MP1 (Y, VDD, A);');
    const csv = await railwise('export', LIB, '--cell', 'tw_inv', '--to', 'csv');
    expect(csv.out.split('\r\n').slice(0, 3)).toEqual([
      'vector,A,Y,V(Y) [V],supply current [A],static power [W],findings',
      '0,0,1,2.5,0,0,',
      '1,1,0,0,0,0,',
    ]);
  });
});
