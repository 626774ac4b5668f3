/**
 * What the page and the analysis worker say to each other. Every job carries the document revision it
 * was computed for; the page drops results whose revision is no longer current.
 */
import type { CheckReport } from '../core/analysis/report.ts';
import type { Design, InputVector } from '../core/model/design.ts';
import type { StepLevel } from '../core/view/levelStrip.ts';

export interface SweepJob {
  readonly kind: 'sweep';
  readonly revision: number;
  readonly design: Design;
  /** Adds Z (an undriven pin) to each input's values. */
  readonly undrivenInputs?: boolean;
}

export interface SequenceJob {
  readonly kind: 'sequence';
  readonly revision: number;
  readonly design: Design;
  readonly steps: readonly InputVector[];
}

export type AnalysisJob = SweepJob | SequenceJob;

export interface JobProgress {
  readonly done: number;
  readonly total: number;
}

export interface JobResult {
  readonly kind: AnalysisJob['kind'];
  readonly revision: number;
  readonly report: CheckReport;
  /** Sequences only: every net's level at every step, for the strips. */
  readonly stepLevels?: readonly Readonly<Record<string, StepLevel>>[];
  /** Wall time in the worker, milliseconds. */
  readonly elapsedMs: number;
}

/** The worker's API as seen through comlink; the progress callback is a comlink proxy. */
export interface AnalysisWorkerApi {
  run(job: AnalysisJob, onProgress: (progress: JobProgress) => void): Promise<JobResult>;
}

/** Sweeps with more vectors than this show a progress bar and a cancel button. */
export const PROGRESS_THRESHOLD_VECTORS = 4096;

export function jobSize(job: AnalysisJob): number {
  if (job.kind === 'sequence') return job.steps.length;
  const values = job.undrivenInputs === true ? 3 : 2;
  return values ** job.design.netlist.inputs.length;
}
