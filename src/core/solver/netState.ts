import type { EvaluationTarget } from './evaluate.ts';

/**
 * Mutable per-net and per-element state of one solve. Its own file so that the scheduler and the
 * parts it drives (the outcome memo, the steady-state search, group snapshots) share it without
 * importing each other.
 */
export interface NetState extends EvaluationTarget {
  readonly volts: Float64Array;
  readonly driven: Uint8Array;
  readonly flags: Uint8Array;
  readonly limiter: Int32Array;
  readonly chCurrent: Float64Array;
}
