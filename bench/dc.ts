/**
 * The level-1 DC rows: a 201-point transfer curve of a 4-input static gate, and the per-vector DC
 * pass over the whole truth table of a 6-input cell. Both are short, so each is repeated and the
 * fastest run reported (the median rides along), with the CPU time of all timed runs beside it.
 */
import { dcSweep } from '../src/core/dc/vectorDc.ts';
import { transferCurves } from '../src/core/dc/transfer.ts';
import type { Netlist } from '../src/core/model/netlist.ts';
import { DEFAULT_TECHNOLOGY } from '../src/core/model/technology.ts';
import { ao222, nandGate, transistorCount } from './generators/index.ts';
import { repeat } from './timing.ts';

export interface DcCaseResult {
  readonly name: string;
  readonly transistors: number;
  /** Operating points asked for: sweep points or vectors. */
  readonly points: number;
  readonly seconds: number;
  readonly medianSeconds: number;
  /** CPU seconds per run, averaged over the timed runs. */
  readonly cpuSecondsPerRun: number;
  readonly runs: number;
  /** The goal the issue set, seconds. */
  readonly targetSeconds: number;
}

function measure(
  name: string,
  netlist: Netlist,
  points: number,
  targetSeconds: number,
  work: () => void,
): DcCaseResult {
  const cpu = process.cpuUsage();
  let sink = 0;
  const sample = repeat(
    () => {
      work();
      sink++;
    },
    { warmup: 10, warmupSeconds: 0.3, budgetSeconds: 1 },
  );
  const used = process.cpuUsage(cpu);
  const cpuSecondsPerRun = (used.user + used.system) / 1e6 / (sink || 1);
  return {
    name,
    transistors: transistorCount(netlist),
    points,
    seconds: sample.best,
    medianSeconds: sample.median,
    cpuSecondsPerRun,
    runs: sample.runs,
    targetSeconds,
  };
}

export function dcCases(): DcCaseResult[] {
  const nand4 = nandGate(4);
  const cell = ao222();
  return [
    measure('dc/transfer-201-points/nand4', nand4, 201, 0.05, () =>
      transferCurves(nand4, DEFAULT_TECHNOLOGY, { input: 'D', points: 201 }),
    ),
    measure('dc/every-vector/ao222-6-inputs', cell, 64, 1, () => dcSweep(cell, DEFAULT_TECHNOLOGY)),
  ];
}
