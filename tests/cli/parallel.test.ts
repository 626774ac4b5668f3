// Behaviour of our own command, not published values: no source applies.
/** Worker threads give the same results, in the same order, as the main thread. */
import { describe, expect, it } from 'vitest';
import { loadCells, type CellJob } from '../../src/cli/loadCells.ts';
import { PARALLEL_WORK_THRESHOLD, runCells, runInWorkers, workerCount } from '../../src/cli/parallel.ts';
import type { RunOptions } from '../../src/cli/runCell.ts';

const OPTIONS: RunOptions = { allNets: false, undriven: false, sizing: false, load: 0 };

function jobs(): CellJob[] {
  const loaded = loadCells(['public/examples/tidewater-cells.sp'], {
    expect: {},
    supply: [],
    ground: [],
    treatAs: new Map(),
    topOnly: false,
  });
  return loaded.cells.flatMap((c) => ('job' in c ? [c.job] : []));
}

describe('parallel checking', () => {
  it('stays on one thread for small work and honours --jobs', () => {
    const small = jobs();
    expect(
      small.reduce((s, j) => s + 2 ** j.netlist.inputs.length * (j.netlist.devices.length + 1), 0),
    ).toBeLessThan(PARALLEL_WORK_THRESHOLD);
    expect(workerCount(small, OPTIONS)).toBe(1);
    expect(workerCount(small, OPTIONS, 3)).toBe(3);
    expect(workerCount(small.slice(0, 2), OPTIONS, 8)).toBe(2);
  });

  it('returns the same results in the same order from two worker threads', async () => {
    const all = jobs();
    const serial = await runCells(all, OPTIONS, 1);
    // runInWorkers has no fallback to the main thread, so this fails if the workers do not run.
    const threaded = await runInWorkers(all, OPTIONS, 2);
    expect(threaded).toEqual(serial);
  });
});
