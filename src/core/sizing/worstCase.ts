import { evaluate, type Direction, type Evaluation } from './rcNetwork.ts';
import type { Stage } from './stage.ts';
import type { ControlValue, DelayEstimate, NetworkDrive } from './types.ts';
import { nameRecord } from '../model/records.ts';

/**
 * Exact enumeration bound: a stage with more independent gate signals than this is not searched
 * (2^12 = 4096 configurations, each a small linear solve).
 */
export const MAX_CONTROLS = 12;

export interface WorstCase {
  /** The configuration with the highest effective resistance. */
  readonly drive: NetworkDrive;
  /** The configuration with the longest Elmore delay. */
  readonly delay: DelayEstimate;
}

export class ControlLimitError extends Error {
  override readonly name = 'ControlLimitError';
}

function controlValues(stage: Stage, code: number): Record<string, ControlValue> {
  const values = nameRecord<ControlValue>();
  stage.controls.forEach((net, k) => (values[net] = (code >> k) & 1 ? '1' : '0'));
  return values;
}

/** False when a local inverter's output would equal its input: a state the cell never reaches. */
function consistent(stage: Stage, code: number): boolean {
  return stage.complementOf.every((k, j) => k < 0 || ((code >> j) & 1) !== ((code >> k) & 1));
}

function conducting(stage: Stage, code: number): boolean[] {
  return stage.elements.map((e) => e.control < 0 || ((code >> e.control) & 1) === (e.onWhenHigh ? 1 : 0));
}

/**
 * The worst case of one direction over every assignment of the stage's gate signals, independent
 * except for local inverter pairs. Null when no assignment connects the output to a source of that direction.
 * Ties keep the first configuration in counting order, so the result is deterministic.
 */
export function worstCase(stage: Stage, direction: Direction, caps: Float64Array): WorstCase | null {
  if (stage.controls.length > MAX_CONTROLS) {
    throw new ControlLimitError(
      `output ${stage.nets[stage.output]} has ${stage.controls.length} gate signals; the exact worst-case search stops at ${MAX_CONTROLS}`,
    );
  }
  let byOhms: { e: Evaluation; code: number } | null = null;
  let byDelay: { e: Evaluation; code: number } | null = null;
  for (let code = 0; code < 1 << stage.controls.length; code++) {
    if (!consistent(stage, code)) continue;
    const e = evaluate(stage, conducting(stage, code), direction, caps);
    if (e === null) continue;
    if (byOhms === null || e.ohms > byOhms.e.ohms * (1 + 1e-9)) byOhms = { e, code };
    if (byDelay === null || e.elmore > byDelay.e.elmore * (1 + 1e-9)) byDelay = { e, code };
  }
  if (byOhms === null || byDelay === null) return null;
  return {
    drive: { ohms: byOhms.e.ohms, path: byOhms.e.path, controls: controlValues(stage, byOhms.code) },
    delay: { seconds: byDelay.e.elmore, path: byDelay.e.path, controls: controlValues(stage, byDelay.code) },
  };
}

/**
 * Resistance of the elements that always conduct (resistors, transistors with a gate on the rail
 * that turns them on) between the output and one direction's sources: a ratioed load. Null if none.
 */
export function alwaysOnOhms(stage: Stage, direction: Direction, caps: Float64Array): number | null {
  const on = stage.elements.map((e) => e.control < 0);
  return evaluate(stage, on, direction, caps)?.ohms ?? null;
}
