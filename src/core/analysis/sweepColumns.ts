/**
 * A sweep's results in columns: typed arrays with one entry (or one bit) per vector, and the detail
 * of a vector (findings, current paths, voltages off the rails) only for the vectors that have any.
 * One type serves the command line (block by block as the sweep runs), the worker (its buffers handed
 * to the page without copying) and the table (rows read by index). A row in the report's shape
 * (`VectorReport`, docs/semantics.md §5) is built on demand by `sweepRow`.
 */
import type { InputVector } from '../model/design.ts';
import { levelName, LEVEL_0, LEVEL_1 } from '../solver/levels.ts';
import type {
  CheckReport,
  CurrentPath,
  Finding,
  FindingKind,
  Level,
  PackedDetails,
  RowDetail,
  SweepColumns,
  VectorReport,
} from './report.ts';
import { sweepVector } from './vectors.ts';

/** Finding kinds in the order of their bits in `SweepColumns.kinds`. */
export const KIND_ORDER: readonly FindingKind[] = [
  'short',
  'static-current',
  'floating',
  'contention',
  'degraded',
  'charge-sharing',
  'no-steady-state',
  'mismatch',
  'unknown',
  'rule',
  'limit',
];

export function kindBit(kind: FindingKind): number {
  return 1 << KIND_ORDER.indexOf(kind);
}

/** Level code of reported net j (its position in `nets`) at row i. */
export function levelAt(s: SweepColumns, j: number, i: number): number {
  const w = i >> 5;
  const b = i & 31;
  const low = (s.levels[2 * j * s.words + w]! >>> b) & 1;
  const high = (s.levels[(2 * j + 1) * s.words + w]! >>> b) & 1;
  return low | (high << 1);
}

/** The volts a level stands for when nothing says otherwise: 0 V, VDD, or unknown. */
export function plainVolts(code: number, vdd: number): number {
  return code === LEVEL_0 ? 0 : code === LEVEL_1 ? vdd : NaN;
}

/** The input vector of row i. */
export function rowVector(s: SweepColumns, i: number): InputVector {
  return sweepVector(s.inputs, s.first + i, s.undriven);
}

/** Details unpacked so far, so a row read twice gives the same objects. */
const unpacked = new WeakMap<PackedDetails, Map<number, RowDetail>>();

function detailAt(details: SweepColumns['details'], k: number): RowDetail {
  if (Array.isArray(details)) {
    const d = (details as readonly RowDetail[])[k];
    if (d === undefined) throw new RangeError(`no detail ${k}`);
    return d;
  }
  const packed = details as PackedDetails;
  let cache = unpacked.get(packed);
  if (cache === undefined) unpacked.set(packed, (cache = new Map()));
  let d = cache.get(k);
  if (d === undefined) cache.set(k, (d = unpackDetail(packed, k)));
  return d;
}

/** How many rows have a detail. */
export function detailCount(s: SweepColumns): number {
  return Array.isArray(s.details) ? s.details.length : (s.details as PackedDetails).starts.length - 1;
}

export function detailOf(s: SweepColumns, i: number): RowDetail | null {
  const k = s.detail[i];
  return k === undefined || k < 0 ? null : detailAt(s.details, k);
}

/** Output pin k's level at row i. */
export function outputLevel(s: SweepColumns, k: number, i: number): Level {
  const j = s.outputs[k];
  if (j === undefined) throw new RangeError(`no output ${k}`);
  return levelName(levelAt(s, j, i));
}

