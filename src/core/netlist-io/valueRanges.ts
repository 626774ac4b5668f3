/**
 * The physical range of every number a netlist gives (docs/semantics.md §6): a value outside it is
 * refused at the parser with the file, line and field, so no Infinity, denormal or absurd size
 * reaches the solver. The ranges shared with design files live in model/ranges.ts; `m` and `scale`
 * are the netlist's own (common practice, no source).
 */
import { inRange, RANGES, type Range } from '../model/ranges.ts';

export type RangedField =
  'w' | 'l' | 'm' | 'ohms' | 'farads' | 'volts' | 'scale' | 'vto' | 'kp' | 'gamma' | 'phi' | 'lambda';

export const VALUE_RANGES: Readonly<Record<RangedField, Range>> = {
  /** Transistor width and length in µm, after scale. */
  w: RANGES.length,
  l: RANGES.length,
  /** Parallel devices folded into the width: a whole number. */
  m: { min: 1, max: 1e5, words: 'a whole number from 1 to 100,000' },
  ohms: RANGES.ohms,
  farads: RANGES.farads,
  volts: RANGES.volts,
  scale: { min: 1e-12, max: 1, words: '1e-12 to 1' },
  /**
   * Level-1 model card values (`spiceModels.ts`): threshold, k', γ, 2φF, λ, in the design file's
   * ranges, so a design's technology always exports to cards that read back.
   */
  vto: RANGES.threshold,
  kp: { ...RANGES.transconductance, words: `${RANGES.transconductance.words} (write 110u for 110 µA/V²)` },
  gamma: RANGES.bodyEffect,
  phi: RANGES.surfacePotential,
  lambda: RANGES.channelModulation,
};

/** Null when `value` is finite and in range, else the reason in words. */
export function rangeProblem(field: RangedField, value: number): string | null {
  const range = VALUE_RANGES[field];
  if (!Number.isFinite(value)) return 'is not a finite number';
  if (field === 'm' && !Number.isInteger(value)) return `is not ${range.words}`;
  if (!inRange(value, range)) return `is outside ${range.words}`;
  return null;
}
