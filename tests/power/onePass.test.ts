/**
 * One pass per edit, counted: the worker's jobs, the command line and the page each compile a
 * netlist once and solve each vector (or step) once, whatever reads the results (the check, the
 * power counters, the level strips). Counts are facts of our own design, checked by hand.
 */
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import * as compileModule from '../../src/core/compile/compile.ts';
import { Simulator } from '../../src/core/solver/simulator.ts';
import { analyseCell } from '../../src/core/power/cellAnalysis.ts';
import { powerFromCounts, powerReport } from '../../src/core/power/powerReport.ts';
import { DEFAULT_POWER_SETTINGS } from '../../src/core/power/settings.ts';
import { DEFAULT_TECHNOLOGY } from '../../src/core/model/technology.ts';
import { run } from '../../src/cli/main.ts';
import { runJob } from '../../src/worker/runJob.ts';
import { startAnalysis } from '../../src/state/analysis.ts';
import { commitDoc, loadDesign, resetStore, store } from '../../src/state/store.ts';
import { moveItems } from '../../src/core/sheet/transform.ts';
import { setJobRunnerFactory } from '../../src/worker/runner.ts';
import { design, nand2, nandLatch } from '../cells.ts';

vi.mock('../../src/core/compile/compile.ts', async (importOriginal) => {
  const original = await importOriginal<typeof compileModule>();
  return { ...original, compile: vi.fn(original.compile) };
});

const compiles = vi.mocked(compileModule.compile);
let fresh: ReturnType<typeof vi.spyOn>;
let next: ReturnType<typeof vi.spyOn>;

beforeEach(() => {
  compiles.mockClear();
  fresh = vi.spyOn(Simulator.prototype, 'solveFresh');
  next = vi.spyOn(Simulator.prototype, 'solveNext');
});

afterEach(() => vi.restoreAllMocks());

const solves = (): number => fresh.mock.calls.length + next.mock.calls.length;

const LATCH_STEPS = [
  { SN: '0', RN: '1' },
  { SN: '1', RN: '1' },
  { SN: '1', RN: '0' },
] as const;

describe('the worker jobs', () => {
  it('a sweep compiles once and solves each of the 2^n vectors once for table and power', () => {
    const result = runJob({ kind: 'sweep', revision: 1, cell: design(nand2) });
    expect(compiles).toHaveBeenCalledTimes(1);
    expect(solves()).toBe(4);
    expect(result.kind === 'sweep' && result.power?.vectors).toHaveLength(4);
  });

  it('a sequence solves each step once for report, strips and power', () => {
    const result = runJob({ kind: 'sequence', revision: 1, cell: design(nandLatch), steps: LATCH_STEPS });
    expect(compiles).toHaveBeenCalledTimes(1);
    expect(solves()).toBe(3);
    if (result.kind !== 'sweep' && result.kind !== 'sequence') throw new Error('expected a check result');
    expect(result.stepLevels).toHaveLength(3);
    expect(result.report.steps).toHaveLength(3);
    expect(result.power?.vectors).toHaveLength(3);
  });

  it('the shared pass gives the same figures as a power report of its own', () => {
    const { power } = analyseCell(nand2, { power: { activity: 'random' } });
    const alone = powerReport(nand2, DEFAULT_TECHNOLOGY, DEFAULT_POWER_SETTINGS);
    expect(power).not.toBeNull();
    if (power !== null) expect(powerFromCounts(power, DEFAULT_POWER_SETTINGS)).toEqual(alone);
  });
});

describe('the command line', () => {
  it('check --power runs one sweep per cell', async () => {
    const io = { out: () => {}, err: () => {}, colour: false };
    // tw_nand2 has two inputs: four vectors, each solved once for the findings and the power.
    await run(['check', 'public/examples/tidewater-cells.sp', '--cell', 'tw_nand2', '--power'], io);
    expect(solves()).toBe(4);
    expect(compiles).toHaveBeenCalledTimes(1);
  });
});

describe('the page', () => {
  it('compiles once per netlist revision, and not for a move that keeps the netlist', () => {
    resetStore();
    setJobRunnerFactory(() => ({ run: () => new Promise(() => {}), cancel: () => {} }));
    const stop = startAnalysis();
    compiles.mockClear();
    loadDesign(design(nand2));
    expect(compiles).toHaveBeenCalledTimes(1);
    const { sheet } = store.getState().doc;
    const all = { parts: sheet.parts.map((p) => p.id), wires: sheet.wires.map((w) => w.id) };
    commitDoc((doc) => ({ ...doc, sheet: moveItems(doc.sheet, all, 3, 2) }));
    expect(store.getState().revision).toBe(2);
    expect(store.getState().netlistRevision).toBe(1);
    expect(compiles).toHaveBeenCalledTimes(1);
    stop();
  });
});
