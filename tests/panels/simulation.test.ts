import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import {
  analyseDesign,
  cancelJob,
  pickStep,
  resetSimulation,
  runSequence,
  selectRow,
  simulationStore,
  stepVector,
  toggleInput,
  SWEEP_DEBOUNCE_MS,
} from '../../src/state/simulation.ts';
import { setJobRunnerFactory, type JobRunner } from '../../src/worker/runner.ts';
import { runJob } from '../../src/worker/jobs.ts';
import { JobCancelled } from '../../src/worker/client.ts';
import type { AnalysisJob, JobResult } from '../../src/worker/protocol.ts';
import {
  design,
  inverter,
  nand2,
  nand2MissingPullUp,
  nandLatch,
  resistorLoadInverter,
} from '../view/circuits.ts';

/** Runs jobs in-process but lets the test decide when each one finishes. */
class HeldRunner implements JobRunner {
  pending: { job: AnalysisJob; resolve: (r: JobResult) => void; reject: (e: Error) => void }[] = [];
  run(job: AnalysisJob): Promise<JobResult> {
    return new Promise((resolve, reject) => this.pending.push({ job, resolve, reject }));
  }
  cancel(): void {
    for (const p of this.pending.splice(0)) p.reject(new JobCancelled('cancelled'));
  }
  finishAll(): void {
    for (const p of this.pending.splice(0)) p.resolve(runJob(p.job));
  }
}

const state = () => simulationStore.getState();
let runner: HeldRunner;

beforeEach(() => {
  vi.useFakeTimers();
  resetSimulation();
  runner = new HeldRunner();
  setJobRunnerFactory(() => runner);
});

afterEach(() => {
  vi.useRealTimers();
});

async function settle(): Promise<void> {
  vi.advanceTimersByTime(SWEEP_DEBOUNCE_MS + 1);
  runner.finishAll();
  await vi.runAllTimersAsync();
}

describe('live solve', () => {
  // CMOS inverter: Y = !A (common practice, no source).
  it('re-solves on a toggle and steps through combinations', () => {
    analyseDesign(design(inverter), 1);
    expect(state().vector).toEqual({ A: '0' });
    expect(state().live?.net('Y')?.level).toBe('1');
    expect(state().live?.device('P1')).toBe('on');
    expect(state().live?.device('N1')).toBe('off');
    toggleInput('A');
    expect(state().live?.net('Y')?.level).toBe('0');
    stepVector(1);
    expect(state().vector).toEqual({ A: '0' });
  });

  // Same divider as the sweep test: 2.5 V across 40 kΩ + 3.25 kΩ (RCN table 3.3 Rn, from memory).
  it('draws the current path of the resistor-load inverter with its value', () => {
    analyseDesign(design(resistorLoadInverter), 1);
    toggleInput('A');
    const traces = state().live?.traces ?? [];
    expect(traces).toHaveLength(1);
    expect(traces[0].chain).toEqual(['VDD', 'R1', 'Y', 'N1', 'GND']);
    expect(traces[0].current).toBeCloseTo(2.5 / 43.25e3, 9);
  });

  it('keeps a latch state when both inputs release it (stored charge carried)', () => {
    analyseDesign(design(nandLatch), 1);
    pickStep(1, [
      { SN: '0', RN: '1' },
      { SN: '1', RN: '1' },
    ]);
    expect(state().live?.net('Q')?.level).toBe('1');
    expect(state().selectedStep).toBe(1);
  });
});

describe('sweep jobs and revisions', () => {
  it('fills the table after edits pause', async () => {
    analyseDesign(design(nand2MissingPullUp), 1);
    expect(state().sweep.status).toBe('idle');
    await settle();
    expect(state().power.status).toBe('done');
    expect(state().sweep.status).toBe('done');
    expect(state().sweep.result?.report.vectors?.[2].outputs.Y).toBe('Z');
  });

  it('drops a result computed for an older revision', async () => {
    analyseDesign(design(nand2MissingPullUp), 1);
    vi.advanceTimersByTime(SWEEP_DEBOUNCE_MS + 1);
    const stale = runner.pending.splice(0);
    analyseDesign(design(nand2), 2);
    for (const p of stale) p.resolve(runJob(p.job)); // the old job finishes late
    await vi.runAllTimersAsync();
    expect(state().sweep.revision).toBe(2);
    expect(state().sweep.result).toBeNull();
    await settle();
    expect(state().sweep.result?.revision).toBe(2);
    expect(state().sweep.result?.report.vectors?.every((v) => v.findings.length === 0)).toBe(true);
  });

  it('keeps results when a revision changes nothing the analysis reads', async () => {
    const d = design(nand2);
    analyseDesign(d, 1);
    await settle();
    analyseDesign({ ...d, notes: 'moved a part' }, 2);
    expect(state().sweep.status).toBe('done');
    expect(state().analysisRevision).toBe(1);
  });

  it('shows a cancelled sweep as cancelled', async () => {
    analyseDesign(design(nand2), 1);
    vi.advanceTimersByTime(SWEEP_DEBOUNCE_MS + 1);
    expect(state().sweep.status).toBe('running');
    cancelJob('sweep');
    await vi.runAllTimersAsync();
    expect(state().sweep.status).toBe('cancelled');
  });

  it('selects a row: the sheet shows that vector', async () => {
    analyseDesign(design(nand2), 1);
    await settle();
    selectRow(3);
    expect(state().vector).toEqual({ A: '1', B: '1' });
    expect(state().live?.net('Y')?.level).toBe('0');
    expect(state().selectedRow).toBe(3);
  });

  it('runs a sequence in its own lane', async () => {
    analyseDesign(design(nandLatch), 1);
    const running = runSequence([
      { SN: '0', RN: '1' },
      { SN: '1', RN: '1' },
    ]);
    await settle();
    await running;
    expect(state().sequence.result?.report.steps?.map((s) => s.outputs.Q)).toEqual(['1', '1']);
  });
});
