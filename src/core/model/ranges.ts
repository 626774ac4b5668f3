/**
 * The physical range of every number a design may hold. A value outside is refused where it is
 * read (design file, share link, netlist import, properties form), naming the field: no
 * infinities, no denormals standing in for zero, no unit slip (a width of 2 read as 2 m).
 * The bounds are wide on purpose: they keep every figure finite and the linear solves well
 * conditioned, not to judge a design. docs/semantics.md §7 lists them.
 */
export interface Range {
  readonly min: number;
  readonly max: number;
  /** True when `min` itself is refused (a width of 0). */
  readonly minExclusive?: boolean;
  /** True when `max` itself is refused (a width of 1 cm is a missing `u`). */
  readonly maxExclusive?: boolean;
  readonly unit: string;
}

export const RANGES = {
  /** Transistor W and L, µm: from 1 nm up to, not including, 1 cm. */
  length: { min: 1e-3, max: 1e4, maxExclusive: true, unit: 'µm' },
  /** Resistors and unit on-resistances, ohms: 1 mΩ to 1 TΩ. */
  ohms: { min: 1e-3, max: 1e12, unit: 'Ω' },
  /** Capacitors, farads: 1 zF to 1 F. */
  farads: { min: 1e-21, max: 1, unit: 'F' },
  /** Supply voltage, volts. */
  supply: { min: 0, max: 100, minExclusive: true, unit: 'V' },
  /** Thresholds and input levels, volts. */
  volts: { min: 0, max: 100, unit: 'V' },
  /** Gate capacitance per area, F/µm². */
  capacitancePerArea: { min: 0, max: 1e-9, unit: 'F/µm²' },
  /** Diffusion capacitance per width, F/µm. */
  capacitancePerWidth: { min: 0, max: 1e-9, unit: 'F/µm' },
  /** Off-current per width, A/µm. */
  currentPerWidth: { min: 0, max: 1e-3, unit: 'A/µm' },
  /** Process transconductance k', A/V². */
  transconductance: { min: 1e-9, max: 1, unit: 'A/V²' },
  /** Sheet coordinates, grid units from the origin either way. */
  coordinate: { min: -1e6, max: 1e6, unit: 'grid units' },
} as const satisfies Readonly<Record<string, Range>>;

/** True when `value` is a finite number inside the range. */
export function inRange(value: number, range: Range): boolean {
  if (!Number.isFinite(value)) return false;
  const aboveMin = range.minExclusive ? value > range.min : value >= range.min;
  const belowMax = range.maxExclusive ? value < range.max : value <= range.max;
  return aboveMin && belowMax;
}

/** "must be from 0.001 to 10000 µm (10000 excluded)" */
export function rangeText(range: Range): string {
  const ends = [range.minExclusive ? range.min : null, range.maxExclusive ? range.max : null]
    .filter((v): v is number => v !== null)
    .map(String);
  const excluded = ends.length === 0 ? '' : ` (${ends.join(' and ')} excluded)`;
  return `must be from ${range.min} to ${range.max} ${range.unit}${excluded}`;
}
