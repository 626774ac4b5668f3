/**
 * `--max-inputs N`: sweeps past the default 16 inputs when asked, up to 24, and every refusal says
 * what to do instead (docs/semantics.md §7).
 */
import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { json, railwise } from './inProcess.ts';

const dir = mkdtempSync(join(tmpdir(), 'railwise-max-inputs-'));
afterAll(() => rmSync(dir, { recursive: true, force: true }));

/** A cell of n independent inverters (input Ak drives output Yk): n inputs, 2n transistors. */
function inverterRow(n: number): string {
  const ports = Array.from({ length: n }, (_, k) => `A${k} Y${k}`).join(' ');
  const devices = Array.from(
    { length: n },
    (_, k) => `MP${k} Y${k} A${k} VDD VDD pch W=2u L=0.25u\nMN${k} Y${k} A${k} GND GND nch W=1u L=0.25u`,
  );
  const path = join(dir, `row${n}.sp`);
  writeFileSync(path, `.subckt row${n} ${ports} VDD GND\n${devices.join('\n')}\n.ends\n`);
  return path;
}

describe('--max-inputs', () => {
  it('refuses a 17-input sweep by default and names the flag that allows it', async () => {
    const r = await railwise('check', inverterRow(17));
    expect(r.status).toBe(2);
    expect(r.out).toMatch(/17 inputs exceed the exhaustive-sweep limit of 16/);
    expect(r.out).toMatch(/--max-inputs 17 to sweep all 131,072 vectors/);
    expect(r.out).toMatch(/--sequence/);
  });

  it('sweeps all 2^17 vectors when asked, and each output inverts its input', async () => {
    const r = await railwise('check', inverterRow(17), '--max-inputs', '17');
    expect(r.status).toBe(0);
    expect(r.out).toMatch(/131,072 vectors|131072 vectors/);
  }, 60_000);

  it('gives a single vector of a 25-input cell as a one-step sequence', async () => {
    const row = inverterRow(25);
    const refused = await railwise('check', row, '--max-inputs', '24');
    expect(refused.status).toBe(2);
    expect(refused.out).toMatch(/no sweep takes more than 24.*--sequence/);
    const steps = Array.from({ length: 25 }, (_, k) => `A${k}=${k % 2}`).join(' ');
    const { status, body } = await json('check', row, '--sequence', steps);
    expect(status).toBe(0);
    const [step] = body['steps'] as { outputs: Record<string, string> }[];
    // An inverter's output is the complement of its input (common practice, no source).
    expect(step?.outputs).toMatchObject({ Y0: '1', Y1: '0', Y24: '1' });
  });

  it.each([
    [['25'], /--max-inputs 25: a sweep takes at most 24 inputs \(16,777,216 vectors\).*--sequence/],
    [['0'], /--max-inputs "0" is not a whole number of 1 or more/],
    [['many'], /--max-inputs "many"/],
  ])('--max-inputs %j is unusable (exit 2) and says why', async ([value], message) => {
    const r = await railwise('check', inverterRow(2), '--max-inputs', value ?? '');
    expect(r.status).toBe(2);
    expect(r.err).toMatch(message);
  });

  it('refuses --power past 20 inputs: its report lists every vector', async () => {
    const r = await railwise('check', inverterRow(21), '--max-inputs', '21', '--power');
    expect(r.status).toBe(2);
    expect(r.out).toMatch(/random activity sweeps every vector: 21 inputs exceed the limit of 20/);
  });
});
