// Behaviour of our own command, not published values: no source applies.
/**
 * The bundled command line (dist-cli/, built at install and before the tests) is what `railwise` runs,
 * and it answers exactly as the TypeScript sources do.
 */
import { spawnSync } from 'node:child_process';
import { statSync } from 'node:fs';
import { describe, expect, it } from 'vitest';

function railwise(fromSource: boolean, ...args: string[]): { status: number | null; stdout: string } {
  const r = spawnSync(process.execPath, ['bin/railwise.mjs', ...args], {
    encoding: 'utf8',
    env: { ...process.env, NO_COLOR: '1', RAILWISE_FROM_SOURCE: fromSource ? '1' : '0' },
  });
  return { status: r.status, stdout: r.stdout };
}

describe('the bundled command line', () => {
  it('exists and is newer than the sources it was built from', () => {
    const bundle = statSync('dist-cli/main.mjs').mtimeMs;
    expect(bundle).toBeGreaterThanOrEqual(statSync('src/cli/main.ts').mtimeMs);
    expect(statSync('dist-cli/cellWorker.mjs').isFile()).toBe(true);
  });

  it('prints the same report as the sources, with the same exit status', () => {
    const args = ['check', 'public/examples/tidewater-cells.sp', '--json'];
    const bundled = railwise(false, ...args);
    const source = railwise(true, ...args);
    expect(bundled.status).toBe(0);
    expect(bundled.status).toBe(source.status);
    expect(bundled.stdout).toBe(source.stdout);
  });

  it('runs cells on worker threads from the bundle', () => {
    const r = railwise(false, 'check', 'public/examples/tidewater-cells.sp', '--jobs', '2');
    expect(r.status).toBe(0);
    expect(r.stdout).toMatch(/8 cells: 8 pass/);
  });
});
