/**
 * `--sequence` reads the one sequence text of docs/semantics.md §5, the same parser the step editor
 * uses (tests/panels/StepEditor.test.tsx): line breaks and ";" both end a step, and bad text is
 * refused with its line and column. Expected levels: a CMOS inverter, Y = !A (common practice).
 */
import { describe, expect, it } from 'vitest';
import { run } from '../../src/cli/main.ts';

const LIB = 'public/examples/tidewater-cells.sp';

async function check(sequence: string): Promise<{ status: number; body: Record<string, unknown> }> {
  let out = '';
  const io = { out: (t: string) => (out += t), err: () => {}, colour: false };
  const status = await run(['check', LIB, '--cell', 'tw_inv', '--json', '--sequence', sequence], io);
  return { status, body: JSON.parse(out) as Record<string, unknown> };
}

describe('--sequence', () => {
  it('takes one step per line as it takes steps separated by ";"', async () => {
    const lines = await check('A=0\nA=1\n-\nA=0\n');
    const semicolons = await check('A=0; A=1; -; A=0');
    const levels = (r: { body: Record<string, unknown> }) =>
      (r.body['steps'] as { outputs: { Y: string } }[]).map((s) => s.outputs.Y);
    expect(levels(lines)).toEqual(['1', '0', '0', '1']);
    expect(levels(semicolons)).toEqual(levels(lines));
  });

  it('refuses an empty step and a bad value with their place', async () => {
    const empty = await check('A=0;; A=1');
    expect(empty.status).toBe(2);
    expect(JSON.stringify(empty.body)).toContain('column 5: empty step');
    const bad = await check('A=0\nA=7');
    expect(bad.status).toBe(2);
    expect(JSON.stringify(bad.body)).toContain('line 2, column 3: the value of A must be 0, 1, X or Z');
  });
});
