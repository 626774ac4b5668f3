/** The railwise command run in-process (fast), with its output captured; shared by the CLI tests. */
import { run } from '../../src/cli/main.ts';

export async function railwise(...argv: string[]): Promise<{ status: number; out: string; err: string }> {
  let out = '';
  let err = '';
  const status = await run(argv, {
    out: (t) => (out += `${t}\n`),
    err: (t) => (err += `${t}\n`),
    colour: false,
  });
  return { status, out, err };
}

/** The same with `--json`, the standard output parsed. */
export async function json(...argv: string[]): Promise<{ status: number; body: Record<string, unknown> }> {
  const r = await railwise(...argv, '--json');
  return { status: r.status, body: JSON.parse(r.out) as Record<string, unknown> };
}
