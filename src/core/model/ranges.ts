/**
 * The physical range of every number a design may hold, one table for every reader: design files,
 * share links, netlist import (netlist-io/valueRanges.ts adds its own `m` and `scale`) and the
 * command line. A value outside is refused where it is read, naming the field: no infinities, no
 * denormals standing in for zero, no unit slip (a width of 2 read as 2 m). The bounds are wide on
 * purpose: they keep every figure finite and the linear solves well conditioned, not to judge a
 * design (common practice, no source). docs/semantics.md §7 lists them.
 */
export interface Range {
  readonly min: number;
  readonly max: number;
  /** True when `min` itself is refused (a supply of 0 V). */
  readonly minExclusive?: boolean;
  /** True when `max` itself is refused (a width of 1 cm is a missing `u`). */
  readonly maxExclusive?: boolean;
  /** How the bounds read in a message. */
  readonly words: string;
}

export const RANGES = {
  /** Transistor W and L, µm: from 1 nm up to, not including, 1 cm. */
  length: { min: 1e-3, max: 1e4, maxExclusive: true, words: '1 nm to 1 cm' },
  /** Resistors and unit on-resistances, ohms. */
  ohms: { min: 1e-3, max: 1e12, words: '1 mΩ to 1 TΩ' },
  /** Capacitors, farads. */
  farads: { min: 1e-21, max: 1e-6, words: '1 zF to 1 µF' },
  /** A supply's voltage. */
  supply: { min: 0, max: 100, minExclusive: true, words: 'above 0 V, up to 100 V' },
  /** Voltages that may be 0: V sources, thresholds, input levels. */
  volts: { min: 0, max: 100, words: '0 to 100 V' },
  /** Gate capacitance per area, F/µm². */
  capacitancePerArea: { min: 0, max: 1e-9, words: '0 to 1 nF/µm²' },
  /** Diffusion capacitance per width, F/µm. */
  capacitancePerWidth: { min: 0, max: 1e-9, words: '0 to 1 nF/µm' },
  /** Off-current per width, A/µm. */
  currentPerWidth: { min: 0, max: 1e-3, words: '0 to 1 mA/µm' },
  /**
   * A model card's threshold VTO, volts (negative for an enhancement PMOS): as wide as the
   * technology's own thresholds (`volts`), so every technology writes a card that reads back.
   */
  threshold: { min: -100, max: 100, words: '−100 to 100 V' },
  /** Process transconductance k', A/V². */
  transconductance: { min: 1e-9, max: 1, words: '1 nA/V² to 1 A/V²' },
  /** Body-effect coefficient γ of the level-1 DC model, V^½. */
  bodyEffect: { min: 0, max: 10, words: '0 to 10 V^½' },
  /** Surface potential 2φF of the level-1 DC model, volts. */
  surfacePotential: { min: 0, max: 10, minExclusive: true, words: 'above 0 V, up to 10 V' },
  /** Channel-length modulation λ of the level-1 DC model, 1/V. */
  channelModulation: { min: 0, max: 10, words: '0 to 10 /V' },
  /** Sheet coordinates, grid units from the origin either way. */
  coordinate: { min: -1e6, max: 1e6, words: '−1,000,000 to 1,000,000 grid units' },
} as const satisfies Readonly<Record<string, Range>>;

/** True when `value` is a finite number inside the range. */
export function inRange(value: number, range: Range): boolean {
  if (!Number.isFinite(value)) return false;
  const aboveMin = range.minExclusive ? value > range.min : value >= range.min;
  const belowMax = range.maxExclusive ? value < range.max : value <= range.max;
  return aboveMin && belowMax;
}

/** "must be from 1 nm to 1 cm" */
export function rangeText(range: Range): string {
  return `must be ${range.words.startsWith('above') ? '' : 'from '}${range.words}`;
}
