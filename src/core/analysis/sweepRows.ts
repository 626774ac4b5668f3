/**
 * The rows of one sweep as they are solved, in columns (sweepColumns.ts): one block kept for the
 * report, or blocks of SWEEP_BLOCK vectors handed on as they fill, so a streamed sweep of millions of
 * vectors never holds its rows. Both passes write here: the scalar one row by row (`add`), the
 * bit-parallel one a word of levels at a time (`addWords`, `addPlains`).
 */
import type { CompiledNetlist } from '../compile/compile.ts';
import type { Netlist } from '../model/netlist.ts';
import type { SolveResult } from '../solver/simulator.ts';
import type { SolveObserver } from './pass.ts';
import type { Finding, SweepColumns } from './report.ts';
import { reportedNets, SweepRecorder, type RecorderShape } from './sweepRecorder.ts';
import { SWEEP_BLOCK, sweepSize } from './vectors.ts';
import type { WordRows } from './vectorsWordPass.ts';

export { SWEEP_BLOCK };

/** What the rows read of the check: the cell, what is reported, and each solved vector's findings. */
export interface RowSource {
  readonly netlist: Netlist;
  readonly compiled: CompiledNetlist;
  readonly options: { readonly undrivenInputs?: boolean; readonly allNets?: boolean };
  findingsOf(r: SolveResult, index: number): Finding[];
}

export class SweepRows implements SolveObserver, WordRows {
  private recorder: SweepRecorder;
  private readonly shape: RecorderShape;
  private readonly blockSize: number;
  rows = 0;

  constructor(
    private readonly source: RowSource,
    private readonly onBlock: ((block: SweepColumns) => void) | undefined,
    /** Vectors the sweep will have: every combination unless told (0 for a sweep that is skipped). */
    private readonly total = sweepSize(source.netlist.inputs, source.options.undrivenInputs === true),
  ) {
    const { netlist, options, compiled: c } = source;
    const undriven = options.undrivenInputs === true;
    const reported = reportedNets(c, options.allNets === true);
    this.shape = { inputs: netlist.inputs, undriven, reported, vdd: c.tech.vdd };
    this.blockSize = onBlock === undefined ? this.total : Math.min(this.total, SWEEP_BLOCK);
    this.recorder = this.block(0);
  }

  private block(first: number): SweepRecorder {
    const capacity = Math.min(this.blockSize, this.total - first);
    return new SweepRecorder(this.shape, first, Math.max(1, capacity));
  }

  add(r: SolveResult, index: number): void {
    this.recorder.add(r, this.source.findingsOf(r, index));
    this.next();
  }

  addWords(levels: Int32Array, count: number, fast: Int32Array): void {
    this.recorder.orLevelBlock(levels, count, fast);
  }

  addPlains(count: number): void {
    this.recorder.addPlains(count);
    this.next(count);
  }

  /** Rows come in runs within one word of 32, and blocks hold whole words: a run never spans two. */
  private next(count = 1): void {
    this.rows += count;
    if (this.onBlock !== undefined && this.recorder.isFull()) {
      this.onBlock(this.recorder.columns());
      this.recorder = this.block(this.rows);
    }
  }

  /** The reported nets, as compiled net numbers. */
  get reportedNets(): Int32Array {
    return this.shape.reported.nets;
  }

  /** The rows kept (none when streamed); a streamed sweep's last, partial block goes out here. */
  finish(): SweepColumns | undefined {
    const last = this.recorder.columns();
    if (this.onBlock === undefined) return last;
    if (last.count > 0) this.onBlock(last);
    return undefined;
  }
}
