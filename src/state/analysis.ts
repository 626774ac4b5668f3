/**
 * The analysis wiring, started once at start-up (src/main.tsx) so the sheet overlay has levels
 * whatever panel is open. It follows the store: when the netlist revision moves it builds the page's
 * one compiled netlist and re-solves the live vector; when what a job reads changes it forgets that
 * lane (a late answer is then dropped) and, for small cells, starts it again once edits pause; when
 * a pass's counts or the power settings change it finishes the power figures. Nothing is compared
 * by serialising: the document slice keeps unchanged netlists, expectations and sequences as the
 * same objects, and numbers their changes.
 */
import { followLibrary } from './library.ts';
import { powerFromCounts } from '../core/power/powerReport.ts';
import { LiveSession } from '../core/view/liveSession.ts';
import { completeVector } from '../core/view/vectorControl.ts';
import { IDLE_JOB, jobSize } from '../worker/protocol.ts';
import { jobRunner } from '../worker/runner.ts';
import {
  currentSteps,
  runSequence,
  setSimulation,
  solvedLive,
  startSizing,
  startSweep,
} from './simulation.ts';
import { startTransfer, startVectorDc } from './dc.ts';
import type { AnalysedInputs, SimulationState } from './simulationSlice.ts';
import { store, type RailwiseState } from './store.ts';

/** Cells with up to this many vectors are checked by themselves after each edit; larger ones on a click. */
export const AUTO_SWEEP_VECTORS = 1024;
/** Changes closer together than this wait for edits to pause before jobs start by themselves. */
export const SWEEP_DEBOUNCE_MS = 120;

/**
 * The shown vector's level-1 answer starts by itself for cells of up to this many devices; a larger
 * cell waits for a click (one operating point of a large cell can take seconds).
 */
export const AUTO_VECTOR_DC_DEVICES = 2000;

/** Which lanes a change made stale. */
interface Staleness {
  readonly netlist: boolean;
  readonly check: boolean;
  readonly sweep: boolean;
  readonly sequence: boolean;
  readonly sizing: boolean;
  readonly activity: boolean;
  readonly transfer: boolean;
  readonly vectorDc: boolean;
}

function analysedNow(s: RailwiseState): AnalysedInputs {
  const sim = s.simulation;
  return {
    netlistRevision: s.netlistRevision,
    expectations: s.design.expectations,
    sequences: s.design.sequences,
    sequenceIndex: sim.sequenceIndex,
    undrivenInputs: sim.undrivenInputs,
    load: sim.powerSettings.load,
    activity: sim.powerSettings.activity,
    transferRequest: sim.transferRequest,
    vector: sim.vector,
    selectedStep: sim.selectedStep,
  };
}

function staleness(s: RailwiseState): Staleness {
  const a = s.simulation.analysed;
  const now = analysedNow(s);
  const netlist = now.netlistRevision !== a.netlistRevision;
  const check = netlist || now.expectations !== a.expectations;
  const sequence = check || now.sequences !== a.sequences || now.sequenceIndex !== a.sequenceIndex;
  const shown = now.vector !== a.vector || now.selectedStep !== a.selectedStep;
  return {
    netlist,
    check,
    sweep: check || now.undrivenInputs !== a.undrivenInputs,
    sequence,
    sizing: netlist || now.load !== a.load,
    activity: now.activity !== a.activity,
    transfer: netlist || now.transferRequest !== a.transferRequest,
    vectorDc: netlist || shown || (now.selectedStep !== null && sequence),
  };
}

/**
 * The page's one compile of a netlist revision (the live session), and the live vector solved on
 * it from an unknown state.
 */
function followNetlist(s: RailwiseState): void {
  const { netlist, technology } = s.design;
  try {
    setSimulation({ session: new LiveSession(netlist, technology), selectedRow: null, selectedStep: null });
    setSimulation(solvedLive(completeVector(netlist.inputs, s.simulation.vector)));
  } catch (error) {
    const liveError = error instanceof Error ? `${error.name}: ${error.message}` : String(error);
    setSimulation({ session: null, live: null, liveError, selectedRow: null, selectedStep: null });
  }
}

