import type { VectorReport } from '../analysis/report.ts';
import type { ExpectedValue } from '../expect/evaluate.ts';
import { own } from '../model/records.ts';

/**
 * What a proof asks of a cell for every 0/1 input vector (docs/semantics.md §10). Per output:
 * `function` (its level equals its expected function), `no-floating` (not Z unless Z is expected),
 * `no-unknown` (not X unless its expected function allows X), `no-degraded` (no threshold drop);
 * for the whole cell: `no-static-current` (no static current path and no short) and
 * `no-contention`.
 */
export type ProofProperty =
  'function' | 'no-static-current' | 'no-contention' | 'no-floating' | 'no-unknown' | 'no-degraded';

export interface PropertyQuery {
  readonly property: ProofProperty;
  /** The output it is about; null for properties of the whole cell. */
  readonly output: string | null;
}

/**
 * Whether one checked vector violates a property, read from the same report a sweep gives that
 * vector (its findings and output levels). `expected` is the output's expected value at that vector.
 */
export function violates(q: PropertyQuery, row: VectorReport, expected: ExpectedValue | undefined): boolean {
  const about = (kind: string): boolean =>
    row.findings.some((f) => f.kind === kind && f.nets[0] === q.output);
  switch (q.property) {
    case 'function':
      return about('mismatch');
    case 'no-static-current':
      return row.findings.some((f) => f.kind === 'static-current' || f.kind === 'short');
    case 'no-contention':
      return row.findings.some((f) => f.kind === 'contention');
    case 'no-floating':
      return about('floating');
    case 'no-unknown':
      return q.output !== null && own(row.outputs, q.output) === 'X' && expected !== 'X';
    case 'no-degraded':
      return about('degraded');
  }
}
