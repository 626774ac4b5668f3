/**
 * Sweep rows of issue-sized cells, all on CPU time (the machine is shared; wall time lies):
 * - the engine's exhaustive sweep of the 16-input adder bank on the bit-parallel path (component
 *   tables built, inputs loaded, every output's level written) against the same sweep one vector at a
 *   time, and the whole check (`checkSweep`: rows in columns, findings) on both paths;
 * - `railwise check` as a user runs it (cliCheck.ts): text and `--json` of the 65,536-vector bank,
 *   and the 24-input bank of 16,777,216 vectors, with peak memory.
 * Each row carries its CPU ns per transistor per vector; run.ts divides by the floor of the same run.
 */
import { spawnSync } from 'node:child_process';
import { join } from 'node:path';
import { checkSweep } from '../src/core/analysis/check.ts';
import type { WordRows } from '../src/core/analysis/vectorsWordPass.ts';
import { WordSweep } from '../src/core/analysis/vectorsWordPass.ts';
import type { Netlist } from '../src/core/model/netlist.ts';
import { measureCheck, type CliResult } from './cliCheck.ts';
import { measureLaneWidths } from './laneWidths.ts';
import { prepare } from './measure.ts';
import { cpuSeconds } from './timing.ts';

export interface CpuRow {
  readonly name: string;
  readonly transistors: number;
  readonly vectors: number;
  readonly cpuSeconds: number;
  readonly nsPerTransistorVector: number;
  /** Peak resident memory of the command, for `railwise check` rows. */
  readonly peakMb?: number;
  readonly outputMb?: number;
}

function row(name: string, netlist: Netlist, vectors: number, cpu: number): CpuRow {
  const transistors = prepare(netlist).transistors;
  return {
    name,
    transistors,
    vectors,
    cpuSeconds: cpu,
    nsPerTransistorVector: (cpu * 1e9) / (transistors * vectors),
  };
}

/** Warm runs before the timed ones, and timed runs: the floor loop is measured warm the same way. */
const WARM_RUNS = 10;
const TIMED_RUNS = 10;

/**
 * The bit-parallel sweep alone, each run on a freshly compiled cell (compile and simulator made
 * before the clock starts). Inside the timing, on CPU time: `WordSweep.plan` (the driven schedule
 * and topology, the group shapes and signatures, every component table, the word program built and
 * compiled, its memory allocated) and `sweep.run` (for each block of 4,096 vectors: the inputs'
 * words loaded, the program run, every output's level words and the fast lanes handed to the rows,
 * the rows' plain runs counted; vectors that fall back would be solved by the engine, none does on
 * the bank). The rows here keep one word of each block, so writing them into columns (the
 * recorder's work) is in the check-sweep rows, not here. Two rows: the first run, as a one-off
 * sweep pays it (the optimiser has compiled little yet), and the fastest of ten after ten warm
 * runs, measured as the floor loop is.
 */
export function measureWordSweep(name: string, netlist: Netlist): CpuRow[] {
  let sink = 0;
  const rows: WordRows = {
    addWords: (levels) => (sink ^= levels[0] ?? 0),
    addPlains: () => {},
    add: (r) => (sink ^= r.levels[0] ?? 0),
  };
  const once = (): { vectors: number; cpu: number } => {
    const p = prepare(netlist);
    const start = cpuSeconds();
    const sweep = WordSweep.plan(p.simulator, p.compiled.outputNets, {});
    if (sweep === null) throw new Error(`${name}: the cell does not take the bit-parallel path`);
    const vectors = sweep.run(rows);
    return { vectors, cpu: cpuSeconds() - start };
  };
  const first = once();
  for (let i = 1; i < WARM_RUNS; i++) once();
  let best = Infinity;
  for (let i = 0; i < TIMED_RUNS; i++) best = Math.min(best, once().cpu);
  if (sink === 0.5) console.log(''); // keep the sink alive
  return [
    row(`${name} (first run)`, netlist, first.vectors, first.cpu),
    row(`${name} (warm)`, netlist, first.vectors, best),
  ];
}

/** The word program alone on 32-bit and on 64-bit words (laneWidths.ts): why the sweep runs 64. */
export function measureWordWidths(name: string, netlist: Netlist): CpuRow[] {
  const t = measureLaneWidths(netlist);
  return [
    row(`${name} program, 32-bit words`, netlist, t.vectors, t.int32Seconds),
    row(`${name} program, 64-bit words`, netlist, t.vectors, t.bigUint64Seconds),
  ];
}

/** `checkSweep` on the bit-parallel path or one vector at a time. */
export function measureCheckCpu(name: string, netlist: Netlist, wordParallel: boolean): CpuRow {
  const start = cpuSeconds();
  const { vectors } = checkSweep(netlist, { wordParallel }).summary;
  return row(name, netlist, vectors, cpuSeconds() - start);
}

/** `railwise check` runs of the bundled command (built here first, as `npm install` does). */
export async function measureCommand(
  name: string,
  netlist: Netlist,
  args: readonly string[],
): Promise<CpuRow> {
  spawnSync(process.execPath, [join(import.meta.dirname, '..', 'bin', 'build-cli.mjs')], {
    stdio: 'inherit',
  });
  const r: CliResult = await measureCheck(name, netlist, args);
  if (r.status !== 0) throw new Error(`${name}: railwise check exited with ${r.status}`);
  return { ...row(name, netlist, r.vectors, r.cpuSeconds), peakMb: r.peakMb, outputMb: r.outputMb };
}
