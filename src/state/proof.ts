/**
 * Actions for proofs (docs/semantics.md §10): prove every property of the sheet's cell, compare it
 * with a cell of a file, and put a counterexample on the sheet. They set state and start jobs;
 * ./analysis.ts forgets a proof when the netlist or the expected functions change, and a comparison
 * when the netlist does.
 */
import type { InputVector } from '../core/model/design.ts';
import { recordOf } from '../core/model/records.ts';
import { acceptKinds, runInLane, type LaneHost } from '../worker/lanes.ts';
import type { CompareJob, CompareResult, ProofResult } from '../worker/protocol.ts';
import { cell, setSimulation, solvedLive } from './simulation.ts';
import type { SimulationState } from './simulationSlice.ts';
import { store } from './store.ts';

const get = (): SimulationState => store.getState().simulation;

const proofHost: LaneHost<ProofResult> = {
  publish: (proof) => setSimulation({ proof }),
  read: () => get().proof,
  accept: acceptKinds(['proof']),
};

const compareHost: LaneHost<CompareResult> = {
  publish: (comparison) => setSimulation({ comparison }),
  read: () => get().comparison,
  accept: acceptKinds(['compare']),
};

export function startProof(): Promise<void> {
  const revision = get().analysisRevision;
  return runInLane('proof', { kind: 'proof', revision, cell: cell() }, proofHost);
}

/** Compares the sheet's cell with the file's cell (a library asks which one first). */
export function compareWithFile(name: string, text: string): Promise<void> {
  const job: CompareJob = {
    kind: 'compare',
    revision: get().analysisRevision,
    cell: cell(),
    file: { name, text },
    other: null,
  };
  return runInLane('compare', job, compareHost);
}

/** Compares with another cell of the file last compared with. */
export function compareWithCell(other: string): Promise<void> {
  const last = get().comparison.job;
  if (last === null || last.kind !== 'compare') return Promise.resolve();
  const job = { ...last, revision: get().analysisRevision, cell: cell(), other };
  return runInLane('compare', job, compareHost);
}

/** Puts a proof's counterexample on the sheet, solved from an unknown state as its replay was. */
export function showCounterexample(vector: Readonly<Record<string, 0 | 1>>): void {
  const inputs: InputVector = recordOf(
    Object.entries(vector).map(([pin, v]) => [pin, v === 1 ? '1' : '0'] as const),
  );
  setSimulation({ ...solvedLive(inputs, true), selectedRow: null, selectedStep: null });
}
