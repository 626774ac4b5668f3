/**
 * The work itself, as plain functions over the core's one-pass call (analyseCell, the same call the
 * command line makes): the worker exposes them, tests call them directly. Nothing here knows about
 * workers or the page.
 */
import { packedForTransfer } from '../core/analysis/sweepColumns.ts';
import { analyseCell } from '../core/power/cellAnalysis.ts';
import { sizingReport } from '../core/sizing/sizingReport.ts';
import { checkLibraryCell } from '../core/analysis/libraryCheck.ts';
import { usableExpectations } from '../core/expect/problems.ts';
import { StepLevelRecorder } from '../core/view/sequenceLevels.ts';
import { transfer, vectorDc } from './dcJobs.ts';
import { appSweepLimit } from './protocol.ts';
import type {
  CheckJob,
  CheckResult,
  JobProgress,
  JobResult,
  LibraryJob,
  LibraryResult,
  SequenceJob,
  SizingJob,
  SizingResult,
  SweepJob,
} from './protocol.ts';

/** Progress messages cross a thread boundary: at most one per this many milliseconds. */
const PROGRESS_INTERVAL_MS = 50;

export function throttled(onProgress: (p: JobProgress) => void): (done: number, total: number) => void {
  let last = -Infinity;
  return (done, total) => {
    const now = performance.now();
    if (done < total && now - last < PROGRESS_INTERVAL_MS) return;
    last = now;
    onProgress({ done, total });
  };
}

type CheckPart = Pick<CheckResult, 'report' | 'power' | 'stepLevels'>;

function sweep(job: SweepJob, onProgress: (p: JobProgress) => void): CheckPart {
  const { expectations, notes } = usableExpectations(job.cell.netlist, job.cell.expectations);
  const undriven = job.undrivenInputs === true;
  const { report, power } = analyseCell(job.cell.netlist, {
    technology: job.cell.technology,
    expectations,
    undrivenInputs: undriven,
    maxInputs: appSweepLimit(undriven),
    onProgress: throttled(onProgress),
    power: { activity: 'random' },
  });
  // Each vector's findings are in the sweep's details; the list keeps the structural ones.
  const findings = report.findings.filter((f) => f.vector === null);
  return { report: { ...report, findings, notes: [...notes, ...report.notes] }, power };
}

function sequence(job: SequenceJob, onProgress: (p: JobProgress) => void): CheckPart {
  const { expectations, notes } = usableExpectations(job.cell.netlist, job.cell.expectations);
  const levels = new StepLevelRecorder();
  const { report, power } = analyseCell(job.cell.netlist, {
    technology: job.cell.technology,
    expectations,
    steps: job.steps,
    observers: [levels],
    onProgress: throttled(onProgress),
    ...(job.steps.length > 0 ? { power: { activity: 'sequence' } } : {}),
  });
  return { report: { ...report, notes: [...notes, ...report.notes] }, stepLevels: levels.steps, power };
}

function sizing(job: SizingJob): Pick<SizingResult, 'sizing' | 'error'> {
  try {
    return { sizing: sizingReport(job.cell.netlist, job.cell.technology, { load: job.load }), error: null };
  } catch (error) {
    return { sizing: null, error: `sizing: ${error instanceof Error ? error.message : String(error)}` };
  }
}

function library(job: LibraryJob, onProgress: (p: JobProgress) => void): Pick<LibraryResult, 'rows'> {
  const progress = throttled(onProgress);
  const { cells } = job.design;
  const rows = cells.map((c, i) => {
    const row = checkLibraryCell(job.design, c.name);
    progress(i + 1, cells.length);
    return row;
  });
  return { rows };
}

/**
 * Runs a job of the kinds every analysis worker starts with (the proof and compare jobs, with their
 * SAT solver, are in proofJobs.ts, which a worker loads only when it is given one).
 */
export function runCheckJob(job: CheckJob, onProgress: (p: JobProgress) => void = () => {}): JobResult {
  const started = performance.now();
  const elapsed = (): number => performance.now() - started;
  switch (job.kind) {
    case 'sweep':
      return { kind: 'sweep', revision: job.revision, ...sweep(job, onProgress), elapsedMs: elapsed() };
    case 'sequence':
      return { kind: 'sequence', revision: job.revision, ...sequence(job, onProgress), elapsedMs: elapsed() };
    case 'sizing':
      return { kind: 'sizing', revision: job.revision, ...sizing(job), elapsedMs: elapsed() };
    case 'library':
      return { kind: 'library', revision: job.revision, ...library(job, onProgress), elapsedMs: elapsed() };
    case 'transfer': {
      const outcome = transfer(job, throttled(onProgress));
      return { kind: 'transfer', revision: job.revision, ...outcome, elapsedMs: elapsed() };
    }
    case 'vector-dc':
      return { kind: 'vector-dc', revision: job.revision, ...vectorDc(job), elapsedMs: elapsed() };
  }
}

/**
 * A result ready to cross to the page: a sweep's details packed into one text and the buffers of its
 * columns listed for transfer, so the page receives a 65,536-vector sweep without copying or
 * cloning it object by object.
 */
export function forTransfer(result: JobResult): { result: JobResult; buffers: ArrayBuffer[] } {
  if (result.kind !== 'sweep' || result.report.sweep === undefined) return { result, buffers: [] };
  const { columns, buffers } = packedForTransfer(result.report.sweep);
  return { result: { ...result, report: { ...result.report, sweep: columns } }, buffers };
}
