// Indexes read here are in range by construction, so `!` marks them (no run-time cost).
import type { VectorPower } from '../../core/power/types.ts';

/**
 * Geometry of the static-power bar chart, kept apart from rendering so it can be tested without a
 * page. Static power spans many decades (pW of leakage next to mW through a ratioed load), so the
 * scale is logarithmic: a linear one would flatten every leakage-only vector to nothing.
 */
export interface Bar {
  /** Position of the vector in the report. */
  readonly index: number;
  /** Input values in input order, e.g. "01". */
  readonly label: string;
  readonly watts: number;
  /** 'dc' when a conducting path carries current, 'leakage' when only off transistors leak. */
  readonly kind: 'dc' | 'leakage' | 'none';
  readonly x: number;
  readonly y: number;
  readonly width: number;
  readonly height: number;
}

export interface Tick {
  readonly y: number;
  readonly watts: number;
}

export interface ChartGeometry {
  readonly bars: readonly Bar[];
  readonly ticks: readonly Tick[];
  /** How many vectors the report has; more than the bars shown when the chart keeps the largest. */
  readonly total: number;
}

export interface ChartFrame {
  readonly width: number;
  readonly height: number;
  /** Left margin for tick labels, pixels. */
  readonly left: number;
  /** Headroom above the highest tick so its label is not cut, pixels. */
  readonly top: number;
  readonly maxBars: number;
}

export const DEFAULT_FRAME: ChartFrame = { width: 300, height: 120, left: 44, top: 6, maxBars: 64 };

function kindOf(v: VectorPower): Bar['kind'] {
  if (v.dcWatts > 0) return 'dc';
  return v.leakageWatts > 0 ? 'leakage' : 'none';
}

/** Decade range covering every positive value: [lowest exponent, highest exponent]. */
function decades(values: readonly number[]): [number, number] | null {
  const positive = values.filter((w) => w > 0);
  if (positive.length === 0) return null;
  const lo = Math.floor(Math.log10(Math.min(...positive)));
  const hi = Math.ceil(Math.log10(Math.max(...positive)));
  return [lo, Math.max(hi, lo + 1)];
}

/** The vectors to draw: all of them, or the `maxBars` with the most static power, in report order. */
function shownVectors(vectors: readonly VectorPower[], maxBars: number): number[] {
  const order = vectors.map((_, i) => i);
  if (vectors.length <= maxBars) return order;
  const top = order
    .sort((a, b) => vectors[b]!.staticWatts - vectors[a]!.staticWatts || a - b)
    .slice(0, maxBars);
  return top.sort((a, b) => a - b);
}

export function chartGeometry(
  vectors: readonly VectorPower[],
  inputs: readonly string[],
  frame: ChartFrame = DEFAULT_FRAME,
): ChartGeometry {
  const shown = shownVectors(vectors, frame.maxBars);
  const range = decades(shown.map((i) => vectors[i]!.staticWatts));
  const plotWidth = frame.width - frame.left;
  const slot = plotWidth / Math.max(1, shown.length);
  const heightOf = (watts: number): number => {
    if (range === null || watts <= 0) return 0;
    const [lo, hi] = range;
    // At least 2 px, so a value sitting exactly on the lowest decade still shows.
    return Math.max(2, ((frame.height - frame.top) * (Math.log10(watts) - lo)) / (hi - lo));
  };
  const bars = shown.map((i, k): Bar => {
    const v = vectors[i]!;
    const height = heightOf(v.staticWatts);
    return {
      index: i,
      label: inputs.map((name) => v.inputs[name] ?? '?').join(''),
      watts: v.staticWatts,
      kind: kindOf(v),
      x: frame.left + k * slot + slot * 0.1,
      y: frame.height - height,
      width: slot * 0.8,
      height,
    };
  });
  const ticks: Tick[] = [];
  if (range !== null) {
    const [lo, hi] = range;
    for (let e = lo; e <= hi; e++)
      ticks.push({ y: frame.height - ((frame.height - frame.top) * (e - lo)) / (hi - lo), watts: 10 ** e });
  }
  return { bars, ticks, total: vectors.length };
}
