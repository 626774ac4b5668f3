/**
 * The level-1 DC views in the one store: the transfer curve and the shown vector's operating point
 * follow edits (a stale answer is dropped, never shown as current), run in the worker lanes, report
 * progress and can be cancelled. Jobs run in-process, finished when the test says.
 */
import { describe, expect, it, vi } from 'vitest';
import {
  openTransfer,
  setTransferConvention,
  setTransferHold,
  setTransferInput,
  startTransfer,
} from '../../src/state/dc.ts';
import { cancelJob, toggleInput } from '../../src/state/simulation.ts';
import { loadDesign, store } from '../../src/state/store.ts';
import { runJob } from '../../src/worker/runJob.ts';
import { design, inverter, nand2, resistorLoadInverter } from '../cells.ts';
import { runner, settle, startQueued, useHeldRunner } from './heldRunner.ts';

const state = () => store.getState().simulation;
useHeldRunner();

describe('the transfer curve', () => {
  it('is drawn once the view is opened, for the first input, and not before', async () => {
    loadDesign(design(nand2));
    await settle();
    expect(state().transfer.status).toBe('idle');
    openTransfer();
    await startQueued();
    expect(state().transfer).toMatchObject({ status: 'running', progress: { done: 100, total: 201 } });
    await settle();
    const report = state().transfer.result?.report;
    expect(report?.input).toBe('A');
    // Railwise holds B at 1, where the NAND's output follows A.
    expect(report?.hold).toEqual({ B: 1 });
  });

  it('an edit makes it stale: the curve goes, the late answer is dropped, a new one is drawn', async () => {
    loadDesign(design(inverter));
    openTransfer();
    await settle();
    const before = state().transfer.result;
    expect(before?.report?.curves['Y']).toBeDefined();
    setTransferHold('A', null); // no change to the request's meaning, but a new request object
    await startQueued();
    const late = runner.pending.splice(0);
    loadDesign(design(resistorLoadInverter));
    expect(state().transfer.status).toBe('idle');
    expect(state().transfer.result).toBeNull();
    for (const p of late) p.resolve(runJob(p.job));
    await vi.runAllTimersAsync();
    expect(state().transfer.result).toBeNull();
    await settle();
    const job = state().transfer.job;
    expect(job?.kind === 'transfer' && job.cell.netlist).toBe(store.getState().design.netlist);
    expect(state().transfer.status).toBe('done');
  });

  it('a new input or hold draws again; a new convention does not solve again', async () => {
    loadDesign(design(nand2));
    openTransfer();
    await settle();
    setTransferConvention('rails');
    await startQueued();
    expect(runner.kinds()).not.toContain('transfer');
    expect(state().transfer.status).toBe('done');
    setTransferInput('B');
    setTransferHold('A', '0');
    await settle();
    expect(state().transfer.result?.report).toMatchObject({ input: 'B', hold: { A: 0 }, holdChosen: [] });
  });

  it('can be cancelled', async () => {
    loadDesign(design(inverter));
    openTransfer();
    await startQueued();
    cancelJob('transfer');
    await vi.runAllTimersAsync();
    expect(state().transfer.status).toBe('cancelled');
    void startTransfer();
    await settle();
    expect(state().transfer.status).toBe('done');
  });
});

describe("the shown vector's level-1 answer", () => {
  it('follows the vector: a toggle drops the old answer and computes the new one', async () => {
    loadDesign(design(resistorLoadInverter));
    await settle();
    expect(state().vectorDc.result?.comparison?.inputs).toEqual({ A: '0' });
    toggleInput('A');
    expect(state().vectorDc.status).toBe('idle');
    await settle();
    const c = state().vectorDc.result?.comparison;
    expect(c?.inputs).toEqual({ A: '1' });
    expect(c?.dcCurrent).toBeGreaterThan(0);
  });

  it('an answer for the vector before is dropped', async () => {
    loadDesign(design(resistorLoadInverter));
    await settle();
    toggleInput('A');
    await startQueued();
    const late = runner.pending.splice(0);
    toggleInput('A');
    for (const p of late) p.resolve(runJob(p.job));
    await vi.runAllTimersAsync();
    expect(state().vectorDc.result).toBeNull();
    await settle();
    expect(state().vectorDc.result?.comparison?.inputs).toEqual({ A: '0' });
  });
});
