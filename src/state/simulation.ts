/**
 * The simulation slice: the selected input vector, the live solve of the sheet for it, and the
 * sweep, sequence and power jobs run in the worker. Every job carries the analysis revision it was
 * computed for (see ./lanes); results for an older revision are dropped, so the panels never show
 * a stale table beside a newer drawing. Actions are module functions, callable from panels, keys
 * and tests alike.
 */
import { createStore } from 'zustand/vanilla';
import { useStore } from 'zustand';
import type { Design, InputVector } from '../core/model/design.ts';
import { LiveSession } from '../core/view/liveSession.ts';
import { heldSteps } from '../core/view/sequenceEdit.ts';
import { solvedView, type SolvedView } from '../core/view/solvedView.ts';
import {
  completeVector,
  stepVector as nextVector,
  toggleInput as flipInput,
} from '../core/view/vectorControl.ts';
import type { TableView } from '../core/view/vectorTable.ts';
import { Lane, acceptKinds } from '../worker/lanes.ts';
import {
  IDLE_JOB,
  jobSize,
  type CheckResult,
  type JobState,
  type PowerSettings,
  type PowerSizingResult,
} from '../worker/protocol.ts';
import { store } from './store.ts';

export type { JobState, JobStatus } from '../worker/protocol.ts';

export interface SimulationState {
  /** Document revision the slice last saw. */
  readonly revision: number;
  /** The revision at which the netlist, technology or expected functions last changed: jobs carry it. */
  readonly analysisRevision: number;
  readonly design: Design | null;
  readonly vector: InputVector;
  readonly live: SolvedView | null;
  readonly liveError: string | null;
  readonly sweep: JobState<CheckResult>;
  readonly sequence: JobState<CheckResult>;
  readonly power: JobState<PowerSizingResult>;
  readonly powerSettings: PowerSettings;
  readonly sequenceIndex: number;
  readonly selectedStep: number | null;
  readonly stripNets: readonly string[];
  readonly table: TableView;
  readonly selectedRow: number | null;
  /** Sweeps also leave each input undriven (Z), for pins a bus may release. */
  readonly undrivenInputs: boolean;
}

/** Sweeps up to this many vectors start by themselves after each edit; larger ones wait for a click. */
export const AUTO_SWEEP_VECTORS = 1024;
/** Waits for edits to pause (a drag changes the revision every frame) before starting a sweep. */
export const SWEEP_DEBOUNCE_MS = 120;
/** 100 MHz and 10 fF per output: round defaults for a first look (common practice, no source). */
export const DEFAULT_POWER_SETTINGS: PowerSettings = { freq: 100e6, load: 10e-15, activity: 'random' };

function initialState(): SimulationState {
  return {
    revision: -1,
    analysisRevision: -1,
    design: null,
    vector: {},
    live: null,
    liveError: null,
    sweep: IDLE_JOB,
    sequence: IDLE_JOB,
    power: IDLE_JOB,
    powerSettings: DEFAULT_POWER_SETTINGS,
    sequenceIndex: 0,
    selectedStep: null,
    stripNets: [],
    table: { sort: 'vector', direction: 'ascending', filter: 'all' },
    selectedRow: null,
    undrivenInputs: false,
  };
}

export const simulationStore = createStore<SimulationState>(initialState);

export function useSimulation<T>(selector: (state: SimulationState) => T): T {
  return useStore(simulationStore, selector);
}

const set = (patch: Partial<SimulationState>): void => simulationStore.setState(patch);
const get = (): SimulationState => simulationStore.getState();

const lanes = {
  sweep: new Lane<CheckResult>('sweep', {
    publish: (sweep) => set({ sweep }),
    read: () => get().sweep,
    revision: () => get().analysisRevision,
    accept: acceptKinds(['sweep', 'sequence']),
  }),
  sequence: new Lane<CheckResult>('sequence', {
    publish: (sequence) => set({ sequence }),
    read: () => get().sequence,
    revision: () => get().analysisRevision,
    accept: acceptKinds(['sweep', 'sequence']),
  }),
  power: new Lane<PowerSizingResult>('power', {
    publish: (power) => set({ power }),
    read: () => get().power,
    revision: () => get().analysisRevision,
    accept: acceptKinds(['power']),
  }),
};

export type LaneName = keyof typeof lanes;

let session: LiveSession | null = null;

function message(error: unknown): string {
  return error instanceof Error ? `${error.name}: ${error.message}` : String(error);
}

/** Solves the selected vector on the sheet; an error is shown, never thrown into the page. */
function solveLive(vector: InputVector, fresh = false): void {
  if (session === null) return;
  try {
    if (fresh) session.reset();
    const result = session.solve(vector);
    set({ vector, live: solvedView(session.compiled, result), liveError: null });
  } catch (error) {
    set({ vector, live: null, liveError: message(error) });
  }
}

/** What each part of the slice depends on; an unchanged key keeps its results across revisions. */
const keys = { live: '', analysis: '', sequence: '', power: '' };
let autoTimer: ReturnType<typeof setTimeout> | null = null;

function rebuildSession(design: Design): void {
  try {
    session = new LiveSession(design.netlist, design.technology);
  } catch (error) {
    session = null;
    set({ live: null, liveError: message(error) });
  }
  set({ selectedRow: null, selectedStep: null });
  solveLive(completeVector(design.netlist.inputs, get().vector));
}

function currentSteps(): readonly InputVector[] {
  const { design, sequenceIndex } = get();
  return design?.sequences[sequenceIndex]?.steps ?? [];
}