/** The power figures from the pass the activity comes from, for the current settings. */
export function finishedPower(sim: SimulationState): Pick<SimulationState, 'power' | 'powerError'> {
  const source = sim.powerSettings.activity === 'random' ? sim.sweep : sim.sequence;
  const counts = source.status === 'done' ? (source.result?.power ?? null) : null;
  if (counts === null) return { power: null, powerError: null };
  try {
    return { power: powerFromCounts(counts, sim.powerSettings), powerError: null };
  } catch (error) {
    return { power: null, powerError: error instanceof Error ? error.message : String(error) };
  }
}

/** Brings the slice up to date with the document; returns which lanes went stale. */
function follow(s: RailwiseState): Staleness {
  const stale = staleness(s);
  if (!Object.values(stale).some(Boolean)) return stale;
  setSimulation({
    analysed: analysedNow(s),
    analysisRevision: stale.check ? s.revision : s.simulation.analysisRevision,
    ...(stale.sweep ? { sweep: IDLE_JOB } : {}),
    ...(stale.sequence ? { sequence: IDLE_JOB, selectedStep: null } : {}),
    ...(stale.sizing ? { sizing: IDLE_JOB } : {}),
    ...(stale.transfer ? { transfer: IDLE_JOB } : {}),
    ...(stale.vectorDc ? { vectorDc: IDLE_JOB } : {}),
    ...(stale.check ? { proof: IDLE_JOB } : {}),
    ...(stale.netlist ? { comparison: IDLE_JOB } : {}),
  });
  if (stale.netlist) followNetlist(store.getState());
  return stale;
}

/** Whether the cell is small enough to be checked by itself after each edit. */
function checkedByItself(s: RailwiseState): boolean {
  const cell = { netlist: s.design.netlist, technology: s.design.technology, expectations: {} };
  const job = { kind: 'sweep', revision: 0, cell, undrivenInputs: s.simulation.undrivenInputs } as const;
  return jobSize(job) <= AUTO_SWEEP_VECTORS;
}

/** Starts a small cell's check once edits pause; the promise settles once it answered (null: none started). */
function autoCheck(stale: Staleness): Promise<void> | null {
  const s = store.getState();
  if (!checkedByItself(s) || !stale.sweep || s.simulation.sweep.status !== 'idle') return null;
  return startSweep();
}

/** Starts, once edits pause, the other jobs a small cell needs to show everything. */
function autoRun(stale: Staleness): void {
  const s = store.getState();
  const sim = s.simulation;
  if (!checkedByItself(s)) return;
  if (stale.sizing && sim.sizing.status === 'idle') void startSizing();
  if (
    (stale.sequence || stale.activity) &&
    sim.powerSettings.activity === 'sequence' &&
    sim.sequence.status === 'idle' &&
    currentSteps().length > 0
  )
    void runSequence();
}

/** The transfer curve, once asked for, whatever the cell's vector count. */
function autoRunTransfer(stale: Staleness): void {
  const sim = store.getState().simulation;
  if (stale.transfer && sim.transfer.status === 'idle' && sim.transferRequest !== null) void startTransfer();
}

/** The shown vector's level-1 answer, whatever the cell's vector count. */
function autoRunVectorDc(stale: Staleness): void {
  const s = store.getState();
  if (
    stale.vectorDc &&
    s.simulation.vectorDc.status === 'idle' &&
    s.design.netlist.devices.length <= AUTO_VECTOR_DC_DEVICES
  )
    void startVectorDc();
}

/** Starts the worker the first check runs in, so its script loads while the page opens its design. */
export function warmAnalysis(): void {
  jobRunner('sweep').warm?.();
}

export interface StartOptions {
  /**
   * Start the opened design's jobs at once, in this very call, rather than in the microtask after
   * it: the page at start-up, where nothing is being edited yet.
   */
  readonly startNow?: boolean;
}

