/**
 * The page's side of the analysis worker. One job at a time: starting a job cancels the one running.
 * Cancelling terminates the worker outright (a vector that never settles cannot delay it) and the next
 * job starts a fresh one; module workers start in a few milliseconds.
 */
import * as Comlink from 'comlink';
import type { AnalysisJob, AnalysisWorkerApi, JobProgress, JobResult } from './protocol.ts';

export class JobCancelled extends Error {
  override readonly name = 'JobCancelled';
}

type WorkerFactory = () => Worker;

function defaultFactory(): Worker {
  return new Worker(new URL('./analysis.worker.ts', import.meta.url), {
    type: 'module',
    name: 'railwise-analysis',
  });
}

export class AnalysisClient {
  private worker: Worker | null = null;
  private api: Comlink.Remote<AnalysisWorkerApi> | null = null;
  private rejectRunning: ((reason: Error) => void) | null = null;

  constructor(private readonly createWorker: WorkerFactory = defaultFactory) {}

  /** Resolves with the result, or rejects with JobCancelled if cancelled or superseded. */
  run(job: AnalysisJob, onProgress: (progress: JobProgress) => void = () => {}): Promise<JobResult> {
    this.cancel();
    const api = this.ensureWorker();
    return new Promise<JobResult>((resolve, reject) => {
      this.rejectRunning = reject;
      api.run(job, Comlink.proxy(onProgress)).then(
        (result) => this.settle(reject, () => resolve(result)),
        (error: unknown) =>
          this.settle(reject, () => reject(error instanceof Error ? error : new Error(String(error)))),
      );
    });
  }

  /** Starts the worker ahead of its first job, so its script loads while the page does other work. */
  warm(): void {
    this.ensureWorker();
  }

  /** Stops the running job, if any; its promise rejects with JobCancelled. */
  cancel(): void {
    const reject = this.rejectRunning;
    if (reject === null) return;
    this.rejectRunning = null;
    this.worker?.terminate();
    this.worker = null;
    this.api = null;
    reject(new JobCancelled('analysis cancelled'));
  }

  dispose(): void {
    this.cancel();
    this.worker?.terminate();
    this.worker = null;
    this.api = null;
  }

  /** Only the job still current may settle its promise; a cancelled one was already rejected. */
  private settle(reject: (reason: Error) => void, finish: () => void): void {
    if (this.rejectRunning !== reject) return;
    this.rejectRunning = null;
    finish();
  }

  private ensureWorker(): Comlink.Remote<AnalysisWorkerApi> {
    if (this.api === null) {
      this.worker = this.createWorker();
      this.api = Comlink.wrap<AnalysisWorkerApi>(this.worker);
    }
    return this.api;
  }
}
