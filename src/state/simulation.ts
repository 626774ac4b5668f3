/**
 * The simulation slice: the selected input vector, the live solve of the sheet for it, and the
 * sweep and sequence jobs run in the worker. Every job result carries the document revision it was
 * computed for; a result for an older revision is dropped, so the panels never show a stale table
 * beside a newer drawing. Actions are module functions, callable from panels, keys and tests alike.
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
import {
  jobSize,
  PROGRESS_THRESHOLD_VECTORS,
  type AnalysisJob,
  type JobProgress,
  type JobResult,
} from '../worker/protocol.ts';
import { jobRunner, type JobLane as JobKey } from '../worker/runner.ts';
import { JobCancelled } from '../worker/client.ts';
import { store } from './store.ts';

export type JobStatus = 'idle' | 'running' | 'done' | 'cancelled' | 'failed';

export interface JobState {
  readonly status: JobStatus;
  readonly revision: number;
  readonly progress: JobProgress;
  /** Past the size threshold: the panel shows a progress bar and a cancel button. */
  readonly long: boolean;
  readonly result: JobResult | null;
  readonly error: string | null;
}

export interface SimulationState {
  /** Document revision the slice last saw. */
  readonly revision: number;
  /** The revision at which the netlist, technology or expected functions last changed: jobs carry it. */
  readonly analysisRevision: number;
  readonly design: Design | null;
  readonly vector: InputVector;
  readonly live: SolvedView | null;
  readonly liveError: string | null;
  readonly sweep: JobState;
  readonly sequence: JobState;
  readonly sequenceIndex: number;
  readonly selectedStep: number | null;
  readonly stripNets: readonly string[];
  readonly table: TableView;
  readonly selectedRow: number | null;
}

/** Sweeps up to this many vectors start by themselves after each edit; larger ones wait for a click. */
export const AUTO_SWEEP_VECTORS = 1024;

const IDLE_JOB: JobState = {
  status: 'idle',
  revision: -1,
  progress: { done: 0, total: 0 },
  long: false,
  result: null,
  error: null,
};

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
    sequenceIndex: 0,
    selectedStep: null,
    stripNets: [],
    table: { sort: 'vector', direction: 'ascending', filter: 'all' },
    selectedRow: null,
  };
}

export const simulationStore = createStore<SimulationState>(initialState);

export function useSimulation<T>(selector: (state: SimulationState) => T): T {
  return useStore(simulationStore, selector);
}

let session: LiveSession | null = null;

/** Which job of each lane is the current one: a superseded job's late answer is ignored. */
const currentJob: Record<JobKey, object | null> = { sweep: null, sequence: null };

const set = (patch: Partial<SimulationState>): void => simulationStore.setState(patch);
const get = (): SimulationState => simulationStore.getState();

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

/** What a live solve depends on, and what a sweep depends on; unchanged keys keep their results. */
function liveKey(design: Design): string {
  return JSON.stringify([design.netlist, design.technology]);
}

function sweepKey(design: Design): string {
  return JSON.stringify([design.netlist, design.technology, design.expectations]);
}

let lastLiveKey = '';
let lastSweepKey = '';
let lastSequenceKey = '';
let sweepTimer: ReturnType<typeof setTimeout> | null = null;

/** Waits for edits to pause (a drag changes the revision every frame) before starting a sweep. */
export const SWEEP_DEBOUNCE_MS = 120;

function scheduleSweep(design: Design): void {
  if (sweepTimer !== null) clearTimeout(sweepTimer);
  sweepTimer = null;
  if (jobSize({ kind: 'sweep', revision: 0, design }) > AUTO_SWEEP_VECTORS) {
    set({ sweep: { ...IDLE_JOB, revision: get().analysisRevision } });
    return;
  }
  sweepTimer = setTimeout(() => {
    sweepTimer = null;
    void startSweep();
  }, SWEEP_DEBOUNCE_MS);
}

function rebuildSession(design: Design): void {
  try {
    session = new LiveSession(design.netlist, design.technology);
  } catch (error) {
    session = null;
    set({ live: null, liveError: message(error) });
  }
  solveLive(completeVector(design.netlist.inputs, get().vector));
}

