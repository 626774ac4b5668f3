// Indexes here are in range by construction (compiled-netlist and per-net arrays), so `!` marks them (no run-time cost).
import type { CompiledNetlist } from '../compile/compile.ts';
import { NMOS, PMOS } from '../compile/compile.ts';
import { OFF } from '../solver/levels.ts';
import type { SolveResult } from '../solver/simulator.ts';
import { solveFreeNets, type Stamp } from './leakageNetwork.ts';

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

/**
 * Subthreshold leakage of solved vectors. An off transistor is a conductance g = ioff·W / VDD.
 * Driven nets keep their solved voltage; nets that are not driven (floating, unknown, between two
 * off transistors) are solved from the leakage conductances, which gives the stack effect of series
 * off transistors in its linear form (two in series leak half of one; real stacks leak less still,
 * so this overestimates them). Built once per netlist; one pass over the transistors per vector.
 */
export class LeakageEstimator {
  /** Leakage conductance per channel element, siemens; 0 for resistors. */
  private readonly conductance: Float64Array;
  /** Scratch: each undriven net's number within one vector's solve, −1 otherwise. */
  private readonly localOf: Int32Array;

  constructor(private readonly compiled: CompiledNetlist) {
    const perVolt = compiled.tech.ioffPerWidth / compiled.tech.vdd;
    this.conductance = Float64Array.from({ length: compiled.chCount }, (_, e) => {
      const d = compiled.netlist.devices[compiled.chDevice[e]!]!;
      const isMos = compiled.chKind[e] === NMOS || compiled.chKind[e] === PMOS;
      return isMos && (d.kind === 'nmos' || d.kind === 'pmos') ? perVolt * d.w : 0;
    });
    this.localOf = new Int32Array(compiled.netCount).fill(-1);
  }

  of(result: SolveResult): Leakage {
    const c = this.compiled;
    const { volts, driven, conduction } = result;
    const fixed = (n: number): boolean => driven[n] === 1 && !Number.isNaN(volts[n]);
    let watts = 0;
    const pending: Stamp[] = [];
    for (let e = 0; e < c.chCount; e++) {
      const g = this.conductance[e]!;
      if (g === 0 || conduction[e] !== OFF) continue;
      const a = c.chA[e]!;
      const b = c.chB[e]!;
      if (fixed(a) && fixed(b)) watts += g * (volts[a]! - volts[b]!) ** 2;
      else pending.push({ a, b, g });
    }
    if (pending.length > 0) watts += this.undrivenWatts(result, pending, fixed);
    return { current: watts / c.tech.vdd, watts };
  }

  /**
   * Leakage through off transistors that touch an undriven net, after solving those nets. The
   * undriven nets are those at the ends of such transistors and every undriven net joined to them
   * by a conducting device: a floating stack joint two conducting devices away still carries the
   * leakage current through.
   */
  private undrivenWatts(
    result: SolveResult,
    pending: readonly Stamp[],
    fixed: (n: number) => boolean,
  ): number {
    const c = this.compiled;
    const free: number[] = [];
    const mark = (n: number): void => {
      if (this.localOf[n]! < 0 && !fixed(n)) this.localOf[n] = free.push(n) - 1;
    };
    for (const s of pending) {
      mark(s.a);
      mark(s.b);
    }
    const joins: [number, number][] = [];
    // `free` grows while it is walked: a breadth-first search through conducting devices.
    for (let i = 0; i < free.length; i++) {
      const n = free[i]!;
      for (let k = c.netChannels.start[n]!; k < c.netChannels.start[n + 1]!; k++) {
        const e = c.netChannels.items[k]!;
        const other = c.chA[e] === n ? c.chB[e]! : c.chA[e]!;
        if (result.conduction[e] === OFF || fixed(other)) continue;
        mark(other);
        joins.push([n, other]);
      }
    }
    const volts = result.volts.slice();
    solveFreeNets(pending, joins, volts, free, this.localOf);
    for (const n of free) this.localOf[n] = -1;
    let watts = 0;
    for (const s of pending) {
      const vds = volts[s.a]! - volts[s.b]!;
      if (Number.isFinite(vds)) watts += s.g * vds * vds;
    }
    return watts;
  }
}
