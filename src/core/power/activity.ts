// Indexes here are in range by construction (compiled-netlist and per-net arrays), so `!` marks them (no run-time cost).
import { classify, LEVEL_0, LEVEL_1 } from '../solver/levels.ts';
import type { SolveResult } from '../solver/simulator.ts';

export const ACTIVITY_CONVENTION =
  'α is the probability of a 0→1 transition on a net per clock cycle and P = α·C·VDD²·f ' +
  '(C·VDD·swing in place of C·VDD² where a level arrives degraded); with random activity every input ' +
  'is independent and equiprobable, a new vector each cycle, so α = p0·p1; with a sequence, α counts ' +
  '0→1 transitions between consecutive steps over the number of step changes.';

/** Per net: 0→1 probability per cycle, and the mean high level minus the mean low level, volts. */
export interface ActivityFigures {
  readonly activity: Float64Array;
  readonly swing: Float64Array;
  /** Nets that were neither 0 nor 1 (X, or floating with no known charge) in some result. */
  readonly indefinite: readonly number[];
}

/**
 * Counts levels over solved vectors one at a time, so a 65,536-vector sweep never holds more than
 * one result. A level is read from the voltage against VIL and VIH; X and unknown count as neither.
 */
export class ActivityCounter {
  private readonly zeros: Float64Array;
  private readonly ones: Float64Array;
  private readonly rises: Float64Array;
  private readonly lowVolts: Float64Array;
  private readonly highVolts: Float64Array;
  private readonly indefinite: Uint8Array;
  /** Levels of the last result added (0, 1, −1 for neither), and the buffer the next one fills. */
  private previous: Int8Array;
  private levels: Int8Array;
  private results = 0;

  constructor(private readonly nets: number) {
    this.zeros = new Float64Array(nets);
    this.ones = new Float64Array(nets);
    this.rises = new Float64Array(nets);
    this.lowVolts = new Float64Array(nets);
    this.highVolts = new Float64Array(nets);
    this.indefinite = new Uint8Array(nets);
    this.previous = new Int8Array(nets);
    this.levels = new Int8Array(nets);
  }

  add(result: SolveResult): void {
    const { vil, vih } = result.compiled.tech;
    const { levels, previous } = this;
    const first = this.results === 0;
    for (let n = 0; n < this.nets; n++) {
      const v = result.volts[n]!;
      const level = classify(v, vil, vih);
      levels[n] = level === LEVEL_0 ? 0 : level === LEVEL_1 ? 1 : -1;
      if (levels[n] === 0) {
        this.zeros[n]!++;
        this.lowVolts[n]! += v;
      } else if (levels[n] === 1) {
        this.ones[n]!++;
        this.highVolts[n]! += v;
      } else this.indefinite[n] = 1;
      if (!first && previous[n] === 0 && levels[n] === 1) this.rises[n]!++;
    }
    this.previous = levels;
    this.levels = previous;
    this.results++;
  }

  /** Independent, equiprobable vectors, a fresh one each cycle: P(0→1) = P(0)·P(1). */
  random(): ActivityFigures {
    const total = Math.max(1, this.results);
    return this.figures((n) => (this.zeros[n]! / total) * (this.ones[n]! / total));
  }

  /** Counted over the results in the order added: 0→1 changes per step change. */
  sequence(): ActivityFigures {
    const changes = Math.max(1, this.results - 1);
    return this.figures((n) => this.rises[n]! / changes);
  }

  private figures(activityOf: (net: number) => number): ActivityFigures {
    const activity = Float64Array.from({ length: this.nets }, (_, n) => activityOf(n));
    const swing = Float64Array.from({ length: this.nets }, (_, n) =>
      this.zeros[n]! > 0 && this.ones[n]! > 0
        ? this.highVolts[n]! / this.ones[n]! - this.lowVolts[n]! / this.zeros[n]!
        : 0,
    );
    const indefinite = [...this.indefinite.keys()].filter((n) => this.indefinite[n] === 1);
    return { activity, swing, indefinite };
  }
}
