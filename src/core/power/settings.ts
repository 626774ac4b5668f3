/**
 * The power settings a designer chooses, and their defaults: the one definition the app and the
 * command line both use (docs/semantics.md §5), so the same cell gives the same figure in each.
 */
import type { ActivitySource } from './types.ts';

export interface PowerSettings {
  /** Clock frequency, Hz: one input vector (or sequence step) per cycle. */
  readonly frequency: number;
  /** Load capacitance on each output, farads; sizing uses the same load. */
  readonly load: number;
  /** Where switching activity comes from. */
  readonly activity: ActivitySource;
}

/**
 * 100 MHz, 10 fF on each output (a few gate loads of the default process), every vector equally
 * likely: round figures for a first look (common practice, no source). Input thresholds are the
 * technology's (core/model/technology.ts).
 */
export const DEFAULT_POWER_SETTINGS: PowerSettings = {
  frequency: 100e6,
  load: 10e-15,
  activity: 'random',
};

export class PowerOptionsError extends Error {
  override readonly name = 'PowerOptionsError';
  constructor(
    /** The setting at fault: 'frequency', 'load', 'sequence' or 'maxInputs'. */
    readonly field: string,
    message: string,
  ) {
    super(message);
  }
}

/** Refuses settings no report can be made with; the error names the setting. */
export function checkPowerSettings(settings: PowerSettings): void {
  if (!Number.isFinite(settings.frequency) || settings.frequency < 0) {
    throw new PowerOptionsError(
      'frequency',
      `frequency must be a non-negative number of hertz, got ${settings.frequency}`,
    );
  }
  if (!Number.isFinite(settings.load) || settings.load < 0) {
    throw new PowerOptionsError('load', `load must be a non-negative number of farads, got ${settings.load}`);
  }
}
