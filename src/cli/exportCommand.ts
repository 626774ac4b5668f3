/** `railwise export FILE --to spice|verilog|csv`: one cell to standard output. */
import { checkSequence, checkSweep } from '../core/analysis/check.ts';
import { exportTruthTableCsv } from '../core/netlist-io/csvExport.ts';
import { exportSpice } from '../core/netlist-io/spiceExport.ts';
import { exportVerilog } from '../core/netlist-io/verilogExport.ts';
import type { ExportArgs } from './args.ts';
import { loadOneCell, type CellJob } from './loadCells.ts';
import { failureOf, sequenceSteps } from './runCell.ts';
import { EXIT_OK, EXIT_UNUSABLE } from './usage.ts';

export interface ExportOutput {
  readonly out: (text: string) => void;
  readonly err: (text: string) => void;
}

export function exportCommand(args: ExportArgs, io: ExportOutput): number {
  const cell = loadOneCell(args.file, args);
  if ('problem' in cell) {
    io.err(`${cell.problem}; not exported`);
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