/** Starts the small jobs by themselves once edits pause; big ones wait for the designer's click. */
function scheduleAutoRun(runSweep: boolean, runPower: boolean): void {
  if (autoTimer !== null) clearTimeout(autoTimer);
  autoTimer = setTimeout(() => {
    autoTimer = null;
    const design = get().design;
    const undrivenInputs = get().undrivenInputs;
    const small =
      design !== null &&
      jobSize({ kind: 'sweep', revision: 0, design, undrivenInputs }) <= AUTO_SWEEP_VECTORS;
    if (runSweep && small) void startSweep();
    if (runPower && small) void startPower();
  }, SWEEP_DEBOUNCE_MS);
}

function changed(key: keyof typeof keys, value: string): boolean {
  if (keys[key] === value) return false;
  keys[key] = value;
  return true;
}

/**
 * Called with the document on every change. Only a change to what the analysis reads (netlist,
 * technology, expected functions) starts a new analysis revision; moving a part does not.
 */
export function analyseDesign(design: Design, revision: number): void {
  const liveKey = JSON.stringify([design.netlist, design.technology]);
  const analysisKey = JSON.stringify([liveKey, design.expectations]);
  const analysisChanged = changed('analysis', analysisKey);
  set({ design, revision, ...(analysisChanged ? { analysisRevision: revision } : {}) });
  if (changed('live', liveKey)) rebuildSession(design);
  if (analysisChanged) lanes.sweep.forget();
  // A sequence result is for the steps it ran: an edited step or netlist makes it stale.
  if (changed('sequence', JSON.stringify([analysisKey, design.sequences]))) {
    lanes.sequence.forget();
    set({ selectedStep: null });
  }
  const powerChanged = changed('power', JSON.stringify([liveKey, design.sequences, get().powerSettings]));
  if (powerChanged) lanes.power.forget();
  if (analysisChanged || powerChanged) scheduleAutoRun(analysisChanged, powerChanged);
}

export function setVector(vector: InputVector): void {
  const design = get().design;
  if (design === null) return;
  set({ selectedRow: null, selectedStep: null });
  solveLive(completeVector(design.netlist.inputs, vector));
}

export function toggleInput(name: string): void {
  setVector(flipInput(get().vector, name));
}

export function stepVector(step: 1 | -1): void {
  const design = get().design;
  if (design !== null) setVector(nextVector(design.netlist.inputs, get().vector, step));
}

/** A table row click: the sheet shows that vector solved from an unknown state, as the sweep did. */
export function selectRow(index: number): void {
  const row = get().sweep.result?.report.vectors?.[index];
  if (row === undefined) return;
  solveLive(row.inputs, true);
  set({ selectedRow: index, selectedStep: null });
}

export function setTableView(table: TableView): void {
  set({ table });
}

export function setStripNets(stripNets: readonly string[]): void {
  set({ stripNets });
}

export function selectSequence(sequenceIndex: number): void {
  lanes.sequence.forget();
  set({ sequenceIndex, selectedStep: null });
}

/** Shows a sequence step on the sheet: the steps up to it are replayed so stored charge is exact. */
export function pickStep(step: number, steps: readonly InputVector[]): void {
  const design = get().design;
  if (session === null || design === null || step >= steps.length) return;
  try {
    const result = session.replay(heldSteps(design.netlist.inputs, steps.slice(0, step + 1)));
    if (result !== null)
      set({ vector: result.inputs, live: solvedView(session.compiled, result), liveError: null });
  } catch (error) {
    set({ live: null, liveError: message(error) });
  }
  set({ selectedStep: step, selectedRow: null });
}

export function startSweep(): Promise<void> {
  const { design, analysisRevision: revision, undrivenInputs } = get();
  return design === null
    ? Promise.resolve()
    : lanes.sweep.run({ kind: 'sweep', revision, design, undrivenInputs });
}

export function runSequence(steps: readonly InputVector[]): Promise<void> {
  const { design, analysisRevision: revision } = get();
  return design === null
    ? Promise.resolve()
    : lanes.sequence.run({ kind: 'sequence', revision, design, steps });
}

export function startPower(): Promise<void> {
  const { design, analysisRevision: revision, powerSettings: settings } = get();
  if (design === null) return Promise.resolve();
  return lanes.power.run({ kind: 'power', revision, design, settings, steps: currentSteps() });
}

/** Whether sweeps also try each input undriven; the table is checked again. */
export function setUndrivenInputs(undrivenInputs: boolean): void {
  set({ undrivenInputs });
  lanes.sweep.forget();
  scheduleAutoRun(true, false);
}

/** New power settings: the figures are recomputed at once. */
export function setPowerSettings(powerSettings: PowerSettings): void {
  set({ powerSettings });
  const design = get().design;
  if (design !== null) analyseDesign(design, get().revision);
}

/** Cancels what a lane's worker is doing; the lane shows it as cancelled. */
export function cancelJob(lane: LaneName): void {
  lanes[lane].cancel();
}

/** Back to a blank slice (tests, or a newly opened design). */
export function resetSimulation(): void {
  session = null;
  Object.assign(keys, { live: '', analysis: '', sequence: '', power: '' });
  if (autoTimer !== null) clearTimeout(autoTimer);
  autoTimer = null;
  for (const lane of Object.values(lanes)) lane.forget();
  simulationStore.setState(initialState(), true);
}

/** Follows the document store; returns the unsubscribe. The analysis panel calls it on mount. */
export function followDocument(): () => void {
  const push = (): void => {
    const { design, revision } = store.getState();
    analyseDesign(design, revision);
  };
  push();
  return store.subscribe((next, previous) => {
    if (next.design !== previous.design || next.revision !== previous.revision) push();
  });
}
