/**
 * The analysis worker: sweeps and sequences off the main thread, so the page never freezes. A thin
 * adapter: all work is in jobs.ts. Cancel is done by the page terminating this worker.
 */
import * as Comlink from 'comlink';
import { forTransfer, runJob } from './jobs.ts';
import type { AnalysisWorkerApi } from './protocol.ts';

const api: AnalysisWorkerApi = {
  run(job, onProgress) {
    const { result, buffers } = forTransfer(runJob(job, onProgress));
    return Promise.resolve(Comlink.transfer(result, buffers));
  },
};

Comlink.expose(api);
