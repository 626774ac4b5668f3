/** `railwise export FILE --to spice|verilog|csv`: one cell to standard output. */
import { checkSequence, checkSweep } from '../core/analysis/check.ts';
import { exportTruthTableCsv } from '../core/netlist-io/csvExport.ts';
import { exportSpice } from '../core/netlist-io/spiceExport.ts';
import { exportVerilog } from '../core/netlist-io/verilogExport.ts';
import type { ExportArgs } from './args.ts';
import { loadCells, type CellJob } from './loadCells.ts';
import { failureOf, sequenceSteps } from './runCell.ts';
import { EXIT_OK, EXIT_UNUSABLE, UsageError } from './usage.ts';

export interface ExportOutput {
  readonly out: (text: string) => void;
  readonly err: (text: string) => void;
}

export function exportCommand(args: ExportArgs, io: ExportOutput): number {
  const loaded = loadCells([args.file], args);
  if (loaded.cells.length > 1) {
    const names = loaded.cells
      .map((c) => ('job' in c ? c.job.cell : 'failure' in c ? c.failure.cell : c.skipped.cell))
      .join(', ');
    throw new UsageError(`${args.file} is a library: pick one cell with --cell NAME (cells: ${names})`);
  }
  const [cell] = loaded.cells;
  if (cell === undefined) throw new UsageError(`${args.file}: no cell found`);
  if ('failure' in cell) {
    io.err(cell.failure.message);
    return EXIT_UNUSABLE;
  }
  if ('skipped' in cell) {
    io.err(`${cell.skipped.cell}: ${cell.skipped.reason}; not exported`);
    return EXIT_UNUSABLE;
  }
  try {
    io.out(exported(cell.job, args));
    return EXIT_OK;
  } catch (e) {
    io.err(`${args.file}: ${failureOf(e).message}`);
    return EXIT_UNUSABLE;
  }
}

function exported(job: CellJob, args: ExportArgs): string {
  switch (args.to) {
    case 'spice':
      return exportSpice(job.netlist, job.technology, {
        expectations: job.expectations,
        ...(job.sheet === undefined ? {} : { sheet: job.sheet }),
      });
    case 'verilog':
      return exportVerilog(job.netlist);
    case 'csv': {
      const options = { technology: job.technology, expectations: job.expectations };
      const report =
        args.sequence === undefined
          ? checkSweep(job.netlist, options)
          : checkSequence(job.netlist, sequenceSteps(job, args.sequence), options);
      return exportTruthTableCsv(report);
    }
  }
}
