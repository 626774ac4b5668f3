/**
 * Any job, run in-process: what tests and runners without workers call. The worker itself
 * (analysis.worker.ts) runs the same two functions, loading the proof jobs only when given one.
 */
import { runCheckJob } from './jobs.ts';
import { runProofJob } from './proofJobs.ts';
import { isProofLaneJob, type AnalysisJob, type JobProgress, type JobResult } from './protocol.ts';

export function runJob(job: AnalysisJob, onProgress: (p: JobProgress) => void = () => {}): JobResult {
  return isProofLaneJob(job) ? runProofJob(job, onProgress) : runCheckJob(job, onProgress);
}
