/**
 * Actions on the simulation slice (./simulationSlice.ts), as module functions callable from panels,
 * keys and tests alike: pick a vector, a row or a step; run, cancel or forget jobs; change settings.
 * They only set state and start jobs; ./analysis.ts follows the document and decides what is stale.
 */
import type { InputVector } from '../core/model/design.ts';
import { heldSteps } from '../core/analysis/sequenceText.ts';
import { rowVector } from '../core/analysis/sweepColumns.ts';
import { solvedView } from '../core/view/solvedView.ts';
import type { PowerSettings } from '../core/power/settings.ts';
import {
  completeVector,
  stepVector as nextVector,
  toggleInput as flipInput,
} from '../core/view/vectorControl.ts';
import type { TableView } from '../core/view/vectorTable.ts';
import { acceptKinds, cancelLane, runInLane, type LaneHost } from '../worker/lanes.ts';
import type { CellInput, CheckResult, SizingResult } from '../worker/protocol.ts';
import type { SimulationState } from './simulationSlice.ts';
import { store, useStore } from './store.ts';

export type { JobState, JobStatus } from '../worker/protocol.ts';
export type { SimulationState } from './simulationSlice.ts';

export function useSimulation<T>(selector: (state: SimulationState) => T): T {
  return useStore((s) => selector(s.simulation));
}

const get = (): SimulationState => store.getState().simulation;

export function setSimulation(patch: Partial<SimulationState>): void {
  store.setState((s) => ({ simulation: { ...s.simulation, ...patch } }));
}

function message(error: unknown): string {
  return error instanceof Error ? `${error.name}: ${error.message}` : String(error);
}

/** The live solve of a vector on the sheet, as a patch; an error is shown, never thrown. */
export function solvedLive(vector: InputVector, fresh = false): Partial<SimulationState> {
  const { session } = get();
  if (session === null) return { vector };
  try {
    if (fresh) session.reset();
    return { vector, live: solvedView(session.compiled, session.solve(vector)), liveError: null };
  } catch (error) {
    return { vector, live: null, liveError: message(error) };
  }
}

export function setVector(vector: InputVector): void {
  const inputs = store.getState().design.netlist.inputs;
  setSimulation({ ...solvedLive(completeVector(inputs, vector)), selectedRow: null, selectedStep: null });
}

export function toggleInput(name: string): void {
  setVector(flipInput(get().vector, name));
}

export function stepVector(step: 1 | -1): void {
  setVector(nextVector(store.getState().design.netlist.inputs, get().vector, step));
}

/** A table row click: the sheet shows that vector solved from an unknown state, as the sweep did. */
export function selectRow(index: number): void {
  const sweep = get().sweep.result?.report.sweep;
  if (sweep !== undefined && index >= 0 && index < sweep.count)
    setSimulation({ ...solvedLive(rowVector(sweep, index), true), selectedRow: index, selectedStep: null });
}

/** The steps of the chosen sequence, as stored (each lists what it changes). */
export function currentSteps(): readonly InputVector[] {
  return store.getState().design.sequences[get().sequenceIndex]?.steps ?? [];
}

/** Shows a sequence step on the sheet: the steps up to it are replayed so stored charge is exact. */
export function pickStep(step: number): void {
  const { session } = get();
  const steps = currentSteps();
  if (session === null || step >= steps.length) return;
  const inputs = store.getState().design.netlist.inputs;
  try {
    const result = session.replay(heldSteps(inputs, steps.slice(0, step + 1)));
    const shown =
      result === null
        ? {}
        : { vector: result.inputs, live: solvedView(session.compiled, result), liveError: null };
    setSimulation({ ...shown, selectedStep: step, selectedRow: null });
  } catch (error) {
    setSimulation({ live: null, liveError: message(error), selectedStep: step, selectedRow: null });
  }
}

export function setTableView(table: TableView): void {
  setSimulation({ table });
}

export function setStripNets(stripNets: readonly string[]): void {
  setSimulation({ stripNets });
}

/** Another sequence: its results, if any, are forgotten by the analysis wiring. */
export function selectSequence(sequenceIndex: number): void {
  setSimulation({ sequenceIndex, selectedStep: null });
}

/** Whether sweeps also try each input undriven; the table is checked again. */
export function setUndrivenInputs(undrivenInputs: boolean): void {
  setSimulation({ undrivenInputs });
}

/** New power settings: the figures are finished again from the counts, nothing is re-solved. */
export function setPowerSettings(powerSettings: PowerSettings): void {
  setSimulation({ powerSettings });
}

type LaneName = 'sweep' | 'sequence' | 'sizing' | 'transfer' | 'vector-dc' | 'proof' | 'compare';

function checkHost(lane: 'sweep' | 'sequence'): LaneHost<CheckResult> {
  return {
    publish: (state) => setSimulation(lane === 'sweep' ? { sweep: state } : { sequence: state }),
    read: () => get()[lane],
    accept: acceptKinds(['sweep', 'sequence']),
  };
}

const sizingHost: LaneHost<SizingResult> = {
  publish: (sizing) => setSimulation({ sizing }),
  read: () => get().sizing,
  accept: acceptKinds(['sizing']),
};

/** The cell as the jobs see it: the derived design without its drawing. */
export function cell(): CellInput {
  const { netlist, technology, expectations } = store.getState().design;
  return { netlist, technology, expectations };
}

export function startSweep(): Promise<void> {
  const { analysisRevision: revision, undrivenInputs } = get();
  return runInLane('sweep', { kind: 'sweep', revision, cell: cell(), undrivenInputs }, checkHost('sweep'));
}

/** Runs the chosen sequence's steps: report, level strips and sequence power from one pass. */
export function runSequence(): Promise<void> {
  const revision = get().analysisRevision;
  return runInLane(
    'sequence',
    { kind: 'sequence', revision, cell: cell(), steps: currentSteps() },
    checkHost('sequence'),
  );
}

export function startSizing(): Promise<void> {
  const { analysisRevision: revision, powerSettings } = get();
  const job = { kind: 'sizing', revision, cell: cell(), load: powerSettings.load } as const;
  return runInLane('sizing', job, sizingHost);
}

/** Power and sizing on request: the pass the activity comes from (unless done) and the sizing. */
export function computePowerAndSizing(): Promise<void> {
  const s = get();
  const source = s.powerSettings.activity === 'random' ? s.sweep : s.sequence;
  const pass =
    source.status === 'done'
      ? Promise.resolve()
      : s.powerSettings.activity === 'random'
        ? startSweep()
        : runSequence();
  return Promise.all([pass, s.sizing.status === 'done' ? Promise.resolve() : startSizing()]).then(() => {});
}

/** Cancels what a lane's worker is doing; the lane shows it as cancelled. */
export function cancelJob(lane: LaneName): void {
  cancelLane(lane);
}
