/**
 * `unknown` findings and held values in expected functions (docs/semantics.md §3 and §4): a checker
 * never passes an output it could not decide. Our own rules; the latch behaviour they check is the
 * textbook one (active-low SR latch from NAND gates: W&H 4th ed., sequential circuits, ch. 10 from
 * memory; common practice).
 */
import { describe, expect, it } from 'vitest';
import { checkSequence, checkSweep } from '../../src/core/analysis/check.ts';
import { run } from '../../src/cli/main.ts';
import { circuit } from '../../src/core/model/builder.ts';
import { inverter } from '../../src/core/starters/combinational.ts';
import { fixtureCell } from '../solver/fixtures.ts';
import { leading } from '../helpers.ts';

const LATCH = 'tests/solver/fixtures/nand-latch.sp';
const HELD = { Q: '!SB | RB & Q', QB: '!RB | SB & QB' };
const latch = fixtureCell('nand-latch.sp').netlist;

describe('an output at X is an unknown finding', () => {
  it('a latch holding in a sweep, with no expected function: an error per output, naming its memory', () => {
    const report = checkSweep(latch);
    expect(report.summary.unknown).toBe(2);
    expect(report.summary.errors).toBe(2);
    const [q, qb] = leading(report.findings, 2);
    expect([q.vector, q.severity, qb.nets[0]]).toEqual([3, 'error', 'QB']);
    expect(q.nets).toEqual(['Q', 'QB']);
    expect(q.message).toMatch(/^unknown at SB=1 RB=1: Q is X: several steady states on Q, QB \(stored state/);
    expect(q.message).toContain('Q = S | !R & Q');
  });

  it('an expected function that names the output says it holds: the X is allowed, as a warning', () => {
    const report = checkSweep(latch, { expectations: HELD });
    expect(report.summary.errors).toBe(0);
    expect(report.findings.map((f) => `${f.kind}:${f.severity}:${f.vector}`)).toEqual([
      'unknown:warning:3',
      'unknown:warning:3',
    ]);
    expect(report.findings[0]!.message).toContain('as its expected function allows');
  });

  it('in a sequence the held value is the previous step: set, hold, reset, hold pass; a wrong hold fails', () => {
    const steps = [
      { SB: '0', RB: '1' },
      { SB: '1', RB: '1' },
      { SB: '1', RB: '0' },
      { SB: '1', RB: '1' },
    ] as const;
    expect(checkSequence(latch, [...steps], { expectations: HELD }).findings).toEqual([]);
    const wrong = checkSequence(latch, [...steps], { expectations: { Q: '!SB' } });
    expect(wrong.findings.map((f) => `${f.kind}:${f.vector}`)).toEqual(['mismatch:1']);
  });

  it('an input at X: a warning that says so and names the input', () => {
    const [f] = leading(checkSequence(inverter, [{ A: 'X' }]).findings, 1);
    expect([f.kind, f.severity]).toEqual(['unknown', 'warning']);
    expect(f.message).toBe(
      'unknown at A=X: Y is X (an input is X or undriven): input A at X (through N1, P1)',
    );
    // An error that names the output already fails the vector: no second finding.
    const expected = checkSequence(inverter, [{ A: 'X' }], { expectations: { Y: '1' } });
    expect(expected.findings.map((x) => x.kind)).toEqual(['mismatch']);
  });
});

describe('names in expected functions', () => {
  it('an output called Z is not a held value: Z keeps meaning high-impedance', () => {
    const tristate = circuit('tbuf')
      .rails()
      .input('A', 'EN')
      .output('Z')
      .pmos('PI', { g: 'EN', d: 'ENb', s: 'VDD' })
      .nmos('NI', { g: 'EN', d: 'ENb', s: 'GND' })
      .nmos('NT', { g: 'EN', d: 'A', s: 'Z' })
      .pmos('PT', { g: 'ENb', d: 'A', s: 'Z' })
      .build();
    const report = checkSweep(tristate, { expectations: { Z: 'EN ? A : Z' } });
    expect(report.summary.floating).toBe(0);
    expect(report.summary.mismatch).toBe(0);
  });
});

describe('the command line shows it', () => {
  async function railwise(...argv: string[]): Promise<{ status: number; out: string }> {
    let out = '';
    const status = await run(argv, { out: (t) => (out += `${t}\n`), err: () => {}, colour: false });
    return { status, out };
  }

  it('text: the row is marked, the finding listed, the verdict FAIL and the exit status 1', async () => {
    const { status, out } = await railwise('check', LATCH);
    expect(status).toBe(1);
    expect(out).toMatch(/1 {2}1 {2}│ X X {2}│ 0 A {7}✗ unknown/);
    expect(out).toContain('error   unknown: unknown at SB=1 RB=1: Q is X');
    expect(out).toContain('FAIL  4 vectors, 2 errors, 0 warnings (unknown 2)');
  });

  it('JSON: the summary counts them; with the held functions the cell passes', async () => {
    const failing = await railwise('check', LATCH, '--json');
    const body = JSON.parse(failing.out) as { summary: Record<string, number> };
    expect(body.summary).toMatchObject({ errors: 2, unknown: 2 });
    const held = await railwise(
      'check',
      LATCH,
      '--expect',
      'Q = !SB | RB & Q',
      '--expect',
      'QB = !RB | SB & QB',
    );
    expect(held.status).toBe(0);
  });
});
