/**
 * Writes solved vectors into the columns of a sweep (sweepColumns.ts): a row's levels as bits, its
 * currents as numbers, and a detail record only when the row has findings, current paths or a
 * reported voltage its level does not imply. A plain row allocates nothing.
 */
import type { CompiledNetlist } from '../compile/compile.ts';
import type { SolveResult } from '../solver/simulator.ts';
import { currentPathsOf } from './findingParts.ts';
import { own } from '../model/records.ts';
import { LEVEL_0, LEVEL_1, LEVEL_X, LEVEL_Z } from '../solver/levels.ts';
import type { CurrentPath, Finding, Level, RowDetail, SweepColumns, VectorReport } from './report.ts';
import { kindBit, plainVolts } from './sweepColumns.ts';

/** What every block of one sweep shares. */
export interface RecorderShape {
  readonly inputs: readonly string[];
  readonly undriven: boolean;
  readonly reported: ReportedNets;
  readonly vdd: number;
}

/** Reported nets (outputs, or every net) as compiled net numbers, and where the outputs are among them. */
export interface ReportedNets {
  readonly names: readonly string[];
  readonly nets: Int32Array;
  readonly outputs: Int32Array;
}

export function reportedNets(c: CompiledNetlist, allNets: boolean): ReportedNets {
  if (!allNets) {
    const outputs = Int32Array.from(c.outputNets.keys());
    return { names: c.netlist.outputs, nets: Int32Array.from(c.outputNets), outputs };
  }
  const nets = Int32Array.from(c.netNames.keys());
  return { names: c.netNames, nets, outputs: Int32Array.from(c.outputNets) };
}

const MAX_COUNT = 0xffff;
const LEVEL_CODES: Readonly<Record<Level, number>> = { '0': LEVEL_0, '1': LEVEL_1, X: LEVEL_X, Z: LEVEL_Z };

export class SweepRecorder {
  private readonly reported: ReportedNets;
  private readonly words: number;
  private readonly levels: Int32Array;
  private readonly supplyCurrent: Float64Array;
  private readonly staticPower: Float64Array;
  private readonly kinds: Uint16Array;
  private readonly errors: Uint16Array;
  private readonly warnings: Uint16Array;
  private readonly detail: Int32Array;
  private readonly details: RowDetail[] = [];
  /** The row being written: each reported net's level code and volts. */
  private readonly codes: Uint8Array;
  private readonly volts: Float64Array;
  private count = 0;

  constructor(
    private readonly shape: RecorderShape,
    /** The sweep's number of this block's first vector, and how many rows it can hold. */
    private readonly first: number,
    readonly capacity: number,
  ) {
    this.reported = shape.reported;
    this.words = Math.ceil(capacity / 32);
    this.levels = new Int32Array(2 * this.reported.nets.length * this.words);
    this.supplyCurrent = new Float64Array(capacity);
    this.staticPower = new Float64Array(capacity);
    this.kinds = new Uint16Array(capacity);
    this.errors = new Uint16Array(capacity);
    this.warnings = new Uint16Array(capacity);
    this.detail = new Int32Array(capacity).fill(-1);
    this.codes = new Uint8Array(this.reported.nets.length);
    this.volts = new Float64Array(this.reported.nets.length);
  }

  isFull(): boolean {
    return this.count >= this.capacity;
  }

  /** The next row: a solved vector and its findings. */
  add(r: SolveResult, findings: readonly Finding[]): void {
    const { nets } = this.reported;
    for (let j = 0; j < nets.length; j++) {
      const n = nets[j]!;
      this.codes[j] = r.levels[n]!;
      this.volts[j] = r.volts[n]!;
    }
    this.addRow(r.supplyCurrent, r.staticPower, findings, () => currentPathsOf(r));
  }

  /**
   * Levels of the rows from the next one (which starts a word), `count` words of 32: two runs of
   * words per reported net, code bits 0 and 1 (`levels[(2j + bit) * count + w]`), as the bit-parallel
   * sweep writes them (vectorsWordPass.ts); only the lanes set in `lanes[w]` are written.
   */
  orLevelBlock(levels: Int32Array, count: number, lanes: Int32Array): void {
    const w0 = this.count >> 5;
    const runs = levels.length / count;
    for (let r = 0; r < runs; r++) {
      const from = r * count;
      const to = r * this.words + w0;
      for (let w = 0; w < count; w++) this.levels[to + w]! |= levels[from + w]! & lanes[w]!;
    }
  }

