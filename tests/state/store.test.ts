/**
 * The one store: its slices, the revisions moved where the design is derived, and the analysis
 * wiring that runs without any panel mounted (the sheet overlay reads `simulation.live`).
 */
import { afterEach, describe, expect, it } from 'vitest';
import { startAnalysis } from '../../src/state/analysis.ts';
import { INITIAL_SIMULATION } from '../../src/state/simulationSlice.ts';
import { toggleInput } from '../../src/state/simulation.ts';
import { loadDesign, resetStore, setDesignFields, store, undo } from '../../src/state/store.ts';
import { setJobRunnerFactory } from '../../src/worker/runner.ts';
import { design, inverter, nand2 } from '../cells.ts';

let stop: (() => void) | null = null;

afterEach(() => {
  stop?.();
  stop = null;
});

describe('one store of slices', () => {
  it('holds every slice in one state, and reset starts them all over', () => {
    resetStore();
    const s = store.getState();
    for (const key of ['doc', 'design', 'openCell', 'history', 'selection', 'viewport', 'simulation'])
      expect(s).toHaveProperty(key);
    resetStore();
    expect(store.getState().simulation).toBe(INITIAL_SIMULATION);
  });

  it('moves the netlist revision only when the derived netlist or the technology changes', () => {
    resetStore();
    loadDesign(design(nand2));
    const first = store.getState();
    expect(first.netlistRevision).toBe(first.revision);
    setDesignFields({ notes: 'reviewed by the lamp team' });
    expect(store.getState().netlistRevision).toBe(first.netlistRevision);
    setDesignFields({ technology: { ...first.design.technology, vdd: 1.8 } });
    expect(store.getState().netlistRevision).toBe(store.getState().revision);
    undo();
    expect(store.getState().netlistRevision).toBe(store.getState().revision);
  });
});

describe('the analysis wiring', () => {
  it('gives the sheet its levels with no panel mounted, and follows every new netlist', () => {
    resetStore();
    setJobRunnerFactory(() => ({ run: () => new Promise(() => {}), cancel: () => {} }));
    stop = startAnalysis();
    loadDesign(design(inverter));
    // CMOS inverter: Y = !A (common practice, no source).
    expect(store.getState().simulation.live?.net('Y')?.level).toBe('1');
    toggleInput('A');
    expect(store.getState().simulation.live?.net('Y')?.level).toBe('0');
    loadDesign(design(nand2));
    // The vector keeps A = 1 and completes B = 0: a NAND2 with one input low gives Y = 1.
    expect(store.getState().simulation.vector).toEqual({ A: '1', B: '0' });
    expect(store.getState().simulation.live?.net('Y')?.level).toBe('1');
  });

  it('stops following when asked', () => {
    resetStore();
    const stopNow = startAnalysis();
    stopNow();
    loadDesign(design(inverter));
    expect(store.getState().simulation.live?.net('Y')).toBeUndefined();
  });
});
