/**
 * The analysis worker: sweeps and sequences off the main thread, so the page never freezes. A thin
 * adapter: all work is in jobs.ts, and in proofJobs.ts, which is loaded only when a proof or
 * compare job comes (its SAT solver is most of the worker's code, and every lane is a worker of
 * its own). Cancel is done by the page terminating this worker.
 */
import * as Comlink from 'comlink';
import { forTransfer, runCheckJob } from './jobs.ts';
import { isProofLaneJob, type AnalysisWorkerApi } from './protocol.ts';

const api: AnalysisWorkerApi = {
  run(job, onProgress) {
    if (isProofLaneJob(job)) return import('./proofJobs.ts').then((m) => m.runProofJob(job, onProgress));
    const { result, buffers } = forTransfer(runCheckJob(job, onProgress));
    return Promise.resolve(Comlink.transfer(result, buffers));
  },
};

Comlink.expose(api);
