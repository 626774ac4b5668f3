/**
 * What the page and the analysis worker say to each other. Every job carries the analysis revision
 * it was computed for; the page drops results whose job is no longer the lane's current one.
 */
import type { CheckReport } from '../core/analysis/report.ts';
import type { TransferReport } from '../core/dc/transfer.ts';
import type { DcComparison } from '../core/dc/vectorCompare.ts';
import type { CellDesign, Design } from '../core/document/design.ts';
import type { InputVector } from '../core/model/design.ts';
import type { LibraryRow } from '../core/analysis/libraryCheck.ts';
import type { PowerCounts } from '../core/power/tally.ts';
import type { Comparison } from '../core/proof/compare.ts';
import type { ProofReport } from '../core/proof/prove.ts';
import type { SizingReport } from '../core/sizing/types.ts';
import type { StepLevel } from '../core/view/levelStrip.ts';

/** What a job analyses: the cell as derived at one revision, without its drawing. */
export type CellInput = Pick<CellDesign, 'netlist' | 'technology' | 'expectations'>;

/** Every vector once: the table, the findings and the power counts for random activity. */
export interface SweepJob {
  readonly kind: 'sweep';
  readonly revision: number;
  readonly cell: CellInput;
  /** Adds Z (an undriven pin) to each input's values. */
  readonly undrivenInputs?: boolean;
}

/** Steps once: the report, the level strips and the power counts for sequence activity. */
export interface SequenceJob {
  readonly kind: 'sequence';
  readonly revision: number;
  readonly cell: CellInput;
  readonly steps: readonly InputVector[];
}

/** Sizing is topology only: it solves nothing. */
export interface SizingJob {
  readonly kind: 'sizing';
  readonly revision: number;
  readonly cell: CellInput;
  /** Load on each output, farads. */
  readonly load: number;
}

/** The level-1 transfer curve of every output as one input sweeps from 0 to VDD. */
export interface TransferJob {
  readonly kind: 'transfer';
  readonly revision: number;
  readonly cell: CellInput;
  readonly input: string;
  /** Inputs the designer held; the others are chosen so that an output follows the swept one. */
  readonly hold: InputVector;
  readonly points: number;
}

/** One vector's level-1 operating point beside its switch-level estimate. */
export interface VectorDcJob {
  readonly kind: 'vector-dc';
  readonly revision: number;
  readonly cell: CellInput;
  /** Solved in order; the last is the vector shown, with the charge the steps before it left. */
  readonly steps: readonly InputVector[];
}

/** Every cell of a design checked on its own (the library view): one row per cell. */
export interface LibraryJob {
  readonly kind: 'library';
  readonly revision: number;
  /** The design without its drawings. */
  readonly design: Design;
}

/** Every property of docs/semantics.md §10 for all 0/1 vectors at once, by SAT. */
export interface ProofJob {
  readonly kind: 'proof';
  readonly revision: number;
  readonly cell: CellInput;
}

/** The cell against a cell of a file (design or netlist, read in the worker), for every vector. */
export interface CompareJob {
  readonly kind: 'compare';
  readonly revision: number;
  readonly cell: CellInput;
  readonly file: { readonly name: string; readonly text: string };
  /** The cell of a library file to compare with; null: the file's only cell. */
  readonly other: string | null;
}

export type AnalysisJob =
  SweepJob | SequenceJob | SizingJob | TransferJob | VectorDcJob | ProofJob | CompareJob | LibraryJob;

/** The jobs of the proof lanes, whose code (a SAT solver) a worker loads only when given one. */
export type ProofLaneJob = ProofJob | CompareJob;

/** Every other job: what every analysis worker can run from the start. */
export type CheckJob = Exclude<AnalysisJob, ProofLaneJob>;

export function isProofLaneJob(job: AnalysisJob): job is ProofLaneJob {
  return job.kind === 'proof' || job.kind === 'compare';
}

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
  /** Counted on the same solves; the page finishes them for its clock and load. */
  readonly power: PowerCounts | null;
  /** Wall time in the worker, milliseconds. */
  readonly elapsedMs: number;
}

