/**
 * One set of power defaults: the same cell gives the same figure in the app (the power figures of the
 * store's simulation slice, which the power section shows) and from `railwise check --power`, with
 * the same default clock, load and activity, and both state the load they used.
 */
import { readFileSync } from 'node:fs';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { run } from '../../src/cli/main.ts';
import { parseDesignFile } from '../../src/core/format/designFile.ts';
import { DEFAULT_POWER_SETTINGS } from '../../src/core/power/settings.ts';
import type { PowerReport } from '../../src/core/power/types.ts';
import { SWEEP_DEBOUNCE_MS, startAnalysis } from '../../src/state/analysis.ts';
import { loadDesign, resetStore, store } from '../../src/state/store.ts';
import { runJob } from '../../src/worker/runJob.ts';
import { setJobRunnerFactory } from '../../src/worker/runner.ts';

const FILE = 'public/examples/lamp-inverter.railwise.json';

async function cliPower(...flags: string[]): Promise<{ power: PowerReport; text: string }> {
  let out = '';
  const io = { out: (t: string) => (out += t), err: () => {}, colour: false };
  expect(await run(['check', FILE, '--power', '--json', ...flags], io)).toBe(0);
  const power = (JSON.parse(out) as { power: PowerReport }).power;
  out = '';
  await run(['check', FILE, '--power', ...flags], io);
  return { power, text: out };
}

async function appPower(): Promise<PowerReport | null> {
  loadDesign(parseDesignFile(readFileSync(FILE, 'utf8'), FILE));
  await new Promise((r) => setTimeout(r, SWEEP_DEBOUNCE_MS + 50));
  return store.getState().simulation.power;
}

let stop: () => void;

beforeEach(() => {
  resetStore();
  setJobRunnerFactory(() => ({ run: (job) => Promise.resolve(runJob(job)), cancel: () => {} }));
  stop = startAnalysis();
});

afterEach(() => stop());

describe('the same power figure in the app and on the command line', () => {
  it('with the defaults of both: 100 MHz, 10 fF per output, every vector equally likely', async () => {
    const app = await appPower();
    const cli = await cliPower();
    expect(app).not.toBeNull();
    expect(DEFAULT_POWER_SETTINGS).toEqual({ frequency: 100e6, load: 10e-15, activity: 'random' });
    for (const report of [app, cli.power]) {
      expect(report?.load).toBe(10e-15);
      expect(report?.frequency).toBe(100e6);
      expect(report?.activitySource).toBe('random');
    }
    expect(cli.power.totalWatts).toBeGreaterThan(0);
    expect(app?.totalWatts).toBe(cli.power.totalWatts);
    expect(app?.nets).toEqual(cli.power.nets);
    expect(cli.text).toMatch(/at 100 MHz and 10 fF per output/);
  });

  it('with the same load given to each', async () => {
    const cli = await cliPower('--load', '25f');
    store.setState((s) => ({
      simulation: { ...s.simulation, powerSettings: { ...DEFAULT_POWER_SETTINGS, load: 25e-15 } },
    }));
    const app = await appPower();
    expect(cli.power.load).toBe(25e-15);
    expect(app?.totalWatts).toBe(cli.power.totalWatts);
  });
});
