import type { Finding, FindingKind, VectorReport } from '../analysis/report.ts';
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

/** The findings that show each property violated in a vector's report. */
const SHOWN_BY: Record<ProofProperty, readonly FindingKind[]> = {
  function: ['mismatch'],
  'no-static-current': ['static-current', 'short'],
  'no-contention': ['contention'],
  'no-floating': ['floating'],
  'no-unknown': ['unknown'],
  'no-degraded': ['degraded'],
};

/** The findings of a vector that are about this property (for its output, if it has one). */
export function findingsAbout(q: PropertyQuery, findings: readonly Finding[]): Finding[] {
  const cellWide = q.output === null;
  return findings.filter(
    (f) => SHOWN_BY[q.property].includes(f.kind) && (cellWide || f.nets[0] === q.output),
  );
}

/**
 * Whether one checked vector violates a property, read from the same report a sweep gives that
 * vector: its findings, and for `no-unknown` the output's level (an error finding on the output
 * stands in for its `unknown` finding, docs/semantics.md §3). `expected` is the output's expected
 * value at that vector.
 */
export function violates(q: PropertyQuery, row: VectorReport, expected: ExpectedValue | undefined): boolean {
  if (q.property === 'no-unknown')
    return q.output !== null && own(row.outputs, q.output) === 'X' && expected !== 'X';
  return findingsAbout(q, row.findings).length > 0;
}
