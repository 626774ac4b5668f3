/**
 * The simulation slice of the one store, driven by the analysis wiring as the app starts it, with
 * jobs run in-process by a runner the test finishes by hand.
 */
import { describe, expect, it, vi } from 'vitest';
import {
  cancelJob,
  pickStep,
  runSequence,
  selectRow,
  setPowerSettings,
  setUndrivenInputs,
  stepVector,
  toggleInput,
} from '../../src/state/simulation.ts';
import { SWEEP_DEBOUNCE_MS } from '../../src/state/analysis.ts';
import { loadDesign, setDesignFields, store } from '../../src/state/store.ts';
import { runJob } from '../../src/worker/runJob.ts';
import type { CellDesign } from '../../src/core/document/design.ts';
import { design, inverter, nand2, nand2MissingPullUp, nandLatch, resistorLoadInverter } from '../cells.ts';
import { runner, settle, startQueued, useHeldRunner } from './heldRunner.ts';
import { reportRows } from '../../src/core/analysis/sweepColumns.ts';
import type { CheckResult } from '../../src/worker/protocol.ts';

/** A finished sweep's rows, none when there is no result. */
const rowsOf = (result: CheckResult | null | undefined) =>
  result === null || result === undefined ? [] : reportRows(result.report);

const state = () => store.getState().simulation;
useHeldRunner();

const LATCH_STEPS = [
  { SN: '0', RN: '1' },
  { SN: '1', RN: '1' },
] as const;

function withLatchSteps(d: CellDesign): CellDesign {
  return { ...d, sequences: [{ name: 'set, hold', steps: LATCH_STEPS }] };
}

describe('live solve', () => {
  // CMOS inverter: Y = !A (common practice, no source).
  it('re-solves on a toggle and steps through combinations', () => {
    loadDesign(design(inverter));
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
    loadDesign(design(resistorLoadInverter));
    toggleInput('A');
    const traces = state().live?.traces ?? [];
    expect(traces).toHaveLength(1);
    expect(traces[0]?.chain).toEqual(['VDD', 'R1', 'Y', 'N1', 'GND']);
    expect(traces[0]?.current).toBeCloseTo(2.5 / 43.25e3, 9);
  });

  it('keeps a latch state when both inputs release it (stored charge carried)', () => {
    loadDesign(withLatchSteps(design(nandLatch)));
    pickStep(1);
    expect(state().live?.net('Q')?.level).toBe('1');
    expect(state().selectedStep).toBe(1);
  });
});

