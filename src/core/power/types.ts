/**
 * The JSON shape of a power report (`railwise check --power` and the power-and-sizing panel).
 * Units: watts, amperes, farads, joules, volts, hertz. Keep these names stable; add fields freely.
 */
import type { InputVector } from '../model/design.ts';

/** Where switching activity comes from: a design's sequence, or every vector equally likely. */
export type ActivitySource = 'sequence' | 'random';

/** Static figures of one input vector (or sequence step). */
export interface VectorPower {
  readonly inputs: InputVector;
  /** DC power delivered by the sources through conducting paths, watts (from the solver). */
  readonly dcWatts: number;
  /** Subthreshold leakage of the off transistors, watts. */
  readonly leakageWatts: number;
  /** dcWatts + leakageWatts. */
  readonly staticWatts: number;
  /** Amperes drawn from the supply rails through conducting paths. */
  readonly supplyCurrent: number;
  /** Amperes through off transistors. */
  readonly leakageCurrent: number;
}

/** What makes up a net's switched capacitance, farads. */
export interface NetCapacitance {
  readonly gate: number;
  readonly diffusion: number;
  readonly explicit: number;
  /** The output load setting, on outputs only. */
  readonly load: number;
  readonly total: number;
}

export interface NetPower {
  readonly net: string;
  /** Probability of a 0→1 transition per cycle. */
  readonly activity: number;
  readonly capacitance: NetCapacitance;
  /** Mean high level minus mean low level, volts (VDD for a full swing, less for a degraded one). */
  readonly swing: number;
  /** Energy drawn from the supply per 0→1 transition, C · VDD · swing, joules. */
  readonly energyPerTransition: number;
  /** activity · energyPerTransition · frequency, watts. */
  readonly watts: number;
  /** Input pins are charged by the stage before; their power is reported apart. */
  readonly isInput: boolean;
}

export interface PowerReport {
  /** One sentence naming the activity convention and the formula. */
  readonly convention: string;
  /** One sentence naming the leakage model. */
  readonly leakageModel: string;
  readonly activitySource: ActivitySource;
  /** Clock frequency used, Hz. */
  readonly frequency: number;
  readonly vdd: number;
  /** Load on each output used for these figures, farads. */
  readonly load: number;
  /** Per vector (random) or per step (sequence). */
  readonly vectors: readonly VectorPower[];
  /** staticWatts of each vector, in the same order. */
  readonly staticWatts: readonly number[];
  /** leakageWatts of each vector, in the same order. */
  readonly leakageWatts: readonly number[];
  /** Mean static power over the vectors (each equally likely) or over the steps. */
  readonly averageStaticWatts: number;
  /** Switching power of the cell's own nets (input pins excluded), watts. */
  readonly dynamicWatts: number;
  /** Switching power of the input pins' capacitance, paid by whatever drives them, watts. */
  readonly inputPinWatts: number;
  /** averageStaticWatts + dynamicWatts. */
  readonly totalWatts: number;
  /** 0→1 probability per cycle, per net. */
  readonly activity: Readonly<Record<string, number>>;
  /** Total switched capacitance per net, farads. */
  readonly capacitance: Readonly<Record<string, number>>;
  readonly nets: readonly NetPower[];
  readonly notes: readonly string[];
}
