/**
 * The store with the analysis wiring running, as the app starts it, and jobs run in-process by a
 * runner the test finishes by hand (fake timers). Call `useHeldRunner()` once at the top of a test
 * file; `runner` then holds the current test's runner.
 */
import { afterEach, beforeEach, vi } from 'vitest';
import { SWEEP_DEBOUNCE_MS, startAnalysis } from '../../src/state/analysis.ts';
import { resetStore } from '../../src/state/store.ts';
import { JobCancelled } from '../../src/worker/client.ts';
import { runJob } from '../../src/worker/runJob.ts';
import type { AnalysisJob, JobProgress, JobResult } from '../../src/worker/protocol.ts';
import { setJobRunnerFactory, type JobRunner } from '../../src/worker/runner.ts';

/** Runs jobs in-process when the test says; a transfer job reports half-way progress as it starts. */
export class HeldRunner implements JobRunner {
  pending: { job: AnalysisJob; resolve: (r: JobResult) => void; reject: (e: Error) => void }[] = [];
  run(job: AnalysisJob, onProgress: (p: JobProgress) => void = () => {}): Promise<JobResult> {
    if (job.kind === 'transfer') onProgress({ done: 100, total: job.points });
    return new Promise((resolve, reject) => this.pending.push({ job, resolve, reject }));
  }
  cancel(): void {
    for (const p of this.pending.splice(0)) p.reject(new JobCancelled('cancelled'));
  }
  finishAll(): void {
    for (const p of this.pending.splice(0)) p.resolve(runJob(p.job));
  }
  kinds(): string[] {
    return this.pending.map((p) => p.job.kind);
  }
}

export let runner: HeldRunner;

export function useHeldRunner(): void {
  let stop: () => void = () => {};
  beforeEach(() => {
    vi.useFakeTimers();
    resetStore();
    runner = new HeldRunner();
    setJobRunnerFactory(() => runner);
    stop = startAnalysis();
  });
  afterEach(() => {
    stop();
    vi.useRealTimers();
  });
}

/**
 * Lets queued jobs start (at once after a quiet spell, in a microtask; otherwise once edits pause),
 * finishes them all, and lets their answers land; jobs that wait for the table start and finish in
 * a further round.
 */
export async function settle(): Promise<void> {
  await startQueued();
  for (let round = 0; round < 4; round++) {
    runner.finishAll();
    await vi.runAllTimersAsync();
    if (runner.pending.length === 0) return;
  }
}

/** Lets queued jobs start without finishing them. */
export async function startQueued(): Promise<void> {
  await vi.advanceTimersByTimeAsync(SWEEP_DEBOUNCE_MS + 1);
}
