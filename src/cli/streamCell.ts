/**
 * A cell whose sweep is too big to collect (more than STREAM_ROWS vectors): everything that can
 * refuse it is checked first (`prepareStreamedCell`), then its rows are handed on block by block
 * (columns of up to SWEEP_BLOCK vectors) as they are solved and never held together. Sequences and `--dc` are always collected (runCell.ts):
 * a sequence has few steps, and the DC rows are read beside the check's.
 */
import type { Finding, Summary, SweepColumns } from '../core/analysis/report.ts';
import type { TransferReport } from '../core/dc/transfer.ts';
import type { FoundFunction } from '../core/analysis/foundFunction.ts';
import { prepareAnalysis } from '../core/power/cellAnalysis.ts';
import { powerFromCounts } from '../core/power/powerReport.ts';
import type { PowerReport } from '../core/power/types.ts';
import { sizingReport } from '../core/sizing/sizingReport.ts';
import type { SizingReport } from '../core/sizing/types.ts';
import { sweepSize } from '../core/analysis/vectors.ts';
import { cellTransfer } from './dcCell.ts';
import type { CellFailure, CellJob } from './loadCells.ts';
import { cellProof, type ProofJson } from './proofCell.ts';
import { failureOf, powerSettings, sweepSkipped, type RunOptions } from './runCell.ts';

/** Sweeps of more vectors than this are written as they run instead of collected first. */
export const STREAM_ROWS = 4096;

export function isStreamed(job: CellJob, options: RunOptions): boolean {
  if (options.sequence !== undefined || options.dc === true || sweepSkipped(job, options)) return false;
  return sweepSize(job.netlist.inputs, options.undriven) > STREAM_ROWS;
}

/** What is known of a cell before its rows. */
export interface CellHead {
  readonly cell: string;
  readonly file: string;
  readonly inputs: readonly string[];
  readonly outputs: readonly string[];
  readonly technology: { readonly source: string; readonly vdd: number };
  readonly sizing?: SizingReport;
  readonly transfer?: TransferReport;
  /** With --found: the function of each output (none can be read off a streamed sweep). */
  readonly found?: readonly FoundFunction[];
  readonly proof?: ProofJson;
}

/** What is known once the rows have gone by. */
export interface CellTail {
  /** Structural findings; each row carries its own. */
  readonly structural: readonly Finding[];
  readonly summary: Summary;
  readonly notes: readonly string[];
  readonly power?: PowerReport;
}

export interface StreamedCell {
  readonly head: CellHead;
  readonly rows: (onBlock: (block: SweepColumns) => void) => CellTail;
}

export function prepareStreamedCell(
  job: CellJob,
  options: RunOptions,
): StreamedCell | { failure: CellFailure } {
  try {
    const power = options.power === undefined ? undefined : powerSettings(job, options.power, undefined);
    const onBlock: { current: (block: SweepColumns) => void } = { current: () => undefined };
    const analysis = prepareAnalysis(job.netlist, {
      technology: job.technology,
      expectations: job.expectations,
      allNets: options.allNets,
      undrivenInputs: options.undriven,
      ...(options.maxInputs === undefined ? {} : { maxInputs: options.maxInputs }),
      onBlock: (block) => onBlock.current(block),
      ...(power === undefined ? {} : { power: power.request }),
    });
    const sizing = options.sizing
      ? sizingReport(job.netlist, job.technology, { load: options.load })
      : undefined;
    const transfer = options.transfer === undefined ? undefined : cellTransfer(job, options.transfer);
    const proof = options.prove ? cellProof(job) : undefined;
    const head: CellHead = {
      cell: job.cell,
      file: job.file,
      inputs: job.netlist.inputs,
      outputs: job.netlist.outputs,
      technology: { source: job.technology.source, vdd: job.technology.vdd },
      ...(sizing === undefined ? {} : { sizing }),
      ...(transfer === undefined ? {} : { transfer }),
      ...(options.found === true ? { found: job.netlist.outputs.map(unreadFunction) } : {}),
      ...(proof === undefined ? {} : { proof }),
    };
    const rows = (each: (block: SweepColumns) => void): CellTail => {
      onBlock.current = each;
      const { report, power: counts } = analysis.run();
      const powerJson =
        counts === null || power === undefined ? undefined : powerFromCounts(counts, power.settings);
      return {
        structural: report.findings,
        summary: report.summary,
        notes: [...job.notes, ...report.notes],
        ...(powerJson === undefined ? {} : { power: powerJson }),
      };
    };
    return { head, rows };
  } catch (e) {
    return { failure: { file: job.file, cell: job.cell, ...failureOf(e) } };
  }
}

/** A streamed sweep is never held, so no function is read off it: said per output. */
function unreadFunction(output: string): FoundFunction {
  const note = `no function read off a sweep of more than ${STREAM_ROWS} vectors (it is streamed, never held)`;
  return { output, expression: null, undecided: 0, minimal: false, note };
}
