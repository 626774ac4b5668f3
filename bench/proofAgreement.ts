/**
 * How a proof's answers compare with the exhaustive sweep of the same cell: "holds" exactly when no
 * vector of the sweep violates the property, and every counterexample a vector where the sweep shows
 * the violation with the same findings. Used by the proof rows of the benchmark and by the tests.
 */
import type { CheckReport } from '../src/core/analysis/report.ts';
import { reportRows } from '../src/core/analysis/sweepColumns.ts';
import { evaluateExpression, type ExpectedValue } from '../src/core/expect/evaluate.ts';
import { expressionNames } from '../src/core/expect/names.ts';
import { parseExpectation } from '../src/core/expect/parse.ts';
import type { Netlist } from '../src/core/model/netlist.ts';
import type { PropertyResult } from '../src/core/proof/decide.ts';
import { violates } from '../src/core/proof/properties.ts';
import type { ProofReport } from '../src/core/proof/prove.ts';

export interface Agreement {
  /** Answers that contradict the sweep (should be none), described. */
  readonly wrong: string[];
  /** Properties left undecided. */
  readonly unknown: PropertyResult[];
  readonly decided: number;
}

type Vector = Readonly<Record<string, '0' | '1' | 'X' | 'Z'>>;

export function agreementOf(
  netlist: Netlist,
  expectations: Readonly<Record<string, string>> | undefined,
  proof: ProofReport,
  sweep: CheckReport,
): Agreement {
  const names = expressionNames(netlist);
  const expected = (output: string | null, vector: Vector): ExpectedValue | undefined => {
    const text = output === null ? undefined : expectations?.[output];
    return output === null || text === undefined
      ? undefined
      : evaluateExpression(parseExpectation(output, text, names), vector);
  };
  const rows = reportRows(sweep);
  const wrong: string[] = [];
  const unknown: PropertyResult[] = [];
  for (const p of proof.properties) {
    const bad = rows.flatMap((row, i) => (violates(p, row, expected(p.output, row.inputs)) ? [i] : []));
    const what = `${p.property}(${p.output ?? 'cell'})`;
    if (p.holds === null) unknown.push(p);
    else if (p.holds && bad.length > 0)
      wrong.push(`${what} said to hold, but the sweep violates it at vector ${bad[0]}`);
    else if (!p.holds) {
      const index = netlist.inputs.reduce((k, n) => k * 2 + (p.vector?.[n] ?? 0), 0);
      if (!bad.includes(index))
        wrong.push(`${what}: counterexample ${index} is no violation in the sweep (${bad.length} are)`);
      else if (JSON.stringify(p.findings) !== JSON.stringify(rows[index]?.findings))
        wrong.push(`${what}: the replay's findings differ from the sweep's at vector ${index}`);
    }
  }
  return { wrong, unknown, decided: proof.properties.length - unknown.length };
}
