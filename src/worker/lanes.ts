/**
 * A lane runs one kind of job at a time and publishes its state through its host (the store).
 * Starting a job supersedes the one before. The job itself is the token: a result or a progress
 * report is published only while the host's state is still about that very job, so an answer for
 * an older drawing, a forgotten lane or a store that was reset is dropped.
 */
import { JobCancelled } from './client.ts';
import {
  IDLE_JOB,
  isLongJob,
  jobSize,
  type AnalysisJob,
  type JobProgress,
  type JobResult,
  type JobState,
} from './protocol.ts';
import { jobRunner, type JobLane } from './runner.ts';

export interface LaneHost<R> {
  readonly publish: (state: JobState<R>) => void;
  readonly read: () => JobState<R>;
  /** Narrows the worker's answer to this lane's result type. */
  readonly accept: (result: JobResult) => R;
}

/** A lane's `accept` for the given result kinds: anything else is a programming error. */
export function acceptKinds<K extends JobResult['kind']>(kinds: readonly K[]) {
  return (result: JobResult): Extract<JobResult, { kind: K }> => {
    if (!(kinds as readonly string[]).includes(result.kind))
      throw new Error(`unexpected ${result.kind} result`);
    return result as Extract<JobResult, { kind: K }>;
  };
}

function message(error: unknown): string {
  return error instanceof Error ? `${error.name}: ${error.message}` : String(error);
}

/** Runs a job in the lane's worker and publishes its progress and outcome while it is current. */
export async function runInLane<R>(lane: JobLane, job: AnalysisJob, host: LaneHost<R>): Promise<void> {
  const total = jobSize(job);
  const running: JobState<R> = {
    ...IDLE_JOB,
    status: 'running',
    job,
    revision: job.revision,
    long: isLongJob(job),
    progress: { done: 0, total },
  };
  host.publish(running);
  const current = (): boolean => host.read().job === job;
  const onProgress = (progress: JobProgress): void => {
    if (current()) host.publish({ ...host.read(), progress });
  };
  try {
    const result = host.accept(await jobRunner(lane).run(job, onProgress));
    if (current()) host.publish({ ...running, status: 'done', result, progress: { done: total, total } });
  } catch (error) {
    if (!current()) return;
    const cancelled = error instanceof JobCancelled;
    host.publish({
      ...host.read(),
      status: cancelled ? 'cancelled' : 'failed',
      error: cancelled ? null : message(error),
    });
  }
}

/** Stops what the lane's worker is doing; the running job's state becomes cancelled. */
export function cancelLane(lane: JobLane): void {
  jobRunner(lane).cancel();
}
