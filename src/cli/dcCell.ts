/**
 * `--transfer` for one cell (`--dc` rides on the check's own pass, in runCell.ts). Plain data in and
 * out, like runCell.ts, so a worker thread can run it.
 */
import { parseHold } from '../core/dc/holdVector.ts';
import { transferCurves, type TransferReport } from '../core/dc/transfer.ts';
import type { TransferChoice } from './args.ts';
import type { CellJob } from './loadCells.ts';

export function cellTransfer(job: CellJob, choice: TransferChoice): TransferReport {
  const inputs = job.netlist.inputs;
  // Pin names match without regard to case, as the SPICE reader matches nets.
  const input = inputs.find((n) => n.toLowerCase() === choice.input.toLowerCase()) ?? choice.input;
  return transferCurves(job.netlist, job.technology, {
    input,
    hold: choice.hold === undefined ? {} : parseHold(choice.hold, inputs),
    convention: choice.convention,
    points: choice.points,
  });
}
