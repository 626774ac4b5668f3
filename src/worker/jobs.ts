/**
 * The work itself, as plain functions over core calls: the worker exposes them, and tests and the
 * command line can call them directly. Nothing here knows about workers or the page.
 */
import { checkSequence, checkSweep, DEFAULT_MAX_INPUTS } from '../core/analysis/check.ts';
import type { Design } from '../core/model/design.ts';
import { heldSteps } from '../core/view/sequenceEdit.ts';
import { expressionProblem } from '../core/view/expectation.ts';
import { sequenceLevels } from '../core/view/sequenceLevels.ts';
import { powerReport } from '../core/power/powerReport.ts';
import { sizingReport } from '../core/sizing/sizingReport.ts';
import { MAX_INPUTS_WITH_UNDRIVEN } from './protocol.ts';
import type {
  AnalysisJob,
  CheckResult,
  JobProgress,
  JobResult,
  PowerJob,
  PowerSizingResult,
  SequenceJob,
  SweepJob,
} from './protocol.ts';

/** Progress messages cross a thread boundary: at most one per this many milliseconds. */
const PROGRESS_INTERVAL_MS = 50;

/**
 * Expected functions the sweep can use: those of existing outputs that parse. The rest become notes,
 * so renaming a pin never takes the whole table away.
 */
export function usableExpectations(design: Design): {
  expectations: Record<string, string>;
  notes: string[];
} {
  const { inputs, outputs } = design.netlist;
  const expectations: Record<string, string> = {};
  const notes: string[] = [];
  for (const [output, text] of Object.entries(design.expectations)) {
    const problem = outputs.includes(output)
      ? expressionProblem(text, inputs)
      : { message: 'not an output', position: 0 };
    if (problem === null) expectations[output] = text;
    else notes.push(`expected function of ${output} ignored: ${problem.message}`);
  }
  return { expectations, notes };
}

function throttled(onProgress: (p: JobProgress) => void): (done: number, total: number) => void {
  let last = -Infinity;
  return (done, total) => {
    const now = performance.now();
    if (done < total && now - last < PROGRESS_INTERVAL_MS) return;
    last = now;
    onProgress({ done, total });
  };
}

function sweep(job: SweepJob, onProgress: (p: JobProgress) => void): Pick<CheckResult, 'report'> {
  const { expectations, notes } = usableExpectations(job.design);
  const undriven = job.undrivenInputs === true;
  const report = checkSweep(job.design.netlist, {
    technology: job.design.technology,
    expectations,
    undrivenInputs: undriven,
    maxInputs: undriven ? MAX_INPUTS_WITH_UNDRIVEN : DEFAULT_MAX_INPUTS,
    onProgress: throttled(onProgress),
  });
  return { report: { ...report, notes: [...notes, ...report.notes] } };
}

function sequence(
  job: SequenceJob,
  onProgress: (p: JobProgress) => void,
): Pick<CheckResult, 'report' | 'stepLevels'> {
  const { netlist, technology } = job.design;
  const { expectations, notes } = usableExpectations(job.design);
  const steps = heldSteps(netlist.inputs, job.steps);
  const report = checkSequence(netlist, steps, {
    technology,
    expectations,
    onProgress: throttled(onProgress),
  });
  return {
    report: { ...report, notes: [...notes, ...report.notes] },
    stepLevels: sequenceLevels(netlist, technology, steps),
  };
}

function attempt<T>(errors: string[], what: string, compute: () => T): T | null {
  try {
    return compute();
  } catch (error) {
    errors.push(`${what}: ${error instanceof Error ? error.message : String(error)}`);
    return null;
  }
}

function powerSizing(job: PowerJob): Pick<PowerSizingResult, 'power' | 'sizing' | 'errors'> {
  const { netlist, technology } = job.design;
  const { freq, load, activity } = job.settings;
  const errors: string[] = [];
  const sequenceSteps = activity === 'sequence' ? { sequence: heldSteps(netlist.inputs, job.steps) } : {};
  const power = attempt(errors, 'power', () =>
    powerReport(netlist, technology, { freq, load, activity, ...sequenceSteps }),
  );
  const sizing = attempt(errors, 'sizing', () => sizingReport(netlist, technology, { load }));
  return { power, sizing, errors };
}

export function runJob(job: AnalysisJob, onProgress: (p: JobProgress) => void = () => {}): JobResult {
  const started = performance.now();
  const elapsed = (): number => performance.now() - started;
  switch (job.kind) {
    case 'sweep':
      return { kind: 'sweep', revision: job.revision, ...sweep(job, onProgress), elapsedMs: elapsed() };
    case 'sequence':
      return { kind: 'sequence', revision: job.revision, ...sequence(job, onProgress), elapsedMs: elapsed() };
    case 'power':
      return { kind: 'power', revision: job.revision, ...powerSizing(job), elapsedMs: elapsed() };
  }
}
