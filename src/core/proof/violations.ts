import type { Expr } from '../expect/parse.ts';
import { FALSE, type Cnf } from './cnf.ts';
import type { CellEncoding } from './encodeCell.ts';
import { encodeExpected, type ExpectedLits } from './expected.ts';
import type { PropertyQuery } from './properties.ts';

/** A property put to the solver: when it is violated, and which part of the cell decides it. */
export interface PropertyCheck extends PropertyQuery {
  /** True exactly for the vectors that violate the property, wherever the encoding describes the engine. */
  readonly violated: number;
  /** The groups it depends on. */
  readonly groups: readonly number[];
  /** Whether it also reads the devices between two sources (bridges). */
  readonly bridges: boolean;
  /** The output's expected function, if any (for the replay's `no-unknown` test). */
  readonly expected: Expr | null;
}

/**
 * Every property of a cell, in report order: each output's function (where one is expected), then
 * static current and contention, then per output floating, unknown and degraded.
 */
export function propertyChecks(
  cnf: Cnf,
  cell: CellEncoding,
  expectations: ReadonlyMap<string, Expr>,
): PropertyCheck[] {
  const c = cell.compiled;
  const outputs = c.netlist.outputs.map((name, i) => {
    const expr = expectations.get(name) ?? null;
    const lits: ExpectedLits | null = expr && encodeExpected(cnf, expr, (pin) => cell.input(pin));
    const net = c.outputNets[i]!; // one net per output, in order
    return { name, net, expr, lits, groups: cell.cone([net]) };
  });
  const all = cell.allGroups();
  type Output = (typeof outputs)[number];
  const perOutput = (
    property: PropertyCheck['property'],
    violated: (o: Output) => number,
    among: readonly Output[] = outputs,
  ): PropertyCheck[] =>
    among.map((o) => ({
      property,
      output: o.name,
      violated: violated(o),
      groups: o.groups,
      bridges: false,
      expected: o.expr,
    }));
  const level = (o: Output) => cell.level(o.net);
  const expected = outputs.filter((o) => o.lits !== null);
  return [
    ...perOutput(
      'function',
      (o) => {
        const l = level(o);
        const e = o.lits as ExpectedLits;
        return cnf.or([cnf.and([e.e0, -l.l0]), cnf.and([e.e1, -l.l1]), cnf.and([e.ez, -l.lz])]);
      },
      expected,
    ),
    {
      property: 'no-static-current',
      output: null,
      violated: cell.current(),
      groups: all,
      bridges: true,
      expected: null,
    },
    {
      property: 'no-contention',
      output: null,
      violated: cell.contention(),
      groups: all,
      bridges: false,
      expected: null,
    },
    ...perOutput('no-floating', (o) => cnf.and([level(o).lz, -(o.lits?.ez ?? FALSE)])),
    ...perOutput('no-unknown', (o) => {
      const l = level(o);
      const allowsX = o.lits === null ? FALSE : cnf.and([-o.lits.e0, -o.lits.e1, -o.lits.ez]);
      return cnf.and([-l.l0, -l.l1, -l.lz, -allowsX]);
    }),
    ...perOutput('no-degraded', (o) => level(o).degraded),
  ];
}
