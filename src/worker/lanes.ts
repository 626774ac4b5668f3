/**
 * A lane runs one kind of job at a time and publishes its state. Starting a job supersedes the one
 * before; a result is published only while its job is the lane's current one and its revision is
 * still the document's analysis revision, so a late answer for an old drawing is dropped.
 */
import { JobCancelled } from './client.ts';
import {
  IDLE_JOB,
  PROGRESS_THRESHOLD_VECTORS,
  jobSize,
  type AnalysisJob,
  type JobProgress,
  type JobResult,
  type JobState,
} from './protocol.ts';
import { jobRunner, type JobLane as LaneName } from './runner.ts';

export interface LaneHost<R> {
  readonly publish: (state: JobState<R>) => void;
  readonly read: () => JobState<R>;
  /** The document's analysis revision now. */
  readonly revision: () => number;
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

export class Lane<R> {
  private current: object | null = null;

  constructor(
    private readonly name: LaneName,
    private readonly host: LaneHost<R>,
  ) {}

  async run(job: AnalysisJob): Promise<void> {
    const token = {};
    this.current = token;
    const total = jobSize(job);
    const running: JobState<R> = {
      ...IDLE_JOB,
      status: 'running',
      revision: job.revision,
      long: total > PROGRESS_THRESHOLD_VECTORS,
      progress: { done: 0, total },
    };
    this.host.publish(running);
    const live = (): boolean => this.current === token && this.host.revision() === job.revision;
    const onProgress = (progress: JobProgress): void => {
      if (live()) this.host.publish({ ...this.host.read(), progress });
    };
    try {
      const result = this.host.accept(await jobRunner(this.name).run(job, onProgress));
      if (live()) this.host.publish({ ...running, status: 'done', result, progress: { done: total, total } });
    } catch (error) {
      if (!live()) return;
      const cancelled = error instanceof JobCancelled;
      this.host.publish({
        ...this.host.read(),
        status: cancelled ? 'cancelled' : 'failed',
        error: cancelled ? null : message(error),
      });
    }
  }

  cancel(): void {
    jobRunner(this.name).cancel();
  }

  /** Forgets the running job: its answer will be dropped, and the lane shows idle. */
  forget(): void {
    this.current = null;
    this.host.publish(IDLE_JOB);
  }
}
