/**
 * Runs cells on several cores with node:worker_threads when the work is large enough to repay a
 * worker's start-up (loading the TypeScript core again takes a few hundred milliseconds); small
 * libraries run on the main thread. Results come back in the order of the jobs.
 */
import { availableParallelism, loadavg } from 'node:os';
import { Worker } from 'node:worker_threads';
import type { CellJob } from './loadCells.ts';
import { runCell, sweepSkipped, type CellResult, type RunOptions } from './runCell.ts';

/**
 * Transistor-vectors (devices × vectors summed over cells) below which one thread is faster. On the
 * project's 2-core runner a worker took 1–2 s to start and one thread checked about 0.4 million
 * transistor-vectors per second, so a second thread repays its start-up only past roughly ten
 * seconds of work (measurement in DEVELOPERS.md, "Command line").
 */
export const PARALLEL_WORK_THRESHOLD = 4_000_000;

export function estimatedWork(job: CellJob, options: RunOptions): number {
  if (sweepSkipped(job, options)) return job.netlist.devices.length + 1;
  const perInput = options.undriven ? 3 : 2;
  const vectors =
    options.sequence === undefined
      ? perInput ** job.netlist.inputs.length
      : options.sequence.split(';').length;
  return vectors * (job.netlist.devices.length + 1);
}

export function workerCount(jobs: readonly CellJob[], options: RunOptions, requested?: number): number {
  if (requested !== undefined) return Math.max(1, Math.min(requested, jobs.length));
  const work = jobs.reduce((s, j) => s + estimatedWork(j, options), 0);
  if (jobs.length < 2 || work < PARALLEL_WORK_THRESHOLD) return 1;
  // Cores already busy (a shared CI runner) give a worker nothing to run on.
  const idle = Math.round(availableParallelism() - (loadavg()[0] ?? 0));
  return Math.max(1, Math.min(idle, jobs.length));
}

export async function runCells(
  jobs: readonly CellJob[],
  options: RunOptions,
  requested?: number,
): Promise<CellResult[]> {
  const threads = workerCount(jobs, options, requested);
  if (threads <= 1) return jobs.map((j) => runCell(j, options));
  try {
    return await runInWorkers(jobs, options, threads);
  } catch {
    // A worker that cannot start (unusual runtimes) must not lose the check: run it here instead.
    return jobs.map((j) => runCell(j, options));
  }
}

interface WorkerReply {
  readonly index: number;
  readonly result: CellResult;
}

export function runInWorkers(
  jobs: readonly CellJob[],
  options: RunOptions,
  threads: number,
): Promise<CellResult[]> {
  const results: CellResult[] = new Array<CellResult>(jobs.length);
  // Largest first, so one big cell does not start last and hold up the end.
  const order = jobs
    .map((_job, i) => i)
    .sort((a, b) => estimatedWork(jobs[b] as CellJob, options) - estimatedWork(jobs[a] as CellJob, options));
  let next = 0;
  let done = 0;
  return new Promise((resolve, reject) => {
    const workers = Array.from(
      { length: threads },
      () => new Worker(new URL('./cellWorker.mjs', import.meta.url)),
    );
    const finish = (error?: unknown): void => {
      workers.forEach((w) => void w.terminate());
      if (error === undefined) resolve(results);
      else reject(error instanceof Error ? error : new Error(String(error)));
    };
    const feed = (w: Worker): void => {
      const index = order[next++];
      if (index !== undefined) w.postMessage({ index, job: jobs[index], options });
    };
    for (const w of workers) {
      w.on('message', (reply: WorkerReply) => {
        results[reply.index] = reply.result;
        if (++done === jobs.length) finish();
        else feed(w);
      });
      w.on('error', finish);
      feed(w);
    }
  });
}
