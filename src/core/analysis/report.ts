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
  /** Sweep results; a sequence run fills `steps` instead. */
  readonly vectors?: readonly VectorReport[];
  readonly steps?: readonly VectorReport[];
  /** Every finding: structural ones first, then per vector. */
  readonly findings: readonly Finding[];
  readonly summary: Summary;
  /** Notes about approximations or ignored input (e.g. bounds reached). */
  readonly notes: readonly string[];
}
