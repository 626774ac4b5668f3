/**
 * The level-1 DC jobs (docs/semantics.md §2, "DC levels"): a transfer curve, and one vector's
 * operating point beside its switch-level estimate. Plain functions over the core, like jobs.ts; a
 * request the core refuses (a swept input that was renamed, a step naming no input) comes back as
 * words in `error`, never as a failed job.
 */
import { SequenceError } from '../core/analysis/pass.ts';
import { TransferError, transferCurves } from '../core/dc/transfer.ts';
import { compareAtLastStep } from '../core/dc/vectorCompare.ts';
import type { TransferJob, TransferResult, VectorDcJob, VectorDcResult } from './protocol.ts';

function refusal(error: unknown): string {
  if (error instanceof TransferError || error instanceof SequenceError) return error.message;
  throw error;
}

export function transfer(
  job: TransferJob,
  onProgress: (done: number, total: number) => void,
): Pick<TransferResult, 'report' | 'error'> {
  try {
    const report = transferCurves(job.cell.netlist, job.cell.technology, {
      input: job.input,
      hold: job.hold,
      points: job.points,
      onProgress,
    });
    return { report, error: null };
  } catch (error) {
    return { report: null, error: refusal(error) };
  }
}

export function vectorDc(job: VectorDcJob): Pick<VectorDcResult, 'comparison' | 'error'> {
  try {
    return { comparison: compareAtLastStep(job.cell.netlist, job.cell.technology, job.steps), error: null };
  } catch (error) {
    return { comparison: null, error: refusal(error) };
  }
}
