// Indexes read here are in range by construction, so `!` marks them (no run-time cost).
/** Wall-clock helpers. Times are from process.hrtime.bigint(), in seconds as numbers. */

export function now(): bigint {
  return process.hrtime.bigint();
}

/** CPU seconds (user and system) this process has used: the steady figure on a shared machine. */
export function cpuSeconds(): number {
  const { user, system } = process.cpuUsage();
  return (user + system) / 1e6;
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
  /**
   * Untimed runs first, so the optimiser has compiled the hot paths: at least `warmup` runs (default 3)
   * and at least `warmupSeconds` (default 0.05 s); the first solves of a new circuit can be 10–100
   * times slower than the steady ones.
   */
  readonly warmup?: number;
  readonly warmupSeconds?: number;
  /** Keep running until this much time has been spent timing (default 0.5 s)… */
  readonly budgetSeconds?: number;
  /** …but at least this many runs (default 5) and at most this many (default 10,000). */
  readonly minRuns?: number;
  readonly maxRuns?: number;
}

/** Times `fn` repeatedly, each run on its own, so stray pauses (collector, other processes) stand apart. */
export function repeat(fn: () => void, options: RepeatOptions = {}): Sample {
  const { warmup = 3, warmupSeconds = 0.05, budgetSeconds = 0.5, minRuns = 5, maxRuns = 10_000 } = options;
  const warmStart = now();
  for (let i = 0; i < warmup || (secondsSince(warmStart) < warmupSeconds && i < maxRuns); i++) fn();
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
  return { runs: times.length, median: times[times.length >> 1]!, best: times[0]!, total };
}