describe('sweep jobs and revisions', () => {
  it('fills the table, the power figures and the sizing after edits pause', async () => {
    loadDesign(design(nand2MissingPullUp));
    expect(state().sweep.status).toBe('idle');
    await settle();
    expect(state().sweep.status).toBe('done');
    expect(state().sizing.status).toBe('done');
    expect(state().power?.vectors).toHaveLength(4);
    expect(rowsOf(state().sweep.result)[2]?.outputs['Y']).toBe('Z');
  });

  it('starts at once when a design opens after a quiet spell; close edits wait until they pause', async () => {
    await vi.advanceTimersByTimeAsync(SWEEP_DEBOUNCE_MS); // nothing changed since start-up
    loadDesign(design(nand2));
    expect(state().sweep.status).toBe('idle'); // the change is finished before any job starts
    await Promise.resolve();
    expect(state().sweep.status).toBe('running');
    runner.finishAll();
    await vi.advanceTimersByTimeAsync(SWEEP_DEBOUNCE_MS / 2);
    setDesignFields({ expectations: { Y: '!(A & B)' } });
    await vi.advanceTimersByTimeAsync(SWEEP_DEBOUNCE_MS / 2);
    expect(state().sweep.status).toBe('idle'); // half a pause after an edit that followed closely
    await vi.advanceTimersByTimeAsync(SWEEP_DEBOUNCE_MS / 2 + 1);
    expect(state().sweep.status).toBe('running');
  });

  it('a flipped input waits for the pause, even after a quiet spell: a run of toggles starts one answer', async () => {
    loadDesign(design(nand2));
    await settle();
    await vi.advanceTimersByTimeAsync(SWEEP_DEBOUNCE_MS);
    toggleInput('A');
    await vi.advanceTimersByTimeAsync(SWEEP_DEBOUNCE_MS / 2);
    toggleInput('B');
    await vi.advanceTimersByTimeAsync(SWEEP_DEBOUNCE_MS / 2);
    expect(state().vectorDc.status).toBe('idle');
    await vi.advanceTimersByTimeAsync(SWEEP_DEBOUNCE_MS / 2 + 1);
    expect(runner.kinds()).toEqual(['vector-dc']);
  });

  it('starts sizing and the level-1 answer once the table is done', async () => {
    loadDesign(design(nand2));
    await startQueued();
    expect(new Set(runner.kinds())).toEqual(new Set(['sweep'])); // the start-up's and this design's
    expect(state().sizing.status).toBe('idle');
    expect(state().vectorDc.status).toBe('idle');
    runner.finishAll();
    await vi.advanceTimersByTimeAsync(0);
    expect(state().sweep.status).toBe('done');
    expect(runner.kinds().sort()).toEqual(['sizing', 'vector-dc']);
  });

  it('drops a result computed for an older revision', async () => {
    loadDesign(design(nand2MissingPullUp));
    await startQueued();
    const stale = runner.pending.splice(0);
    loadDesign(design(nand2));
    const revision = store.getState().revision;
    for (const p of stale) p.resolve(runJob(p.job)); // the old job finishes late
    await vi.runAllTimersAsync();
    expect(state().sweep.result).toBeNull();
    await settle();
    expect(state().sweep.result?.revision).toBe(revision);
    expect(rowsOf(state().sweep.result).every((v) => v.findings.length === 0)).toBe(true);
  });

  it('keeps results and the netlist object when a revision changes nothing the analysis reads', async () => {
    loadDesign(design(nand2));
    await settle();
    const { netlistRevision, design: before } = store.getState();
    const analysisRevision = state().analysisRevision;
    setDesignFields({ notes: 'reviewed' });
    expect(store.getState().revision).toBeGreaterThan(netlistRevision);
    expect(store.getState().netlistRevision).toBe(netlistRevision);
    expect(store.getState().design.netlist).toBe(before.netlist);
    expect(state().sweep.status).toBe('done');
    expect(state().analysisRevision).toBe(analysisRevision);
  });

  it('starts a new analysis revision when an expected function changes', async () => {
    loadDesign(design(nand2));
    await settle();
    setDesignFields({ expectations: { Y: '!(A & B)' } });
    expect(state().analysisRevision).toBe(store.getState().revision);
    expect(state().sweep.status).toBe('idle');
    expect(state().sizing.status).toBe('done');
  });

  it('shows a cancelled sweep as cancelled', async () => {
    loadDesign(design(nand2));
    await startQueued();
    expect(state().sweep.status).toBe('running');
    cancelJob('sweep');
    return vi.runAllTimersAsync().then(() => expect(state().sweep.status).toBe('cancelled'));
  });

  it('selects a row: the sheet shows that vector', async () => {
    loadDesign(design(nand2));
    await settle();
    selectRow(3);
    expect(state().vector).toEqual({ A: '1', B: '1' });
    expect(state().live?.net('Y')?.level).toBe('0');
    expect(state().selectedRow).toBe(3);
  });

  it('sweeps again with undriven inputs when asked', async () => {
    loadDesign(design(nand2));
    await settle();
    setUndrivenInputs(true);
    expect(state().sweep.status).toBe('idle');
    await settle();
    expect(rowsOf(state().sweep.result)).toHaveLength(9);
  });

  it('runs the chosen sequence in its own lane', async () => {
    loadDesign(withLatchSteps(design(nandLatch)));
    const running = runSequence();
    await settle();
    await running;
    expect(state().sequence.result?.report.steps?.map((s) => s.outputs['Q'])).toEqual(['1', '1']);
  });
});

describe('power figures', () => {
  it('finish again for a new clock without running any job', async () => {
    loadDesign(design(inverter));
    await settle();
    const before = state().power;
    setPowerSettings({ ...state().powerSettings, frequency: 2 * state().powerSettings.frequency });
    expect(runner.pending).toHaveLength(0);
    expect(state().power?.dynamicWatts).toBeCloseTo(2 * (before?.dynamicWatts ?? NaN), 20);
    expect(state().power?.averageStaticWatts).toBe(before?.averageStaticWatts);
  });

  it('come from the sequence when the activity is the chosen sequence', async () => {
    loadDesign(withLatchSteps(design(nandLatch)));
    await settle();
    setPowerSettings({ ...state().powerSettings, activity: 'sequence' });
    await settle();
    expect(state().sequence.status).toBe('done');
    expect(state().power?.activitySource).toBe('sequence');
    expect(state().power?.vectors).toHaveLength(LATCH_STEPS.length);
  });
});
