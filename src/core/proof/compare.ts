import { VectorChecker } from '../analysis/check.ts';
import type { Level, VectorReport } from '../analysis/report.ts';
import { compile } from '../compile/compile.ts';
import type { Netlist } from '../model/netlist.ts';
import { recordOf } from '../model/records.ts';
import { DEFAULT_TECHNOLOGY, type Technology } from '../model/technology.ts';
import { Cnf } from './cnf.ts';
import { bits } from './decide.ts';
import { CellEncoding } from './encodeCell.ts';
import { SatLimitError } from './sat.ts';
import { Search, type Replay, type Side } from './search.ts';

/** Two cells that cannot be compared: their pins differ. */
export class ComparisonError extends Error {
  override readonly name = 'ComparisonError';
}

export interface ComparedCell {
  readonly netlist: Netlist;
  readonly technology?: Technology;
}

/** The answer of `compareCells` (docs/semantics.md §10). */
export interface Comparison {
  /** True: the same output levels for all 2^n vectors; false: `vector` differs; null: undecided (`reason`). */
  readonly equivalent: boolean | null;
  readonly vector?: Readonly<Record<string, 0 | 1>>;
  /** Each cell's output levels at `vector`, from its replay in the engine. */
  readonly outputs?: {
    readonly a: Readonly<Record<string, Level>>;
    readonly b: Readonly<Record<string, Level>>;
  };
  readonly reason?: string;
}

/**
 * Proves that two cells with the same pins give every output the same level (0, 1, X or Z) for
 * every 0/1 input vector, or finds a vector where they differ, replayed in both.
 */
export function compareCells(
  a: ComparedCell,
  b: ComparedCell,
  options: { readonly maxControls?: number } = {},
): Comparison {
  samePins(a.netlist, b.netlist);
  const cnf = new Cnf();
  const inputs = new Map<string, number>();
  const encode = (side: ComparedCell): Side => {
    const technology = side.technology ?? DEFAULT_TECHNOLOGY;
    const cell = new CellEncoding(cnf, compile(side.netlist, technology), inputs, options);
    return { cell, checker: new VectorChecker(side.netlist, { technology }) };
  };
  const sides = [encode(a), encode(b)] as const;
  const outputs = a.netlist.outputs;
  const netOf = (cell: CellEncoding, name: string): number => cell.compiled.netIndex.get(name) as number;
  const differ = cnf.or(
    outputs.map((name) => {
      const [la, lb] = [
        sides[0].cell.level(netOf(sides[0].cell, name)),
        sides[1].cell.level(netOf(sides[1].cell, name)),
      ];
      return cnf.or([cnf.xor(la.l0, lb.l0), cnf.xor(la.l1, lb.l1), cnf.xor(la.lz, lb.lz)]);
    }),
  );
  const groups = sides.map(({ cell }) => cell.cone(outputs.map((name) => netOf(cell, name))));
  const confirm = ({ rows: [ra, rb] }: Replay): boolean =>
    outputs.some((o) => ra?.outputs[o] !== rb?.outputs[o]);
  try {
    const outcome = new Search(cnf, sides, a.netlist.inputs).find(
      differ,
      { groups, bridges: false },
      confirm,
    );
    switch (outcome.kind) {
      case 'holds':
        return { equivalent: true };
      case 'unknown':
        return { equivalent: null, reason: outcome.reason };
      case 'violated': {
        const [ra, rb] = outcome.replay.rows;
        const levels = (row: VectorReport | undefined): Record<string, Level> =>
          recordOf(
            outputs.flatMap((o) => (row?.outputs[o] === undefined ? [] : [[o, row.outputs[o]] as const])),
          );
        return { equivalent: false, vector: bits(outcome.replay), outputs: { a: levels(ra), b: levels(rb) } };
      }
    }
  } catch (e) {
    if (e instanceof SatLimitError) return { equivalent: null, reason: e.message };
    throw e;
  }
}

/** Refuses cells whose input or output pins differ, naming the pins. */
function samePins(a: Netlist, b: Netlist): void {
  for (const [kind, x, y] of [
    ['inputs', a.inputs, b.inputs],
    ['outputs', a.outputs, b.outputs],
  ] as const) {
    const onlyA = x.filter((n) => !y.includes(n));
    const onlyB = y.filter((n) => !x.includes(n));
    if (onlyA.length + onlyB.length === 0) continue;
    const list = (names: readonly string[], cell: string): string =>
      names.length ? `${cell} only: ${names.slice(0, 8).join(', ')}` : '';
    const parts = [list(onlyA, a.name), list(onlyB, b.name)].filter(Boolean).join('; ');
    throw new ComparisonError(
      `the cells' ${kind} differ (${parts}): equivalence compares cells with the same pins`,
    );
  }
}
