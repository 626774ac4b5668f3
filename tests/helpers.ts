import { compile } from '../src/core/compile/compile.ts';
import type { InputVector } from '../src/core/model/design.ts';
import type { Netlist } from '../src/core/model/netlist.ts';
import { DEFAULT_TECHNOLOGY, type Technology } from '../src/core/model/technology.ts';
import { levelName } from '../src/core/solver/levels.ts';
import { Simulator, type SolveResult } from '../src/core/solver/simulator.ts';

/** A solved vector with lookups by net name. */
export class Solved {
  constructor(readonly result: SolveResult) {}
  private index(net: string): number {
    const n = this.result.compiled.netIndex.get(net);
    if (n === undefined) throw new Error(`no net ${net}`);
    return n;
  }
  level(net: string): '0' | '1' | 'X' | 'Z' {
    return levelName(this.result.levels[this.index(net)]!);
  }
  volts(net: string): number {
    return this.result.volts[this.index(net)]!;
  }
  flags(net: string): number {
    return this.result.flags[this.index(net)]!;
  }
}

export function solve(netlist: Netlist, inputs: InputVector, tech: Technology = DEFAULT_TECHNOLOGY): Solved {
  return new Solved(new Simulator(compile(netlist, tech)).solveFresh(inputs));
}

/** Solves steps in order, carrying charge; returns one Solved per step. */
export function solveSteps(
  netlist: Netlist,
  steps: InputVector[],
  tech: Technology = DEFAULT_TECHNOLOGY,
): Solved[] {
  const sim = new Simulator(compile(netlist, tech));
  const out: Solved[] = [];
  let previous: SolveResult | null = null;
  let held: Record<string, string> = {};
  for (const step of steps) {
    held = { ...held, ...step };
    previous = previous ? sim.solveNext(held as InputVector, previous) : sim.solveFresh(held as InputVector);
    out.push(new Solved(previous));
  }
  return out;
}

type Leading<T, N extends number, R extends T[] = []> = R['length'] extends N ? R : Leading<T, N, [...R, T]>;

/** The first `count` items of a list, typed as present; throws (failing the test) when it is shorter. */
export function leading<T, N extends number>(list: readonly T[], count: N): Leading<T, N> {
  if (list.length < count) throw new Error(`expected at least ${count} items, got ${list.length}`);
  return list.slice(0, count) as Leading<T, N>;
}

/**
 * Everything a solve reports that levels, findings and currents are built from, as plain data that
 * `toEqual` compares (NaN written out, currents to 7 significant digits).
 */
export function solveSnapshot(r: SolveResult) {
  const text = (a: Float64Array, digits: number) =>
    Array.from(a, (v) => (Number.isNaN(v) ? 'nan' : v.toExponential(digits)));
  return {
    volts: text(r.volts, 9),
    driven: Array.from(r.driven),
    levels: Array.from(r.levels),
    flags: Array.from(r.flags),
    limiter: Array.from(r.limiter),
    conduction: Array.from(r.conduction),
    current: text(r.chCurrent, 6),
    settled: r.settled,
  };
}
