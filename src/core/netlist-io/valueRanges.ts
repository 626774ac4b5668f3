/**
 * The physical range of every number a netlist gives (docs/semantics.md §6): a value outside it is
 * refused at the parser with the file, line and field, so no Infinity, denormal or absurd size
 * reaches the solver. The bounds are generous on purpose; they only catch values no cell can have
 * (common practice, no source).
 */

export type RangedField =
  'w' | 'l' | 'm' | 'ohms' | 'farads' | 'volts' | 'scale' | 'vto' | 'kp' | 'gamma' | 'phi' | 'lambda';

interface Range {
  readonly min: number;
  readonly max: number;
  /** How the bounds read in a message. */
  readonly bounds: string;
}

export const VALUE_RANGES: Readonly<Record<RangedField, Range>> = {
  /** Transistor width and length in µm, after scale: 1 nm to 1 cm. */
  w: { min: 1e-3, max: 1e4, bounds: '1 nm to 1 cm' },
  l: { min: 1e-3, max: 1e4, bounds: '1 nm to 1 cm' },
  /** Parallel devices folded into the width: a whole number. */
  m: { min: 1, max: 1e5, bounds: 'a whole number from 1 to 100,000' },
  ohms: { min: 1e-3, max: 1e12, bounds: '1 mΩ to 1 TΩ' },
  farads: { min: 1e-21, max: 1e-6, bounds: '1 zF to 1 µF' },
  volts: { min: 0, max: 100, bounds: '0 to 100 V' },
  scale: { min: 1e-12, max: 1, bounds: '1e-12 to 1' },
  /** Level-1 model card values (`spiceModels.ts`): threshold, k', γ, 2φF, λ. */
  vto: { min: -10, max: 10, bounds: '−10 to 10 V' },
  kp: { min: 1e-7, max: 1e-2, bounds: '0.1 µA/V² to 10 mA/V² (write 110u for 110 µA/V²)' },
  gamma: { min: 0, max: 10, bounds: '0 to 10 V^½' },
  phi: { min: 0.05, max: 5, bounds: '0.05 to 5 V' },
  lambda: { min: 0, max: 10, bounds: '0 to 10 1/V' },
};

/** Null when `value` is finite and in range, else the reason in words. */
export function rangeProblem(field: RangedField, value: number): string | null {
  const range = VALUE_RANGES[field];
  if (!Number.isFinite(value)) return 'is not a finite number';
  if (field === 'm' && !Number.isInteger(value)) return `is not ${range.bounds}`;
  if (value < range.min || value > range.max) return `is outside ${range.bounds}`;
  return null;
}
