import type { SolveResult } from '../solver/simulator.ts';

/**
 * The charge the switch-level solution leaves on its floating nets (a precharged node holding its
 * level), NaN elsewhere and where the charge is unknown. The DC solve uses it for nets that the
 * level-1 solution also leaves floating, since a DC solve alone cannot know a stored charge.
 */
export function storedVolts(result: SolveResult): Float64Array {
  const { volts, driven, topology } = result;
  return Float64Array.from(volts, (v, n) => (driven[n] || topology.isSource[n] ? NaN : v));
}