export interface SizingResult {
  readonly kind: 'sizing';
  readonly revision: number;
  readonly sizing: SizingReport | null;
  readonly error: string | null;
  readonly elapsedMs: number;
}

export interface TransferResult {
  readonly kind: 'transfer';
  readonly revision: number;
  readonly report: TransferReport | null;
  /** A request the core refused (an input that no longer exists…), in words. */
  readonly error: string | null;
  readonly elapsedMs: number;
}

export interface VectorDcResult {
  readonly kind: 'vector-dc';
  readonly revision: number;
  readonly comparison: DcComparison | null;
  readonly error: string | null;
  readonly elapsedMs: number;
}

export interface LibraryResult {
  readonly kind: 'library';
  readonly revision: number;
  readonly rows: readonly LibraryRow[];
  readonly elapsedMs: number;
}

export interface ProofResult {
  readonly kind: 'proof';
  readonly revision: number;
  readonly report: ProofReport | null;
  /** A cell the proof cannot read (it does not compile), in words. */
  readonly error: string | null;
  readonly elapsedMs: number;
}

export interface CompareResult {
  readonly kind: 'compare';
  readonly revision: number;
  /** The file and the cell of it that was compared. */
  readonly file: string;
  readonly other: string | null;
  readonly comparison: Comparison | null;
  /** A library file and no cell chosen yet: its cells to choose from. */
  readonly choices: readonly string[];
  /** An unreadable file or cell, or pins that differ, in words. */
  readonly error: string | null;
  readonly elapsedMs: number;
}

export type JobResult =
  CheckResult | SizingResult | TransferResult | VectorDcResult | ProofResult | CompareResult | LibraryResult;

/** A job as the panels see it, whatever its kind. */
export type JobStatus = 'idle' | 'running' | 'done' | 'cancelled' | 'failed';

export interface JobState<R> {
  readonly status: JobStatus;
  /** The job this state is about: a lane publishes only while its job is still this one. */
  readonly job: AnalysisJob | null;
  readonly revision: number;
  readonly progress: JobProgress;
  /** Past the size threshold: the panel shows a progress bar and a cancel button. */
  readonly long: boolean;
  readonly result: R | null;
  readonly error: string | null;
}

export const IDLE_JOB: JobState<never> = {
  status: 'idle',
  job: null,
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

/**
 * The page sweeps up to 2^20 = 1,048,576 vectors in the worker, with progress and cancel; the
 * command line goes to 24 inputs when asked (docs/semantics.md §7).
 */
export const APP_MAX_INPUTS = 20;

/** With Z as a third value, 3^12 = 531,441 vectors: within the two-valued limit of 2^20. */
export const MAX_INPUTS_WITH_UNDRIVEN = 12;

/** The most inputs the page sweeps, two- or three-valued. */
export function appSweepLimit(undrivenInputs: boolean): number {
  return undrivenInputs ? MAX_INPUTS_WITH_UNDRIVEN : APP_MAX_INPUTS;
}

/** Sweeps with more vectors than this show a progress bar and a cancel button. */
export const PROGRESS_THRESHOLD_VECTORS = 4096;

/** Long jobs show a progress bar and a cancel button: large sweeps, and every proof and comparison. */
export function isLongJob(job: AnalysisJob): boolean {
  return job.kind === 'proof' || job.kind === 'compare' || jobSize(job) > PROGRESS_THRESHOLD_VECTORS;
}

/**
 * Solves a job takes: vectors of a sweep, steps of a sequence, points of a curve, cells of a library,
 * none for sizing;
 * for a proof, the properties it decides (two for the cell, four per output; its progress counts them).
 */
export function jobSize(job: AnalysisJob): number {
  switch (job.kind) {
    case 'proof':
      return 2 + 4 * job.cell.netlist.outputs.length;
    case 'compare':
      return 1;
    case 'sequence':
    case 'vector-dc':
      return job.steps.length;
    case 'transfer':
      return job.points;
    case 'sizing':
      return 0;
    case 'library':
      return job.design.cells.length;
    case 'sweep':
      return (job.undrivenInputs === true ? 3 : 2) ** job.cell.netlist.inputs.length;
  }
}