/**
 * Called with the document on every change. Only a change to what the analysis reads (netlist,
 * technology, expected functions) starts a new analysis revision; moving a part does not.
 */
export function analyseDesign(design: Design, revision: number): void {
  const live = liveKey(design);
  const sweep = sweepKey(design);
  const analysisChanged = sweep !== lastSweepKey;
  set({ design, revision, ...(analysisChanged ? { analysisRevision: revision } : {}) });
  if (live !== lastLiveKey) {
    lastLiveKey = live;
    set({ selectedRow: null, selectedStep: null });
    rebuildSession(design);
  }
  if (analysisChanged) {
    lastSweepKey = sweep;
    scheduleSweep(design);
  }
  const sequence = JSON.stringify([sweep, design.sequences]);
  if (sequence !== lastSequenceKey) {
    // A sequence result is for the steps it ran: an edited step or netlist makes it stale.
    lastSequenceKey = sequence;
    currentJob.sequence = null;
    set({ sequence: IDLE_JOB, selectedStep: null });
  }
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
  const rows = get().sweep.result?.report.vectors;
  const row = rows?.[index];
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
  currentJob.sequence = null;
  set({ sequenceIndex, sequence: IDLE_JOB, selectedStep: null });
}

/** Shows a sequence step on the sheet: the steps up to it are replayed so stored charge is exact. */
export function pickStep(step: number, steps: readonly InputVector[]): void {
  const design = get().design;
  if (session === null || design === null || step >= steps.length) return;
  const upTo = heldSteps(design.netlist.inputs, steps.slice(0, step + 1));
  try {
    const result = session.replay(upTo);
    if (result !== null)
      set({ vector: result.inputs, live: solvedView(session.compiled, result), liveError: null });
  } catch (error) {
    set({ live: null, liveError: message(error) });
  }
  set({ selectedStep: step, selectedRow: null });
}

function stillCurrent(key: JobKey, token: object, revision: number): boolean {
  return currentJob[key] === token && get().analysisRevision === revision;
}

async function runJob(key: JobKey, job: AnalysisJob): Promise<void> {
  const token = {};
  currentJob[key] = token;
  const total = jobSize(job);
  const running: JobState = {
    ...IDLE_JOB,
    status: 'running',
    revision: job.revision,
    long: total > PROGRESS_THRESHOLD_VECTORS,
    progress: { done: 0, total },
  };
  set({ [key]: running });
  const onProgress = (progress: JobProgress): void => {
    if (stillCurrent(key, token, job.revision)) set({ [key]: { ...get()[key], progress } });
  };
  try {
    const result = await jobRunner(key).run(job, onProgress);
    if (!stillCurrent(key, token, job.revision)) return; // a newer job or edit owns the panel now
    set({ [key]: { ...running, status: 'done', result, progress: { done: total, total } } });
  } catch (error) {
    if (!stillCurrent(key, token, job.revision)) return;
    const status: JobStatus = error instanceof JobCancelled ? 'cancelled' : 'failed';
    set({ [key]: { ...get()[key], status, error: status === 'failed' ? message(error) : null } });
  }
}

export function startSweep(undrivenInputs = false): Promise<void> {
  const { design, analysisRevision } = get();
  if (design === null) return Promise.resolve();
  return runJob('sweep', { kind: 'sweep', revision: analysisRevision, design, undrivenInputs });
}

export function runSequence(steps: readonly InputVector[]): Promise<void> {
  const { design, analysisRevision } = get();
  if (design === null) return Promise.resolve();
  return runJob('sequence', { kind: 'sequence', revision: analysisRevision, design, steps });
}

/** Cancels whatever the worker is doing; the job's panel shows it as cancelled. */
export function cancelJob(key: JobKey): void {
  jobRunner(key).cancel();
}

/** Back to a blank slice (tests, or a newly opened design). */
export function resetSimulation(): void {
  session = null;
  lastLiveKey = '';
  lastSweepKey = '';
  lastSequenceKey = '';
  if (sweepTimer !== null) clearTimeout(sweepTimer);
  sweepTimer = null;
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
