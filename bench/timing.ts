/** Wall-clock helpers. Times are from process.hrtime.bigint(), in seconds as numbers. */

export function now(): bigint {
  return process.hrtime.bigint();
}

export function secondsSince(start: bigint): number {
  return Number(process.hrtime.bigint() - start) / 1e9;
}

export interface Sample {
  /** Runs of `fn` that were timed. */
  readonly runs: number;
  /** Median seconds of one run. */
  readonly median: number;
  /** Fastest run, seconds. */
  readonly best: number;
  /** Total timed seconds. */
  readonly total: number;
}

export interface RepeatOptions {
  /** Untimed runs first, so the optimiser has compiled the hot paths (default 3). */
  readonly warmup?: number;
  /** Keep running until this much time has been spent timing (default 0.5 s)… */
  readonly budgetSeconds?: number;
  /** …but at least this many runs (default 5) and at most this many (default 10,000). */
  readonly minRuns?: number;
  readonly maxRuns?: number;
}

/** Times `fn` repeatedly. Each run is timed on its own so the median hides a stray GC pause. */
export function repeat(fn: () => void, options: RepeatOptions = {}): Sample {
  const { warmup = 3, budgetSeconds = 0.5, minRuns = 5, maxRuns = 10_000 } = options;
  for (let i = 0; i < warmup; i++) fn();
  const times: number[] = [];
  let total = 0;
  while (times.length < minRuns || (total < budgetSeconds && times.length < maxRuns)) {
    const start = now();
    fn();
    const t = secondsSince(start);
    times.push(t);
    total += t;
  }
  times.sort((x, y) => x - y);
  return { runs: times.length, median: times[times.length >> 1], best: times[0], total };
}
