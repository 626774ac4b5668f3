/** Per-net level codes in a SolveResult. */
export const LEVEL_0 = 0;
export const LEVEL_1 = 1;
/** Undefined: contention, a bad ratio, or unknown. */
export const LEVEL_X = 2;
/** Floating: no conducting path to any source (its stored charge is in `volts`). */
export const LEVEL_Z = 3;

/** Per-net flags in a SolveResult (bit mask). */
export const FLAG_DEGRADED = 1;
export const FLAG_CONTENTION = 2;
export const FLAG_CHARGE_SHARED = 4;
export const FLAG_OSCILLATING = 8;
/** The value depends on maybe-conducting devices (gates at X). */
export const FLAG_MAYBE = 16;
/** More unknowns than an exact bound (maybe devices, undecided feedback nets): set to X conservatively. */
export const FLAG_BOUND = 32;
/**
 * A feedback group has several steady states that disagree on this net (stored state: a latch or
 * memory cell holding its value, or, with FLAG_OSCILLATING, a race): it is X.
 */
export const FLAG_STATES = 64;
/** The nodal solve of this net's group was too ill-conditioned to trust: set to X. */
export const FLAG_ILL_CONDITIONED = 128;

/** Per channel element conduction codes. */
export const OFF = 0;
export const ON = 1;
export const MAYBE = 2;

export type LevelCode = typeof LEVEL_0 | typeof LEVEL_1 | typeof LEVEL_X | typeof LEVEL_Z;

/** Classifies a voltage against the input thresholds: ≤ VIL → 0, ≥ VIH → 1, else (or unknown) X. */
export function classify(
  volts: number,
  vil: number,
  vih: number,
): typeof LEVEL_0 | typeof LEVEL_1 | typeof LEVEL_X {
  if (volts <= vil) return LEVEL_0;
  if (volts >= vih) return LEVEL_1;
  return LEVEL_X; // also NaN: comparisons with NaN are false
}

export function levelName(code: number): '0' | '1' | 'X' | 'Z' {
  return code === LEVEL_0 ? '0' : code === LEVEL_1 ? '1' : code === LEVEL_Z ? 'Z' : 'X';
}
