import { afterEach, describe, expect, it } from 'vitest';
import * as Comlink from 'comlink';
import { AnalysisClient, JobCancelled } from '../../src/worker/client.ts';
import { runJob } from '../../src/worker/runJob.ts';
import type { AnalysisWorkerApi, JobProgress } from '../../src/worker/protocol.ts';
import { design, nand2 } from '../cells.ts';
import { reportRows } from '../../src/core/analysis/sweepColumns.ts';

/**
 * A stand-in for the module worker: the real worker API exposed over a MessageChannel, with a
 * `terminate` that closes it. `hold` keeps a job from answering until the test lets it.
 */
function fakeWorker(log: string[], hold = false): Worker {
  const { port1, port2 } = new MessageChannel();
  const api: AnalysisWorkerApi = {
    async run(job, onProgress) {
      if (hold) await new Promise(() => {}); // never answers: a vector that never settles
      return runJob(job, onProgress);
    },
  };
  Comlink.expose(api, port2);
  return Object.assign(port1, {
    terminate: () => {
      log.push('terminated');
      port1.close();
      port2.close();
    },
  }) as unknown as Worker;
}

const clients: AnalysisClient[] = [];
afterEach(() => clients.splice(0).forEach((c) => c.dispose()));

describe('analysis client', () => {
  it('answers with the worker result and passes progress back', async () => {
    const log: string[] = [];
    const client = new AnalysisClient(() => fakeWorker(log));
    clients.push(client);
    const seen: JobProgress[] = [];
    const result = await client.run({ kind: 'sweep', revision: 5, cell: design(nand2) }, (p) => seen.push(p));
    expect(result.revision).toBe(5);
    expect(result.kind === 'sweep' && reportRows(result.report).length).toBe(4);
    await new Promise((r) => setTimeout(r, 20)); // progress messages cross the channel asynchronously
    expect(seen[seen.length - 1]).toEqual({ done: 4, total: 4 });
  });

  it('cancels a job that never answers by terminating its worker', async () => {
    const log: string[] = [];
    const client = new AnalysisClient(() => fakeWorker(log, true));
    clients.push(client);
    const running = client.run({ kind: 'sweep', revision: 1, cell: design(nand2) });
    client.cancel();
    await expect(running).rejects.toBeInstanceOf(JobCancelled);
    expect(log).toEqual(['terminated']);
  });

  it('a new job supersedes the running one, on a fresh worker', async () => {
    const log: string[] = [];
    let made = 0;
    const client = new AnalysisClient(() => fakeWorker(log, made++ === 0));
    clients.push(client);
    const first = client.run({ kind: 'sweep', revision: 1, cell: design(nand2) });
    const second = client.run({ kind: 'sweep', revision: 2, cell: design(nand2) });
    await expect(first).rejects.toBeInstanceOf(JobCancelled);
    expect((await second).revision).toBe(2);
    expect(made).toBe(2);
  });
});
