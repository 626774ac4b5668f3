/**
 * The result of checking a cell: the shape the command line prints with --json and the panels read.
 * Keep these names stable; add fields freely.
 */
import type { InputValue } from '../model/design.ts';

export type FindingKind =
  | 'short'
  | 'static-current'
  | 'floating'
  | 'contention'
  | 'degraded'
  | 'charge-sharing'
  | 'no-steady-state'
  | 'mismatch'
  | 'unknown'
  | 'rule'
  | 'limit';

export type Severity = 'error' | 'warning';

/** A level as reported: 0, 1, undefined (X) or high-impedance (Z: no conducting path to a source). */
export type Level = '0' | '1' | 'X' | 'Z';

export interface Finding {
  readonly kind: FindingKind;
  readonly severity: Severity;
  /** Index of the vector (sweep) or step (sequence); null for structural findings. */
  readonly vector: number | null;
  readonly nets: readonly string[];
  readonly devices: readonly string[];
  /** For current paths: the ordered chain from source to ground, nets and devices alternating. */
  readonly path: readonly string[] | null;
  /** Amperes along the path, where a current is involved. */
  readonly current?: number;
  /** Watts drawn by that current from its source. */
  readonly watts?: number;
  /** Short name of a rule check, e.g. 'bulk-connection'. */
  readonly rule?: string;
  readonly message: string;
}

export interface CurrentPath {
  /** Source net first, sink net last, devices between nets: [VDD, P1, Y, N1, GND]. */
  readonly chain: readonly string[];
  readonly current: number;
}

export interface VectorReport {
  readonly inputs: Readonly<Record<string, InputValue>>;
  readonly outputs: Readonly<Record<string, Level>>;
  /** Volts for the outputs (every net when asked); null where the voltage is unknown. */
  readonly voltages: Readonly<Record<string, number | null>>;
  /** Amperes drawn from the supply rails (sum of currents leaving them). */
  readonly supplyCurrent: number;
  /** Watts delivered by all sources (rails and driven inputs) in steady state. */
  readonly staticPower: number;
  readonly currentPaths: readonly CurrentPath[];
  readonly findings: readonly Finding[];
}

export interface Summary {
  readonly vectors: number;
  readonly errors: number;
  readonly warnings: number;
  readonly [kind: string]: number;
}

export interface CheckReport {
  readonly cell: string;
  readonly inputs: readonly string[];
  readonly outputs: readonly string[];
  /**
   * Sweep results in columns (rows on demand: `sweepRow`); absent when the rows were handed on block
   * by block (`CheckOptions.onBlock`). A sequence run fills `steps` instead.
   */
  readonly sweep?: SweepColumns;
  readonly steps?: readonly VectorReport[];
  /** Every finding: structural ones first, then per vector (of the rows kept). */
  readonly findings: readonly Finding[];
  readonly summary: Summary;
  /** Notes about approximations or ignored input (e.g. bounds reached). */
  readonly notes: readonly string[];
}

/** What a vector has beyond its levels and currents. */
export interface RowDetail {
  readonly findings: readonly Finding[];
  readonly currentPaths: readonly CurrentPath[];
  /**
   * Every reported net's volts (NaN where unknown), kept when some net's voltage is not the one its
   * level implies (0 V for 0, VDD for 1, unknown for X and Z); null otherwise.
   */
  readonly voltages: Float64Array | null;
}

export interface SweepColumns {
  readonly inputs: readonly string[];
  /** Each input also left undriven (Z): vector numbers count in base 3. */
  readonly undriven: boolean;
  /** The sweep's number of the first vector held here (a block of a long sweep starts past 0). */
  readonly first: number;
  /** Vectors held. */
  readonly count: number;
  /** Reported nets, in report order: the outputs, or every net. Their voltages are each row's. */
  readonly nets: readonly string[];
  /** Position in `nets` of each output pin, in output order. */
  readonly outputs: Int32Array;
  readonly vdd: number;
  /** Words per bit-plane: count / 32 rounded up (or more, for a block cut short). */
  readonly words: number;
  /**
   * Level code (LEVEL_0 … LEVEL_Z) of reported net j at row i: bit b of the code is bit (i & 31) of
   * word (2j + b)·words + (i >> 5). Two bit-planes per net: a word holds 32 vectors.
   */
  readonly levels: Int32Array;
  /** Amperes drawn from the supply rails, per row. */
  readonly supplyCurrent: Float64Array;
  /** Watts delivered by all sources, per row. */
  readonly staticPower: Float64Array;
  /** Per row: one bit (KIND_BITS) per kind of finding the row has. */
  readonly kinds: Uint16Array;
  /** Per row: error- and warning-severity findings (at most 65,535 counted). */
  readonly errors: Uint16Array;
  readonly warnings: Uint16Array;
  /** Per row: its entry in `details`, -1 when it has none (no findings, no current paths, plain levels). */
  readonly detail: Int32Array;
  /** Objects where the sweep ran; packed as text once it has crossed to the page (`packDetails`). */
  readonly details: readonly RowDetail[] | PackedDetails;
}

/**
 * Details written as one JSON text with the start of each, for crossing to another thread: a string
 * is copied in one piece, where thousands of finding objects would be cloned one by one. Read back
 * one at a time by `detailOf`.
 */
export interface PackedDetails {
  readonly text: string;
  /** Where detail k starts in `text`; one more entry than details, the last at the text's end. */
  readonly starts: Int32Array;
}
