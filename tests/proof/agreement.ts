import { checkSweep } from '../../src/core/analysis/check.ts';
import { evaluateExpression } from '../../src/core/expect/evaluate.ts';
import { parseExpectation } from '../../src/core/expect/parse.ts';
import { expressionNames } from '../../src/core/expect/names.ts';
import type { Netlist } from '../../src/core/model/netlist.ts';
import { proveCell, type ProofOptions } from '../../src/core/proof/prove.ts';
import { violates } from '../../src/core/proof/properties.ts';
import type { PropertyResult } from '../../src/core/proof/decide.ts';

/** How a proof's answers compare with the exhaustive sweep of the same cell. */
export interface Agreement {
  /** Answers that contradict the sweep (should be none), described. */
  readonly wrong: string[];
  /** Properties left undecided. */
  readonly unknown: PropertyResult[];
  readonly decided: number;
}

/**
 * Proves a cell and checks every answer against the sweep: "holds" exactly when no vector of the
 * sweep violates the property, and every counterexample a vector where the sweep shows the violation.
 */
export function agreement(netlist: Netlist, options: ProofOptions = {}): Agreement {
  const proof = proveCell(netlist, options);
  const sweep = checkSweep(netlist, { technology: options.technology, expectations: options.expectations });
  const names = expressionNames(netlist);
  const expected = (output: string | null, vector: Record<string, '0' | '1' | 'X' | 'Z'>) => {
    const text = output === null ? undefined : options.expectations?.[output];
    return text === undefined
      ? undefined
      : evaluateExpression(parseExpectation(output as string, text, names), vector);
  };
  const wrong: string[] = [];
  const unknown: PropertyResult[] = [];
  for (const p of proof.properties) {
    const bad = sweep.vectors!.flatMap((row, i) =>
      violates(p, row, expected(p.output, row.inputs)) ? [i] : [],
    );
    const what = `${p.property}(${p.output ?? 'cell'})`;
    if (p.holds === null) unknown.push(p);
    else if (p.holds && bad.length > 0)
      wrong.push(`${what} said to hold, but the sweep violates it at vector ${bad[0]}`);
    else if (!p.holds) {
      const index = netlist.inputs.reduce((k, n) => k * 2 + (p.vector![n] ?? 0), 0);
      if (!bad.includes(index))
        wrong.push(`${what}: counterexample ${index} is no violation in the sweep (${bad.length} are)`);
      else if (JSON.stringify(p.findings) !== JSON.stringify(sweep.vectors![index].findings))
        wrong.push(`${what}: the replay's findings differ from the sweep's at vector ${index}`);
    }
  }
  return { wrong, unknown, decided: proof.properties.length - unknown.length };
}
