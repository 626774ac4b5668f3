// Typed-array rows read here are in range by construction, so `!` marks them (no run-time cost).
/**
 * The table of all vectors of a sweep: one row per vector with its outputs, the kinds of finding it
 * raised, its supply current and static power; filtered and sorted for the side panel. It reads the
 * sweep's columns (core/analysis/sweepColumns.ts): filtering and sorting touch only typed arrays,
 * and a row object is built only for the rows on screen.
 */
import type { FindingKind, Level, SweepColumns } from '../analysis/report.ts';
import { detailOf, KIND_ORDER, levelAt, outputLevel, rowVector } from '../analysis/sweepColumns.ts';
import type { InputValue, InputVector } from '../model/design.ts';
import { LEVEL_0, LEVEL_1, LEVEL_Z } from '../solver/levels.ts';

export interface VectorRow {
  /** Position in the sweep: the id a row click selects. */
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

const bitOf = (kind: FindingKind): number => 1 << KIND_ORDER.indexOf(kind);

/** Row i of the sweep as the table shows it. */
export function vectorRow(s: SweepColumns, i: number): VectorRow {
  const mask = s.kinds[i]!;
  const findings = detailOf(s, i)?.findings ?? [];
  const named = (kind: FindingKind): Set<string> =>
    new Set(findings.filter((f) => f.kind === kind).flatMap((f) => f.nets));
  const mismatched = named('mismatch');
  const degraded = named('degraded');
  const outputs = Object.fromEntries(Array.from(s.outputs, (j, k) => [s.nets[j], outputLevel(s, k, i)]));
  return {
    index: i,
    inputs: rowVector(s, i),
    outputs,
    kinds: FINDING_ORDER.filter((k) => (mask & bitOf(k)) !== 0),
    errors: s.errors[i]!,
    warnings: s.warnings[i]!,
    mismatched: Object.keys(outputs).filter((o) => mismatched.has(o)),
    degraded: Object.keys(outputs).filter((o) => degraded.has(o)),
    supplyCurrent: s.supplyCurrent[i]!,
    staticPower: s.staticPower[i]!,
  };
}

/** Every row, built now: for small sweeps and tests (the panel builds only the rows on screen). */
export function vectorRows(s: SweepColumns): VectorRow[] {
  return Array.from({ length: s.count }, (_, i) => vectorRow(s, i));
}

/** Whether row i passes the filter, read from the columns alone. */
export function keepRow(s: SweepColumns, i: number, filter: RowFilter): boolean {
  switch (filter) {
    case 'all':
      return true;
    case 'problems':
      return s.kinds[i] !== 0;
    case 'errors':
      return s.errors[i]! > 0;
    default:
      return (s.kinds[i]! & bitOf(filter)) !== 0;
  }
}

/** Levels in the order a designer scans a column: 0, 1, then the problem values. */
function levelRank(code: number): number {
  return code === LEVEL_0 ? 0 : code === LEVEL_1 ? 1 : code === LEVEL_Z ? 2 : 3;
}

/** A number per row whose order is the sort's; null for the vector order itself. */
function sortKeys(s: SweepColumns, key: SortKey): Float64Array | null {
  if (key.startsWith('output:')) {
    const name = key.slice('output:'.length);
    const k = Array.from(s.outputs).findIndex((j) => s.nets[j] === name);
    if (k < 0) return null;
    return Float64Array.from({ length: s.count }, (_, i) => levelRank(levelAt(s, s.outputs[k]!, i)));
  }
  switch (key) {
    case 'severity':
      return Float64Array.from({ length: s.count }, (_, i) => s.errors[i]! * 65536 + s.warnings[i]!);
    case 'supplyCurrent':
      return s.supplyCurrent;
    case 'staticPower':
      return s.staticPower;
    default:
      return null;
  }
}

/**
 * The rows to show, in order: indices of the rows that pass the filter, sorted; ties keep vector
 * order, so the result is deterministic. Only typed arrays are read.
 */
export function arrangeRows(
  s: SweepColumns,
  options: { readonly filter?: RowFilter; readonly sort?: SortKey; readonly direction?: SortDirection } = {},
): Int32Array {
  const { filter = 'all', sort = 'vector', direction = 'ascending' } = options;
  const kept: number[] = [];
  for (let i = 0; i < s.count; i++) if (keepRow(s, i, filter)) kept.push(i);
  const order = Int32Array.from(kept);
  const keys = sortKeys(s, sort);
  const sign = direction === 'ascending' ? 1 : -1;
  if (keys !== null) order.sort((a, b) => sign * (keys[a]! - keys[b]!) || a - b);
  else if (sign < 0) order.reverse();
  return order;
}

/** How many rows of each kind there are: the counts shown beside the filter choices. */
export function kindCounts(s: SweepColumns): Map<FindingKind, number> {
  const tally = new Float64Array(KIND_ORDER.length);
  for (let i = 0; i < s.count; i++) {
    const mask = s.kinds[i]!;
    if (mask === 0) continue;
    for (let b = 0; b < KIND_ORDER.length; b++) if (mask & (1 << b)) tally[b]!++; // b < KIND_ORDER.length
  }
  const counts = new Map<FindingKind, number>();
  for (const k of FINDING_ORDER) {
    const n = tally[KIND_ORDER.indexOf(k)] ?? 0;
    if (n > 0) counts.set(k, n);
  }
  return counts;
}

/**
 * The row of a sweep whose inputs equal the vector, or null (an input at X, or Z when the sweep does
 * not leave inputs undriven): worked out from the truth-table order, no search.
 */
export function rowOfVector(s: SweepColumns, vector: InputVector): number | null {
  const digits: Readonly<Record<string, number>> = s.undriven ? { '0': 0, '1': 1, Z: 2 } : { '0': 0, '1': 1 };
  const base = s.undriven ? 3 : 2;
  let index = 0;
  for (const name of s.inputs) {
    const value = Object.hasOwn(vector, name) ? vector[name] : undefined;
    const digit = value === undefined ? undefined : digits[value];
    if (digit === undefined) return null;
    index = index * base + digit;
  }
  const row = index - s.first;
  return row >= 0 && row < s.count ? row : null;
}
