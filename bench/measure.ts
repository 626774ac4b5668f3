// Indexes read here are in range by construction, so `!` marks them (no run-time cost).
/**
 * The measurements: each compiles a generated netlist once, warms the solver up, then times it.
 * Every function returns a CaseResult in the shape the JSON line promises.
 */
import { checkSweep } from '../src/core/analysis/check.ts';
import { compile, type CompiledNetlist } from '../src/core/compile/compile.ts';
import type { InputVector } from '../src/core/model/design.ts';
import type { Netlist } from '../src/core/model/netlist.ts';
import { DEFAULT_TECHNOLOGY } from '../src/core/model/technology.ts';
import { LEVEL_X, LEVEL_Z } from '../src/core/solver/levels.ts';
import { Simulator, type SolveResult } from '../src/core/solver/simulator.ts';
import { transistorCount } from './generators/index.ts';
import { cpuSeconds, now, repeat, secondsSince, type Sample } from './timing.ts';
import { randomVectors, vectorAt } from './vectors.ts';

export type CaseKind = 'settle' | 'random' | 'sweep' | 'check-sweep' | 'toggle' | 'edit';

export interface CaseResult {
  readonly name: string;
  readonly kind: CaseKind;
  readonly transistors: number;
  readonly vectors: number;
  /**
   * Seconds for all `vectors`. Repeated cases give the fastest run: on a shared machine it is the
   * one least disturbed by other work (the median is in `medianSeconds`). Sweeps give the wall time.
   */
  readonly seconds: number;
  readonly medianSeconds?: number;
  /** Timed runs behind a repeated case. */
  readonly runs?: number;
  readonly nsPerTransistorVector: number;
  readonly vectorsPerSecond: number;
  /** Nets whose level was X or Z in the last timed vector: a quick sign the circuit is wired right. */
  readonly unknownOutputs?: number;
  /** CPU seconds for the same work (sweeps only). */
  readonly cpuSeconds?: number;
  /** True when the figure was projected from part of the work (see measureSweep). */
  readonly extrapolated?: boolean;
}

export interface Prepared {
  readonly netlist: Netlist;
  readonly compiled: CompiledNetlist;
  readonly simulator: Simulator;
  readonly transistors: number;
}

/**
 * Compiles `netlist` and makes its simulator. By default the simulator is incremental, as the app and
 * checkSweep use it: a solve re-evaluates only what the changed inputs reach from the previous one.
 * `incremental: false` makes every solve evaluate the whole circuit.
 */
export function prepare(netlist: Netlist, options: { readonly incremental?: boolean } = {}): Prepared {
  const compiled = compile(netlist, DEFAULT_TECHNOLOGY);
  const simulator = new Simulator(compiled, options);
  return { netlist, compiled, simulator, transistors: transistorCount(netlist) };
}

/** A repeated case: the fastest run is the figure, the median rides along. */
export function timed(
  name: string,
  kind: CaseKind,
  p: Prepared,
  vectors: number,
  sample: Sample,
): CaseResult {
  return { ...result(name, kind, p, vectors, sample.best), medianSeconds: sample.median, runs: sample.runs };
}

function result(name: string, kind: CaseKind, p: Prepared, vectors: number, seconds: number): CaseResult {
  return {
    name,
    kind,
    transistors: p.transistors,
    vectors,
    seconds,
    nsPerTransistorVector: (seconds * 1e9) / (p.transistors * vectors),
    vectorsPerSecond: vectors / seconds,
  };
}

function countUnknownOutputs(p: Prepared, solved: SolveResult): number {
  return Array.from(p.compiled.outputNets).filter(
    (n) => solved.levels[n] === LEVEL_X || solved.levels[n] === LEVEL_Z,
  ).length;
}

/**
 * Time to settle one vector from an unknown state, alternating between two random vectors. Pass a
 * simulator prepared with `incremental: false` to time a whole settle rather than the difference.
 */
