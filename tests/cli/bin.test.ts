// Behaviour of our own command, not published values: no source applies.
/**
 * The real executable, as a user or CI runs it: `node bin/railwise.mjs …` in a child process.
 * Few cases, since each run starts Node and tsx (about a second).
 */
import { spawnSync } from 'node:child_process';
import { describe, expect, it } from 'vitest';

function railwise(...args: string[]): { status: number | null; stdout: string; stderr: string } {
  const r = spawnSync(process.execPath, ['bin/railwise.mjs', ...args], {
    encoding: 'utf8',
    env: { ...process.env, NO_COLOR: '1' },
  });
  return { status: r.status, stdout: r.stdout, stderr: r.stderr };
}

describe('bin/railwise.mjs', () => {
  it('checks the example library: every cell reported, exit status 0', () => {
    const r = railwise('check', 'public/examples/tidewater-cells.sp');
    expect(r.stderr).toBe('');
    expect(r.status).toBe(0);
    for (const cell of [
      'tw_inv',
      'tw_nand2',
      'tw_nor2',
      'tw_aoi21',
      'tw_mux2',
      'tw_tinv',
      'tw_pnor2',
      'tw_decap',
    ]) {
      expect(r.stdout).toContain(cell);
    }
    expect(r.stdout).toMatch(/8 cells: 8 pass, 0 with errors, 0 unusable/);
  });

  it('exit status 1 and the docs/semantics.md §5 JSON for a cell with error findings', () => {
    const r = railwise('check', 'public/examples/nand2-miswired.sp', '--json');
    expect(r.status).toBe(1);
    const body = JSON.parse(r.stdout) as Record<string, unknown>;
    expect(Object.keys(body)).toEqual(
      expect.arrayContaining(['inputs', 'outputs', 'vectors', 'findings', 'summary']),
    );
    const finding = (body['findings'] as Record<string, unknown>[]).find((f) => f['kind'] === 'mismatch');
    expect(Object.keys(finding ?? {})).toEqual(
      expect.arrayContaining(['kind', 'severity', 'vector', 'nets', 'devices', 'path', 'message']),
    );
    expect(finding).toMatchObject({ severity: 'error', vector: 3, nets: ['Y'] });
  });

  it('exit status 2 for a library with an unreadable cell, the other cells still checked', () => {
    const r = railwise('check', 'tests/cli/fixtures/buoy-lib-with-broken-cell.sp', '--json');
    expect(r.status).toBe(2);
    const body = JSON.parse(r.stdout) as {
      cells: Record<string, unknown>[];
      summary: Record<string, number>;
    };
    expect(body.cells).toHaveLength(4);
    expect(body.cells.filter((c) => 'summary' in c)).toHaveLength(3);
    expect(body.summary).toMatchObject({ cells: 4, unusable: 1 });
  });

  it('exit status 2 and a message on stderr for bad arguments', () => {
    const r = railwise('check', 'public/examples/tidewater-cells.sp', '--vdd');
    expect(r.status).toBe(2);
    expect(r.stderr).toMatch(/--vdd/);
    expect(r.stdout).toBe('');
  });
});
