// Indexes here are in range by construction (compiled-netlist and per-net arrays), so `!` marks them (no run-time cost).
/**
 * Figures of one transfer curve Vout(Vin) (docs/semantics.md §2, DC levels): the switching threshold
 * VM where Vout = Vin, the unity-gain points VIL and VIH where |dVout/dVin| = 1, the output levels
 * VOL and VOH, and the noise margins NML = VIL − VOL and NMH = VOH − VIH.
 *
 * Books differ on where VOL and VOH are read. Weste & Harris (CMOS VLSI Design, 4th ed., §2.5) read
 * them on the curve at the unity-gain points (section number from memory) (`unity-gain`, the default here); Sedra & Smith
 * (Microelectronic Circuits, 5th ed.) and Rabaey, Chandrakasan & Nikolić (Digital Integrated
 * Circuits, 2nd ed.) take the output with the input at the rails (`rails`).
 */

export type MarginConvention = 'unity-gain' | 'rails';

export const MARGIN_CONVENTIONS: readonly MarginConvention[] = ['unity-gain', 'rails'];

export interface TransferFigures {
  readonly vm: number | null;
  readonly vil: number | null;
  readonly vih: number | null;
  readonly vol: number | null;
  readonly voh: number | null;
  readonly nml: number | null;
  readonly nmh: number | null;
}

/** The output levels as each convention reads them. */
export interface OutputLevels {
  readonly vol: number | null;
  readonly voh: number | null;
}

/** Figures in one convention, and the levels of both, so a view can switch without solving again. */
export interface CurveFigures extends TransferFigures {
  readonly levels: Readonly<Record<MarginConvention, OutputLevels>>;
}

/** The figures of a curve in another convention: VM, VIL and VIH stay; VOL, VOH and the margins follow. */
export function inConvention(figures: CurveFigures, convention: MarginConvention): CurveFigures {
  return { ...figures, ...margins(figures.vil, figures.vih, figures.levels[convention]) };
}

function margins(vil: number | null, vih: number | null, { vol, voh }: OutputLevels) {
  return {
    vol,
    voh,
    nml: vil === null || vol === null ? null : vil - vol,
    nmh: voh === null || vih === null ? null : voh - vih,
  };
}

/** The curve at one input voltage: the output and its slope dVout/dVin. */
export interface CurvePoint {
  readonly vout: number;
  readonly slope: number;
}

/** A sampled curve, and a way to evaluate it between samples (for refining the figures). */
export interface SampledCurve {
  readonly vin: readonly number[];
  readonly vout: readonly number[];
  readonly slope: readonly number[];
  /** Solves the circuit at `vin`, starting from sample `near`; null when no DC voltage was found. */
  readonly at: (vin: number, near: number) => CurvePoint | null;
}

/**
 * An output whose two ends differ by less than this fraction of the sweep does not switch, and gets
 * no figures: a constant high output "crosses" Vout = Vin near VDD, which is no switching threshold.
 */
export const MIN_SWING = 0.5;

const NO_LEVELS: OutputLevels = { vol: null, voh: null };
/** Figures of a curve that has none (an output that does not switch, or has no voltage). */
export const NO_FIGURES: CurveFigures = {
  vm: null,
  vil: null,
  vih: null,
  vol: null,
  voh: null,
  nml: null,
  nmh: null,
  levels: { 'unity-gain': NO_LEVELS, rails: NO_LEVELS },
};

