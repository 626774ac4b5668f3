/**
 * Actions for the level-1 DC views (docs/semantics.md §2, "DC levels"): the transfer curve (which
 * input sweeps, which are held, how the chart reads it) and the shown vector's operating point.
 * They set state and start jobs; ./analysis.ts decides when a curve or an answer is stale.
 */
import { DEFAULT_TRANSFER_POINTS } from '../core/dc/transfer.ts';
import type { MarginConvention } from '../core/dc/figures.ts';
import type { InputValue, InputVector } from '../core/model/design.ts';
import { acceptKinds, runInLane, type LaneHost } from '../worker/lanes.ts';
import type { TransferResult, VectorDcResult } from '../worker/protocol.ts';
import { cell, currentSteps, setSimulation } from './simulation.ts';
import type { SimulationState, TransferRequest } from './simulationSlice.ts';
import { store } from './store.ts';

const get = (): SimulationState => store.getState().simulation;

const transferHost: LaneHost<TransferResult> = {
  publish: (transfer) => setSimulation({ transfer }),
  read: () => get().transfer,
  accept: acceptKinds(['transfer']),
};

const vectorDcHost: LaneHost<VectorDcResult> = {
  publish: (vectorDc) => setSimulation({ vectorDc }),
  read: () => get().vectorDc,
  accept: acceptKinds(['vector-dc']),
};

/** The view was opened: the first time, sweep the first input (the wiring then draws it). */
export function openTransfer(): void {
  if (get().transferRequest !== null) return;
  const [input] = store.getState().design.netlist.inputs;
  if (input !== undefined) setSimulation({ transferRequest: { input, hold: {} } });
}

export function setTransferInput(input: string): void {
  const hold = { ...(get().transferRequest?.hold ?? {}) };
  delete hold[input];
  setSimulation({ transferRequest: { input, hold } });
}

/** Holds an input at 0 or 1, or (null) lets Railwise choose it. */
export function setTransferHold(name: string, value: '0' | '1' | null): void {
  const request = get().transferRequest;
  if (request === null) return;
  const hold: Record<string, InputValue> = { ...request.hold };
  if (value === null) delete hold[name];
  else hold[name] = value;
  setSimulation({ transferRequest: { ...request, hold } });
}

export function setTransferConvention(convention: MarginConvention): void {
  setSimulation({ transferView: { ...get().transferView, convention } });
}

export function setTransferOutput(output: string): void {
  setSimulation({ transferView: { ...get().transferView, output } });
}

/** Held inputs the cell no longer has are dropped: holding them means nothing now. */
function heldInputs(request: TransferRequest, inputs: readonly string[]): InputVector {
  return Object.fromEntries(Object.entries(request.hold).filter(([name]) => inputs.includes(name)));
}

export function startTransfer(): Promise<void> {
  const { transferRequest: request, analysisRevision: revision } = get();
  if (request === null) return Promise.resolve();
  const job = {
    kind: 'transfer',
    revision,
    cell: cell(),
    input: request.input,
    hold: heldInputs(request, store.getState().design.netlist.inputs),
    points: DEFAULT_TRANSFER_POINTS,
  } as const;
  return runInLane('transfer', job, transferHost);
}

/** The shown vector's level-1 answer: a sequence step after the steps before it, else the vector alone. */
export function startVectorDc(): Promise<void> {
  const { selectedStep, vector, analysisRevision: revision } = get();
  const steps = selectedStep === null ? [vector] : currentSteps().slice(0, selectedStep + 1);
  if (steps.length === 0) return Promise.resolve();
  return runInLane('vector-dc', { kind: 'vector-dc', revision, cell: cell(), steps }, vectorDcHost);
}