  /** The next rows, plain (no findings, no current, voltages as their levels imply); levels by orLevelBlock. */
  addPlains(count: number): void {
    this.count += count;
  }

  /** The next row from a report row (`sweepRow`'s inverse): what a test or a fixture writes by hand. */
  addReport(row: VectorReport): void {
    const { names } = this.reported;
    for (let j = 0; j < names.length; j++) {
      const name = names[j]!;
      const v = own(row.voltages, name);
      const level = own(row.outputs, name);
      this.codes[j] = level === undefined ? LEVEL_X : LEVEL_CODES[level];
      this.volts[j] = v === null || v === undefined ? NaN : v;
    }
    this.addRow(row.supplyCurrent, row.staticPower, row.findings, () => row.currentPaths);
  }

  /** Writes the row held in `codes` and `volts`. */
  private addRow(
    supplyCurrent: number,
    staticPower: number,
    findings: readonly Finding[],
    paths: () => readonly CurrentPath[],
  ): void {
    const i = this.count++;
    const plain = this.writeLevels(i);
    this.supplyCurrent[i] = supplyCurrent;
    this.staticPower[i] = staticPower;
    for (const f of findings) {
      // Row i is below the capacity the arrays were made with.
      this.kinds[i]! |= kindBit(f.kind);
      if (f.severity === 'error') this.errors[i] = Math.min(MAX_COUNT, this.errors[i]! + 1);
      else this.warnings[i] = Math.min(MAX_COUNT, this.warnings[i]! + 1);
    }
    const currentPaths = paths();
    if (plain && findings.length === 0 && currentPaths.length === 0) return;
    this.detail[i] = this.details.length;
    this.details.push({ findings, currentPaths, voltages: plain ? null : this.volts.slice() });
  }

  /** Sets row i's level bits from `codes`; returns whether every voltage in `volts` is the plain one. */
  private writeLevels(i: number): boolean {
    const { words, levels, volts, codes } = this;
    const { vdd } = this.shape;
    const w = i >> 5;
    const bit = 1 << (i & 31);
    let plain = true;
    for (let j = 0; j < codes.length; j++) {
      const code = codes[j]!;
      if (code & 1) levels[2 * j * words + w]! |= bit;
      if (code & 2) levels[(2 * j + 1) * words + w]! |= bit;
      if (!Object.is(volts[j], plainVolts(code, vdd))) plain = false;
    }
    return plain;
  }

  columns(): SweepColumns {
    const n = this.count;
    return {
      inputs: this.shape.inputs,
      undriven: this.shape.undriven,
      first: this.first,
      count: n,
      nets: this.reported.names,
      outputs: this.reported.outputs,
      vdd: this.shape.vdd,
      words: this.words,
      levels: this.levels,
      supplyCurrent: this.supplyCurrent.subarray(0, n),
      staticPower: this.staticPower.subarray(0, n),
      kinds: this.kinds.subarray(0, n),
      errors: this.errors.subarray(0, n),
      warnings: this.warnings.subarray(0, n),
      detail: this.detail.subarray(0, n),
      details: this.details,
    };
  }
}

/** A sweep's columns from its rows in sweep order, as a test or a fixture writes them by hand. */
export function columnsOfRows(
  rows: readonly VectorReport[],
  shape: { readonly inputs: readonly string[]; readonly outputs: readonly string[]; readonly vdd: number },
  undriven = false,
): SweepColumns {
  const reported: ReportedNets = {
    names: shape.outputs,
    nets: Int32Array.from(shape.outputs.keys()),
    outputs: Int32Array.from(shape.outputs.keys()),
  };
  const recorder = new SweepRecorder({ ...shape, undriven, reported }, 0, rows.length);
  for (const row of rows) recorder.addReport(row);
  return recorder.columns();
}