/** Figures of a curve whose every sample has a voltage; notes say why a figure is missing. */
export function curveFigures(
  curve: SampledCurve,
  convention: MarginConvention,
  notes: string[],
): CurveFigures {
  const { vin, vout, slope } = curve;
  const last = vin.length - 1;
  if (last < 1) return NO_FIGURES;
  const inverting = vout[0]! > vout[last]!;
  const swing = Math.abs(vout[0]! - vout[last]!);
  if (swing < MIN_SWING * (vin[last]! - vin[0]!)) {
    notes.push(
      `the output moves only ${swing.toFixed(3)} V over the sweep: it does not switch with this hold`,
    );
    return NO_FIGURES;
  }
  const vm = refine(
    curve,
    (k) => vout[k]! - vin[k]!,
    (p, v) => p.vout - v,
  );
  if (vm === null) notes.push('the curve never crosses Vout = Vin: no switching threshold');
  const gain = (k: number): number => Math.abs(slope[k]!) - 1;
  const gainAt = (p: CurvePoint): number => Math.abs(p.slope) - 1;
  const rising = crossings(vin.length, gain).filter((k) => gain(k) < 0);
  const falling = crossings(vin.length, gain).filter((k) => gain(k) >= 0);
  const vil = rising.length > 0 ? refineAt(curve, rising[0]!, gain, gainAt) : null;
  const vih = falling.length > 0 ? refineAt(curve, falling[falling.length - 1]!, gain, gainAt) : null;
  if (vil === null || vih === null)
    notes.push('the gain never rises through 1 and back: no unity-gain points');
  const outAt = (v: number | null): number | null =>
    v === null ? null : (curve.at(v, nearest(vin, v))?.vout ?? null);
  const atUnity = inverting ? [outAt(vih), outAt(vil)] : [outAt(vil), outAt(vih)];
  const atRails = [vout[inverting ? last : 0], vout[inverting ? 0 : last]];
  const levels = {
    'unity-gain': { vol: atUnity[0] ?? null, voh: atUnity[1] ?? null },
    rails: { vol: atRails[0] ?? null, voh: atRails[1] ?? null },
  };
  return { vm, vil, vih, ...margins(vil, vih, levels[convention]), levels };
}

/** Sample indices k where f changes sign between k and k + 1. */
function crossings(count: number, f: (k: number) => number): number[] {
  const out: number[] = [];
  for (let k = 0; k + 1 < count; k++) if (f(k) < 0 !== f(k + 1) < 0) out.push(k);
  return out;
}

/** The first interior sign change of f over the samples, refined; null when there is none. */
function refine(
  curve: SampledCurve,
  f: (k: number) => number,
  fAt: (p: CurvePoint, vin: number) => number,
): number | null {
  // Vout − Vin is 0 at an end where a non-inverting curve starts at 0 V: only strict changes count.
  for (let k = 0; k + 1 < curve.vin.length; k++) {
    const a = f(k);
    const b = f(k + 1);
    if ((a < 0 && b > 0) || (a > 0 && b < 0)) return refineAt(curve, k, f, fAt);
    if (a !== 0 && b === 0 && k + 2 < curve.vin.length && a * f(k + 2) < 0) return curve.vin[k + 1]!;
  }
  return null;
}

/** Root of f between samples k and k + 1 by the Illinois method (regula falsi that cannot stall). */
function refineAt(
  curve: SampledCurve,
  k: number,
  f: (k: number) => number,
  fAt: (p: CurvePoint, vin: number) => number,
): number | null {
  const mid = (curve.vin[k]! + curve.vin[k + 1]!) / 2;
  let a = curve.vin[k]!;
  let b = curve.vin[k + 1]!;
  let fa = f(k);
  let fb = f(k + 1);
  let side = 0;
  for (let i = 0; i < 80 && b - a > 1e-10; i++) {
    const x = fa === fb ? (a + b) / 2 : b - (fb * (b - a)) / (fb - fa);
    const p = curve.at(x, x < mid ? k : k + 1);
    if (p === null) return null;
    const fx = fAt(p, x);
    if (fx === 0) return x;
    if (fx < 0 === fa < 0) {
      a = x;
      fa = fx;
      if (side === -1) fb /= 2;
      side = -1;
    } else {
      b = x;
      fb = fx;
      if (side === 1) fa /= 2;
      side = 1;
    }
  }
  return (a + b) / 2;
}

function nearest(vin: readonly number[], v: number): number {
  let best = 0;
  for (let k = 1; k < vin.length; k++) if (Math.abs(vin[k]! - v) < Math.abs(vin[best]! - v)) best = k;
  return best;
}
