/**
 * How the simulation slice runs long jobs: one lane per job kind (`AnalysisJob['kind']`: sweep,
 * sequence, sizing, transfer, vector-dc, proof, compare, library), so a sequence never cancels the
 * table's sweep. In the browser each lane is an analysis worker; tests and environments without workers swap
 * in another runner (e.g. one that calls runJob directly).
 */
import { AnalysisClient } from './client.ts';
import type { AnalysisJob, JobProgress, JobResult } from './protocol.ts';

export interface JobRunner {
  run(job: AnalysisJob, onProgress: (progress: JobProgress) => void): Promise<JobResult>;
  cancel(): void;
  /** Gets ready for a first job (a browser worker starts loading its script); optional. */
  warm?(): void;
}

export type JobLane = AnalysisJob['kind'];

const runners = new Map<JobLane, JobRunner>();
let makeRunner: () => JobRunner = () => new AnalysisClient();

export function jobRunner(lane: JobLane): JobRunner {
  let runner = runners.get(lane);
  if (runner === undefined) {
    runner = makeRunner();
    runners.set(lane, runner);
  }
  return runner;
}

/** Replaces how runners are made (tests); lanes already made are dropped. */
export function setJobRunnerFactory(factory: () => JobRunner): void {
  runners.clear();
  makeRunner = factory;
}
