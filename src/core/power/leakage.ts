// Indexes here are in range by construction (compiled-netlist and per-net arrays), so `!` marks them (no run-time cost).
import type { CompiledNetlist } from '../compile/compile.ts';
import { NMOS, PMOS } from '../compile/compile.ts';
import { OFF } from '../solver/levels.ts';
import type { SolveResult } from '../solver/simulator.ts';
import { ComponentLeakageMemo } from './leakageMemo.ts';
import { isFixed, settleUndriven, type Stamp } from './leakageNetwork.ts';

export const LEAKAGE_MODEL =
  'Each off transistor leaks I = ioffPerWidth · W · V_DS / VDD: linear in width, proportional to its ' +
  'drain-source voltage (so ioffPerWidth · W at V_DS = VDD), length and temperature ignored; undriven ' +
  'nodes between off transistors settle where these leakage currents balance (common practice, no source).';

export interface Leakage {
  /** Equivalent supply current, watts / VDD, amperes (a stack's current counted once). */
  readonly current: number;
  /** Watts dissipated in off transistors: Σ g · V_DS². */
  readonly watts: number;
}

export interface LeakageOptions {
  /**
   * Reuse each channel-connected component's undriven-net solve for every vector that puts it in a
   * state it has had (default true; the figures are the same to the last bit). False solves every
   * vector afresh: the reference the reuse is tested against.
   */
  readonly reuse?: boolean;
}

/**
 * Subthreshold leakage of solved vectors. An off transistor is a conductance g = ioff·W / VDD.
 * Driven nets keep their solved voltage; nets that are not driven (floating, unknown, between two
 * off transistors) are solved from the leakage conductances, which gives the stack effect of series
 * off transistors in its linear form (two in series leak half of one; real stacks leak less still,
 * so this overestimates them). Built once per netlist; one pass over the transistors per vector, and
 * the undriven nets' solve only for component states not met before (leakageMemo.ts).
 */
export class LeakageEstimator {
  /** Leakage conductance per channel element, siemens; 0 for resistors. */
  private readonly conductance: Float64Array;
  /** Scratch: each undriven net's number within one solve, −1 otherwise. */
  private readonly localOf: Int32Array;
  /** Scratch: the off transistors with an undriven end, in element order. */
  private readonly pending: Int32Array;
  /** Scratch: the solved voltages, with the undriven nets' settled ones written over them. */
  private readonly settled: Float64Array;
  private readonly memo: ComponentLeakageMemo | null;

  constructor(
    private readonly compiled: CompiledNetlist,
    options: LeakageOptions = {},
  ) {
    const perVolt = compiled.tech.ioffPerWidth / compiled.tech.vdd;
    this.conductance = Float64Array.from({ length: compiled.chCount }, (_, e) => {
      const d = compiled.netlist.devices[compiled.chDevice[e]!]!;
      const isMos = compiled.chKind[e] === NMOS || compiled.chKind[e] === PMOS;
      return isMos && (d.kind === 'nmos' || d.kind === 'pmos') ? perVolt * d.w : 0;
    });
    this.localOf = new Int32Array(compiled.netCount).fill(-1);
    this.pending = new Int32Array(compiled.chCount);
    this.settled = new Float64Array(compiled.netCount);
    this.memo =
      options.reuse === false
        ? null
        : new ComponentLeakageMemo(compiled, (result, elements, volts) =>
            settleUndriven(compiled, result, this.stamps(elements), volts, this.localOf),
          );
  }

  of(result: SolveResult): Leakage {
    const c = this.compiled;
    const { volts, conduction } = result;
    let watts = 0;
    let pending = 0;
    for (let e = 0; e < c.chCount; e++) {
      const g = this.conductance[e]!;
      if (g === 0 || conduction[e] !== OFF) continue;
      const a = c.chA[e]!;
      const b = c.chB[e]!;
      if (isFixed(result, a) && isFixed(result, b)) watts += g * (volts[a]! - volts[b]!) ** 2;
      else this.pending[pending++] = e;
    }
    if (pending > 0) watts += this.undrivenWatts(result, this.pending.subarray(0, pending));
    return { current: watts / c.tech.vdd, watts };
  }

  /** Leakage through off transistors that touch an undriven net, after solving those nets. */
  private undrivenWatts(result: SolveResult, pending: Int32Array): number {
    const c = this.compiled;
    const volts = this.settled;
    volts.set(result.volts);
    if (!this.memo?.settle(result, pending, volts))
      settleUndriven(c, result, this.stamps(pending), volts, this.localOf);
    let watts = 0;
    for (const e of pending) {
      const vds = volts[c.chA[e]!]! - volts[c.chB[e]!]!;
      if (Number.isFinite(vds)) watts += this.conductance[e]! * vds * vds;
    }
    return watts;
  }

  private stamps(elements: ArrayLike<number>): Stamp[] {
    const c = this.compiled;
    return Array.from(elements, (e) => ({ a: c.chA[e]!, b: c.chB[e]!, g: this.conductance[e]! }));
  }
}
