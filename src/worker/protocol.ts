/**
 * What the page and the analysis worker say to each other. Every job carries the document revision it
 * was computed for; the page drops results whose revision is no longer current.
 */
import type { CheckReport } from '../core/analysis/report.ts';
import type { Design, InputVector } from '../core/model/design.ts';
import type { ActivitySource, PowerReport } from '../core/power/types.ts';
import type { SizingReport } from '../core/sizing/types.ts';
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

/** Power and sizing settings the designer chooses in the panel. */
export interface PowerSettings {
  /** Clock frequency, Hz. */
  readonly freq: number;
  /** Load on each output, farads. */
  readonly load: number;
  readonly activity: ActivitySource;
}

export interface PowerJob {
  readonly kind: 'power';
  readonly revision: number;
  readonly design: Design;
  readonly settings: PowerSettings;
  /** Steps for sequence activity. */
  readonly steps: readonly InputVector[];
}

export type AnalysisJob = SweepJob | SequenceJob | PowerJob;

export interface JobProgress {
  readonly done: number;
  readonly total: number;
}

export interface CheckResult {
  readonly kind: 'sweep' | 'sequence';
  readonly revision: number;
  readonly report: CheckReport;
  /** Sequences only: every net's level at every step, for the strips. */
  readonly stepLevels?: readonly Readonly<Record<string, StepLevel>>[];
  /** Wall time in the worker, milliseconds. */
  readonly elapsedMs: number;
}

/** Power and sizing are computed apart: a failure of one still shows the other. */
export interface PowerSizingResult {
  readonly kind: 'power';
  readonly revision: number;
  readonly power: PowerReport | null;
  readonly sizing: SizingReport | null;
  readonly errors: readonly string[];
  readonly elapsedMs: number;
}

export type JobResult = CheckResult | PowerSizingResult;

/** A job as the panels see it, whatever its kind. */
export type JobStatus = 'idle' | 'running' | 'done' | 'cancelled' | 'failed';

export interface JobState<R> {
  readonly status: JobStatus;
  readonly revision: number;
  readonly progress: JobProgress;
  /** Past the size threshold: the panel shows a progress bar and a cancel button. */
  readonly long: boolean;
  readonly result: R | null;
  readonly error: string | null;
}

export const IDLE_JOB: JobState<never> = {
  status: 'idle',
  revision: -1,
  progress: { done: 0, total: 0 },
  long: false,
  result: null,
  error: null,
};

/** The worker's API as seen through comlink; the progress callback is a comlink proxy. */
export interface AnalysisWorkerApi {
  run(job: AnalysisJob, onProgress: (progress: JobProgress) => void): Promise<JobResult>;
}

/** With Z as a third value, 3^10 = 59,049 vectors: about the two-valued limit of 2^16. */
export const MAX_INPUTS_WITH_UNDRIVEN = 10;

/** Sweeps with more vectors than this show a progress bar and a cancel button. */
export const PROGRESS_THRESHOLD_VECTORS = 4096;

export function jobSize(job: AnalysisJob): number {
  if (job.kind === 'sequence') return job.steps.length;
  if (job.kind === 'power' && job.settings.activity === 'sequence') return job.steps.length;
  if (job.kind === 'power') return 2 ** job.design.netlist.inputs.length;
  const values = job.undrivenInputs === true ? 3 : 2;
  return values ** job.design.netlist.inputs.length;
}