/** Runs `work` once the page has painted what the store holds now (at once where nothing paints). */
function afterNextPaint(work: () => void): void {
  if (typeof requestAnimationFrame === 'function') requestAnimationFrame(() => setTimeout(work, 0));
  else setTimeout(work, 0);
}

/**
 * Follows the store from now on; returns the function that stops following. Jobs wait for edits
 * to pause: a new circuit after a quiet spell (a design opened, the page started, a first edit)
 * starts them at once, in a microtask after the change that made them stale; other changes, and
 * changes closer together than SWEEP_DEBOUNCE_MS, wait until they pause, so typing or a run of
 * toggles starts one job.
 * The check goes first; the other jobs start once it has answered and the page has painted the
 * answer (docs/semantics.md §8), so on two cores the table and the level colours come first.
 */
export function startAnalysis(options: StartOptions = {}): () => void {
  let timer: ReturnType<typeof setTimeout> | null = null;
  /** What went stale since jobs last started. */
  let pending: Staleness | null = null;
  let lastChange = -Infinity;
  /** Whether the changes waiting now began after a quiet spell. */
  let burstAfterQuiet = false;
  let microtaskQueued = false;
  let stopped = false;
  const runDue = (): void => {
    if (timer !== null) clearTimeout(timer); // a change queued behind the microtask is served now
    timer = null;
    microtaskQueued = false;
    const due = pending;
    pending = null;
    if (due === null || stopped) return;
    autoRunTransfer(due);
    // The check before the jobs that start by themselves: it is what the panel waits for, and they
    // start once it has answered, so their workers do not compete with it for the processor.
    const check = autoCheck(due);
    const rest = (): void => {
      if (stopped) return;
      autoRun(due);
      autoRunVectorDc(due);
    };
    if (check === null) rest();
    else void check.then(() => afterNextPaint(rest));
  };
  /**
   * A new circuit after a quiet spell starts at once (one change may reach the store as several
   * updates, the circuit not always first); a flipped input or a setting waits for the pause, so a
   * run of toggles starts one level-1 answer, not one per toggle.
   */
  const schedule = (): void => {
    const now = Date.now();
    if (timer === null && !microtaskQueued) burstAfterQuiet = now - lastChange >= SWEEP_DEBOUNCE_MS;
    lastChange = now;
    if (microtaskQueued) return;
    if (timer !== null) clearTimeout(timer);
    timer = null;
    if (burstAfterQuiet && pending?.netlist === true) {
      microtaskQueued = true;
      queueMicrotask(runDue);
    } else timer = setTimeout(runDue, SWEEP_DEBOUNCE_MS);
  };
  const react = (s: RailwiseState, previous: RailwiseState | null): void => {
    const stale = follow(s);
    if (Object.values(stale).some(Boolean)) {
      pending = pending === null ? stale : merge(pending, stale);
      schedule();
    }
    const sim = store.getState().simulation;
    if (previous === null || powerInputsChanged(sim, previous.simulation)) setSimulation(finishedPower(sim));
  };
  react(store.getState(), null);
  if (options.startNow === true) runDue();
  const unsubscribe = store.subscribe((s, previous) => react(s, previous));
  const stopLibrary = followLibrary();
  return () => {
    stopped = true;
    unsubscribe();
    stopLibrary();
    if (timer !== null) clearTimeout(timer);
  };
}

function powerInputsChanged(now: SimulationState, before: SimulationState): boolean {
  return (
    now.powerSettings !== before.powerSettings ||
    now.sweep.result !== before.sweep.result ||
    now.sequence.result !== before.sequence.result ||
    now.sweep.status !== before.sweep.status ||
    now.sequence.status !== before.sequence.status
  );
}

function merge(a: Staleness, b: Staleness): Staleness {
  return {
    netlist: a.netlist || b.netlist,
    check: a.check || b.check,
    sweep: a.sweep || b.sweep,
    sequence: a.sequence || b.sequence,
    sizing: a.sizing || b.sizing,
    activity: a.activity || b.activity,
    transfer: a.transfer || b.transfer,
    vectorDc: a.vectorDc || b.vectorDc,
  };
}
