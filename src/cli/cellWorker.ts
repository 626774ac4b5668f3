/** Runs cells sent by parallel.ts, one message per cell, and sends each result back. */
import { parentPort } from 'node:worker_threads';
import type { CellJob } from './loadCells.ts';
import { runCell, type RunOptions } from './runCell.ts';

interface Request {
  readonly index: number;
  readonly job: CellJob;
  readonly options: RunOptions;
}

parentPort?.on('message', (request: Request) => {
  parentPort?.postMessage({ index: request.index, result: runCell(request.job, request.options) });
});