/** Row i in the report's shape, with the key order the command line has always printed. */
export function sweepRow(s: SweepColumns, i: number): VectorReport {
  const d = detailOf(s, i);
  const volts = (j: number): number | null => {
    const v = d?.voltages ? (d.voltages[j] ?? NaN) : plainVolts(levelAt(s, j, i), s.vdd);
    return Number.isNaN(v) ? null : v;
  };
  // Object.fromEntries defines each name as its own key, also one called __proto__.
  return {
    inputs: rowVector(s, i),
    outputs: Object.fromEntries(Array.from(s.outputs, (j, k) => [s.nets[j], outputLevel(s, k, i)])),
    voltages: Object.fromEntries(s.nets.map((net, j) => [net, volts(j)])),
    supplyCurrent: s.supplyCurrent[i] ?? NaN,
    staticPower: s.staticPower[i] ?? NaN,
    currentPaths: d?.currentPaths ?? [],
    findings: d?.findings ?? [],
  };
}

/** Every row, built now: for tests and small sweeps (a big one is read row by row). */
export function sweepRows(s: SweepColumns): VectorReport[] {
  return Array.from({ length: s.count }, (_, i) => sweepRow(s, i));
}

/** Every row's findings in row order: the per-vector part of a report's findings. */
export function* sweepFindings(s: SweepColumns): Generator<Finding> {
  for (let k = 0; k < detailCount(s); k++) yield* detailAt(s.details, k).findings;
}

/** The columns with their details packed, and the buffers that can move to another thread. */
export function packedForTransfer(s: SweepColumns): { columns: SweepColumns; buffers: ArrayBuffer[] } {
  const details = Array.isArray(s.details) ? packDetails(s.details as readonly RowDetail[]) : s.details;
  const arrays = [
    s.outputs,
    s.levels,
    s.supplyCurrent,
    s.staticPower,
    s.kinds,
    s.errors,
    s.warnings,
    s.detail,
  ];
  const buffers = [...arrays, ...('starts' in details ? [details.starts] : [])].map(
    (a) => a.buffer as ArrayBuffer,
  );
  return { columns: { ...s, details }, buffers: [...new Set(buffers)] };
}

/** How many rows a report has: a sweep's vectors kept, or a sequence's steps. */
export function reportRowCount(report: Pick<CheckReport, 'sweep' | 'steps'>): number {
  return report.steps?.length ?? report.sweep?.count ?? 0;
}

/** Row i of a report, built on demand for a sweep. */
export function reportRow(report: Pick<CheckReport, 'sweep' | 'steps'>, i: number): VectorReport {
  if (report.steps !== undefined) {
    const step = report.steps[i];
    if (step === undefined) throw new RangeError(`no row ${i}`);
    return step;
  }
  if (report.sweep === undefined || i >= report.sweep.count) throw new RangeError(`no row ${i}`);
  return sweepRow(report.sweep, i);
}

/** Every row of a report, built now (tests, small reports). */
export function reportRows(report: Pick<CheckReport, 'sweep' | 'steps'>): VectorReport[] {
  return Array.from({ length: reportRowCount(report) }, (_, i) => reportRow(report, i));
}

interface DetailJson {
  readonly findings: readonly Finding[];
  readonly currentPaths: readonly CurrentPath[];
  readonly voltages: readonly (number | null)[] | null;
}

export function packDetails(details: readonly RowDetail[]): PackedDetails {
  const pieces = details.map((d) =>
    JSON.stringify({
      findings: d.findings,
      currentPaths: d.currentPaths,
      voltages: d.voltages === null ? null : Array.from(d.voltages, (v) => (Number.isNaN(v) ? null : v)),
    } satisfies DetailJson),
  );
  const starts = new Int32Array(pieces.length + 1);
  pieces.forEach((p, k) => (starts[k + 1] = starts[k]! + p.length));
  return { text: pieces.join(''), starts };
}

export function unpackDetail(packed: PackedDetails, k: number): RowDetail {
  const d = JSON.parse(packed.text.slice(packed.starts[k], packed.starts[k + 1])) as DetailJson;
  const voltages = d.voltages === null ? null : Float64Array.from(d.voltages, (v) => v ?? NaN);
  return { findings: d.findings, currentPaths: d.currentPaths, voltages };
}
