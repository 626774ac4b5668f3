/**
 * The table of all vectors (or sequence steps): one row per vector with its outputs, the kinds of
 * finding it raised, its supply current and static power; sorted and filtered for the side panel.
 */
import type { CheckReport, FindingKind, Level, Severity, VectorReport } from '../analysis/report.ts';
import type { InputValue } from '../model/design.ts';

export interface VectorRow {
  /** Position in the report's vectors (or steps): the id a row click selects. */
  readonly index: number;
  readonly inputs: Readonly<Record<string, InputValue>>;
  readonly outputs: Readonly<Record<string, Level>>;
  /** Distinct finding kinds of this vector, in the order of FINDING_ORDER. */
  readonly kinds: readonly FindingKind[];
  readonly errors: number;
  readonly warnings: number;
  /** Outputs that differ from their expected function. */
  readonly mismatched: readonly string[];
  /** Outputs whose level arrives through a threshold drop (a `degraded` finding names them). */
  readonly degraded: readonly string[];
  readonly supplyCurrent: number;
  readonly staticPower: number;
}

/** Most serious first: the order flags are listed in a row. */
export const FINDING_ORDER: readonly FindingKind[] = [
  'short',
  'contention',
  'no-steady-state',
  'mismatch',
  'unknown',
  'floating',
  'static-current',
  'degraded',
  'charge-sharing',
  'rule',
  'limit',
];

export type SortKey = 'vector' | 'severity' | 'supplyCurrent' | 'staticPower' | `output:${string}`;
export type SortDirection = 'ascending' | 'descending';
/** 'problems' keeps vectors with any finding; 'errors' only those with an error-severity finding. */
export type RowFilter = 'all' | 'problems' | 'errors' | FindingKind;

/** How the table is arranged: kept in the simulation slice so it survives re-renders and re-solves. */
export interface TableView {
  readonly sort: SortKey;
  readonly direction: SortDirection;
  readonly filter: RowFilter;
}

/** The report's per-vector results: sweep vectors, or sequence steps. */
export function reportRows(report: CheckReport): VectorReport[] {
  return [...(report.vectors ?? report.steps ?? [])];
}

function countSeverity(vector: VectorReport, severity: Severity): number {
  return vector.findings.filter((f) => f.severity === severity).length;
}

export function vectorRow(vector: VectorReport, index: number): VectorRow {
  const present = new Set(vector.findings.map((f) => f.kind));
  const named = (kind: FindingKind): Set<string> =>
    new Set(vector.findings.filter((f) => f.kind === kind).flatMap((f) => f.nets));
  const mismatched = named('mismatch');
  const degraded = named('degraded');
  return {
    index,
    inputs: vector.inputs,
    outputs: vector.outputs,
    kinds: FINDING_ORDER.filter((k) => present.has(k)),
    errors: countSeverity(vector, 'error'),
    warnings: countSeverity(vector, 'warning'),
    mismatched: Object.keys(vector.outputs).filter((o) => mismatched.has(o)),
    degraded: Object.keys(vector.outputs).filter((o) => degraded.has(o)),
    supplyCurrent: vector.supplyCurrent,
    staticPower: vector.staticPower,
  };
}

export function vectorRows(report: CheckReport): VectorRow[] {
  return reportRows(report).map(vectorRow);
}

export function keepRow(row: VectorRow, filter: RowFilter): boolean {
  switch (filter) {
    case 'all':
      return true;
    case 'problems':
      return row.kinds.length > 0;
    case 'errors':
      return row.errors > 0;
    default:
      return row.kinds.includes(filter);
  }
}

/** Levels in the order a designer scans a column: 0, 1, then the problem values. */
const LEVEL_RANK: Readonly<Record<Level, number>> = { '0': 0, '1': 1, Z: 2, X: 3 };

function compareBy(key: SortKey, a: VectorRow, b: VectorRow): number {
  if (key.startsWith('output:')) {
    const name = key.slice('output:'.length);
    return (LEVEL_RANK[a.outputs[name] ?? 'X'] ?? 0) - (LEVEL_RANK[b.outputs[name] ?? 'X'] ?? 0);
  }
  switch (key) {
    case 'severity':
      return a.errors - b.errors || a.warnings - b.warnings;
    case 'supplyCurrent':
      return a.supplyCurrent - b.supplyCurrent;
    case 'staticPower':
      return a.staticPower - b.staticPower;
    default:
      return a.index - b.index;
  }
}

/** A new array, filtered then sorted; ties keep vector order, so the result is deterministic. */
export function arrangeRows(
  rows: readonly VectorRow[],
  options: { readonly filter?: RowFilter; readonly sort?: SortKey; readonly direction?: SortDirection } = {},
): VectorRow[] {
  const { filter = 'all', sort = 'vector', direction = 'ascending' } = options;
  const sign = direction === 'ascending' ? 1 : -1;
  return rows
    .filter((r) => keepRow(r, filter))
    .sort((a, b) => sign * compareBy(sort, a, b) || a.index - b.index);
}

/** How many rows of each kind there are: the counts shown beside the filter choices. */
export function kindCounts(rows: readonly VectorRow[]): Map<FindingKind, number> {
  const counts = new Map<FindingKind, number>();
  for (const row of rows) for (const k of row.kinds) counts.set(k, (counts.get(k) ?? 0) + 1);
  return counts;
}

/** The row of a report whose inputs equal the vector, or null (e.g. a vector with an X input). */
export function rowOfVector(
  report: CheckReport,
  vector: Readonly<Record<string, InputValue>>,
): number | null {
  const rows = reportRows(report);
  const index = rows.findIndex((r) => report.inputs.every((name) => r.inputs[name] === vector[name]));
  return index < 0 ? null : index;
}
