// Slots and operands are in range by construction, so `!` marks them (no run-time cost).
/**
 * Why the bit-parallel sweep runs its program on 64-bit words: the 16-input bank's word program
 * (built and compiled as `WordSweep.plan` does) run over all 65,536 vectors by the runner's two
 * widths, `runWords32` (`Int32Array`, 32 vectors a word) and `runWords64` (`BigUint64Array` over the
 * same buffer, 64 vectors a word), with the same operations, one word a round. Only the program is
 * timed (no plan, no inputs loaded, no levels written), on CPU time, the fastest of ten runs after
 * ten warm ones.
 */
import { wordPlan, wordPlanRefusal } from '../src/core/analysis/vectorsWordPlan.ts';
import { runWords32, runWords64 } from '../src/core/analysis/wordRun.ts';
import type { Netlist } from '../src/core/model/netlist.ts';
import { ComponentTables } from '../src/core/tables/componentTables.ts';
import { prepare } from './measure.ts';
import { cpuSeconds } from './timing.ts';

export interface LaneTimes {
  readonly vectors: number;
  readonly int32Seconds: number;
  readonly bigUint64Seconds: number;
}

export function measureLaneWidths(netlist: Netlist): LaneTimes {
  const { simulator, compiled: c } = prepare(netlist);
  const vectors = 2 ** c.netlist.inputs.length;
  const tables = new ComponentTables(c, { schedule: simulator.drivenSchedule() });
  const plan = wordPlanRefusal(c, tables, vectors) === null ? wordPlan(c, tables, c.outputNets) : null;
  if (plan === null) throw new Error(`${netlist.name}: the cell does not take the bit-parallel path`);
  const { ops, slotCount } = plan.program.compiled([...plan.high, ...plan.floating]);
  const mem32 = new Int32Array(slotCount * 128).map(() => (Math.random() * 2 ** 32) | 0);
  mem32.fill(0, 0, 128).fill(-1, 128, 256);
  const mem64 = new BigUint64Array(mem32.buffer);
  return {
    vectors,
    int32Seconds: fastest(() => {
      for (let v = 0; v < vectors; v += 4096) runWords32(ops, mem32, 128);
    }),
    bigUint64Seconds: fastest(() => {
      for (let v = 0; v < vectors; v += 4096) runWords64(ops, mem64, 64);
    }),
  };
}

function fastest(run: () => void): number {
  for (let i = 0; i < 10; i++) run();
  let best = Infinity;
  for (let i = 0; i < 10; i++) {
    const start = cpuSeconds();
    run();
    best = Math.min(best, cpuSeconds() - start);
  }
  return best;
}