export function measureSettle(name: string, p: Prepared, budgetSeconds = 0.3): CaseResult {
  const vectors = randomVectors(p.netlist.inputs, 2, 7);
  let i = 0;
  const sample = repeat(() => p.simulator.solveFresh(vectors[i++ & 1]!, { recycle: true }), {
    budgetSeconds,
    maxRuns: 2000,
  });
  const unknownOutputs = countUnknownOutputs(p, p.simulator.solveFresh(vectors[0]!));
  return { ...timed(name, 'settle', p, 1, sample), unknownOutputs };
}

/**
 * Throughput on seeded random vectors, each solved from an unknown state. The batch of 32 is kept
 * short so that, on a busy machine, some runs of it go through undisturbed.
 */
export function measureRandom(name: string, p: Prepared, budgetSeconds = 1): CaseResult {
  const batch = randomVectors(p.netlist.inputs, 32, 11);
  const solveBatch = (): void => {
    for (const v of batch) p.simulator.solveFresh(v, { recycle: true });
  };
  const sample = repeat(solveBatch, { warmup: 2, budgetSeconds, minRuns: 5, maxRuns: 1000 });
  return timed(name, 'random', p, batch.length, sample);
}

/** CPU seconds (user and system) this process has used, all threads together. */

/**
 * Every combination of the inputs, each from an unknown state, building each vector as a caller
 * would and letting the solver recycle its result arrays as checkSweep does. Wall time is the figure; CPU time rides along because on a shared machine the wall clock
 * also counts other people's work. If the first 1,024 vectors project past `limitSeconds`, the sweep
 * stops there and the figure is projected (and marked so) rather than holding the whole run hostage.
 */
export function measureSweep(name: string, p: Prepared, limitSeconds = 60): CaseResult {
  const inputs = p.netlist.inputs;
  const total = 2 ** inputs.length;
  for (let v = 0; v < Math.min(total, 512); v++) p.simulator.solveFresh(vectorAt(inputs, v * 97));
  const start = now();
  const cpuStart = cpuSeconds();
  let done = 0;
  while (done < total) {
    p.simulator.solveFresh(vectorAt(inputs, done++), { recycle: true });
    if (done === 1024 && (secondsSince(start) * total) / done > limitSeconds) break;
  }
  const scale = total / done;
  const measured = result(name, 'sweep', p, total, secondsSince(start) * scale);
  const cpu = (cpuSeconds() - cpuStart) * scale;
  return done < total
    ? { ...measured, cpuSeconds: cpu, extrapolated: true }
    : { ...measured, cpuSeconds: cpu };
}

/**
 * Time to re-solve after one input changes, carrying the previous state (`solveNext`).
 * `walk` is a closed cycle of vectors, each differing from the one before (and the last from the
 * first) in a single input; the timed solves go round it.
 */
export function measureToggle(name: string, p: Prepared, walk: readonly InputVector[]): CaseResult {
  let previous = p.simulator.solveFresh(walk[0]!);
  let i = 1;
  const sample = repeat(
    () => {
      previous = p.simulator.solveNext(walk[i++ % walk.length]!, previous);
    },
    { warmup: 2 * walk.length, budgetSeconds: 0.5, maxRuns: 5000 },
  );
  return timed(name, 'toggle', p, 1, sample);
}

/** After an edit the app recompiles and solves from scratch: compile + new Simulator + solveFresh. */
export function measureEdit(name: string, netlist: Netlist, vector: InputVector): CaseResult {
  let p = prepare(netlist);
  const sample = repeat(
    () => {
      p = prepare(netlist);
      p.simulator.solveFresh(vector);
    },
    { warmup: 3, budgetSeconds: 0.5, maxRuns: 200 },
  );
  return timed(name, 'edit', p, 1, sample);
}

/**
 * The whole analysis a user runs, `checkSweep`: vectors, solves, findings and the report. Set beside
 * a solver-only sweep of the same netlist, it shows what the reporting adds.
 */
export function measureCheckSweep(name: string, netlist: Netlist): CaseResult {
  const p = prepare(netlist);
  let vectors = 0;
  const sample = repeat(
    () => {
      vectors = checkSweep(netlist).summary.vectors;
    },
    { warmup: 1, budgetSeconds: 1, minRuns: 1, maxRuns: 3 },
  );
  return timed(name, 'check-sweep', p, vectors, sample);
}
