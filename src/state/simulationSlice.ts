/**
 * The simulation slice of the store: the selected input vector, the live solve of the sheet for it,
 * the jobs run in the worker (sweep, sequence, sizing, the transfer curve, the shown vector's
 * level-1 answer, the proof and the comparison with a cell of a file) and the power figures finished from their counts. Plain state only: the actions are in ./simulation.ts, the wiring that follows the document
 * in ./analysis.ts. Nothing here copies the design: the document slice holds it once.
 */
import type { InputVector } from '../core/model/design.ts';
import { DEFAULT_POWER_SETTINGS, type PowerSettings } from '../core/power/settings.ts';
import type { ActivitySource, PowerReport } from '../core/power/types.ts';
import type { LiveSession } from '../core/view/liveSession.ts';
import type { SolvedView } from '../core/view/solvedView.ts';
import type { TableView } from '../core/view/vectorTable.ts';
import type { MarginConvention } from '../core/dc/figures.ts';
import {
  IDLE_JOB,
  type CheckResult,
  type CompareResult,
  type JobState,
  type LibraryResult,
  type ProofResult,
  type SizingResult,
  type TransferResult,
  type VectorDcResult,
} from '../worker/protocol.ts';
import type { LibraryTableView } from '../core/view/libraryTable.ts';

/** What the analysis last followed: a change to any of these is what makes results stale. */
export interface AnalysedInputs {
  readonly netlistRevision: number;
  readonly expectations: object | null;
  readonly sequences: object | null;
  readonly sequenceIndex: number;
  readonly undrivenInputs: boolean;
  readonly load: number;
  readonly activity: ActivitySource;
  readonly transferRequest: TransferRequest | null;
  /** The shown vector and step, which the level-1 answer beside them follows. */
  readonly vector: InputVector | null;
  readonly selectedStep: number | null;
}

/** The transfer curve asked for: the swept input and the inputs the designer held. */
export interface TransferRequest {
  readonly input: string;
  readonly hold: InputVector;
}

/** How the chart reads a curve, without solving again. */
export interface TransferView {
  readonly convention: MarginConvention;
  /** The output whose figures are marked; null: the first. */
  readonly output: string | null;
}

export interface SimulationState {
  /** The revision at which the netlist, technology or expected functions last changed: jobs carry it. */
  readonly analysisRevision: number;
  readonly analysed: AnalysedInputs;
  /** The compiled netlist and simulator of the current netlist revision, on the page's thread. */
  readonly session: LiveSession | null;
  readonly vector: InputVector;
  readonly live: SolvedView | null;
  readonly liveError: string | null;
  readonly sweep: JobState<CheckResult>;
  readonly sequence: JobState<CheckResult>;
  readonly sizing: JobState<SizingResult>;
  /** Every cell of the design checked on its own, for the library view. */
  readonly library: JobState<LibraryResult>;
  /** The library view's sort and filter; null while it is closed. */
  readonly libraryView: LibraryTableView | null;
  readonly powerSettings: PowerSettings;
  /** Finished from the counts of the sweep (random activity) or the sequence, for powerSettings. */
  readonly power: PowerReport | null;
  readonly powerError: string | null;
  readonly sequenceIndex: number;
  readonly selectedStep: number | null;
  readonly stripNets: readonly string[];
  readonly table: TableView;
  readonly selectedRow: number | null;
  /** Sweeps also leave each input undriven (Z), for pins a bus may release. */
  readonly undrivenInputs: boolean;
  /** Null until the transfer view is first opened. */
  readonly transferRequest: TransferRequest | null;
  readonly transfer: JobState<TransferResult>;
  readonly transferView: TransferView;
  /** The shown vector's level-1 operating point beside its switch-level estimate. */
  readonly vectorDc: JobState<VectorDcResult>;
  /** Every property proved or refuted for all vectors (docs/semantics.md §10). */
  readonly proof: JobState<ProofResult>;
  /** The cell against a cell of a file; its job keeps the file for choosing another of its cells. */
  readonly comparison: JobState<CompareResult>;
}

export const NOTHING_ANALYSED: AnalysedInputs = {
  netlistRevision: -1,
  expectations: null,
  sequences: null,
  sequenceIndex: 0,
  undrivenInputs: false,
  load: DEFAULT_POWER_SETTINGS.load,
  activity: DEFAULT_POWER_SETTINGS.activity,
  transferRequest: null,
  vector: null,
  selectedStep: null,
};

export const INITIAL_SIMULATION: SimulationState = {
  analysisRevision: -1,
  analysed: NOTHING_ANALYSED,
  session: null,
  vector: {},
  live: null,
  liveError: null,
  sweep: IDLE_JOB,
  sequence: IDLE_JOB,
  sizing: IDLE_JOB,
  library: IDLE_JOB,
  libraryView: null,
  powerSettings: DEFAULT_POWER_SETTINGS,
  power: null,
  powerError: null,
  sequenceIndex: 0,
  selectedStep: null,
  stripNets: [],
  table: { sort: 'vector', direction: 'ascending', filter: 'all' },
  selectedRow: null,
  undrivenInputs: false,
  transferRequest: null,
  transfer: IDLE_JOB,
  transferView: { convention: 'unity-gain', output: null },
  vectorDc: IDLE_JOB,
  proof: IDLE_JOB,
  comparison: IDLE_JOB,
};
