// Indexes here are in range by construction (compiled-netlist and per-net arrays), so `!` marks them (no run-time cost).
import type { CompiledNetlist } from '../compile/compile.ts';
import type { InputVector } from '../model/design.ts';
import { GMIN, NodalSystem } from './assemble.ts';
import { solveGroup, type GroupOutcome, type SolveState } from './group.ts';
import { DcNetwork } from './network.ts';

/** The level-1 DC operating point of one input vector (docs/semantics.md §2, DC levels). */
export interface OperatingPoint {
  readonly network: DcNetwork;
  /** Volts per net; NaN where no voltage could be decided (see `groups`). */
  readonly volts: Float64Array;
  /** The numbers Newton settled on, floating nets included: a start for the next point, never a result. */
  readonly raw: Float64Array;
  /** Amperes from A (drain) to B (source) per channel element; NaN where unknown. */
  readonly current: Float64Array;
  /** Amperes drawn from the supply rails; NaN when any element touching a supply is unknown. */
  readonly supplyCurrent: number;
  /** One outcome per group of `network.groups`, in order. */
  readonly groups: readonly GroupOutcome[];
}

export interface SolveOptions {
  /** Starting voltage per net (the switch-level solution); NaN or absent: the middle of its range. */
  readonly start?: ArrayLike<number>;
  /**
   * Stored voltage per net, used for a net that the DC solution leaves floating (a dynamic node
   * holding its charge); NaN: unknown charge, so the net has no DC voltage.
   */
  readonly stored?: ArrayLike<number>;
  /** Newton iterations allowed per attempt; lower only to see the fallbacks at work. */
  readonly maxIterations?: number;
}

/** Fixed voltages of one vector: rails, and inputs at 0 or VDD (X: NaN); Z inputs are not sources. */
export interface Sources {
  readonly volts: Float64Array;
  readonly undriven: ReadonlySet<number>;
}

export function sourcesFor(c: CompiledNetlist, vector: InputVector): Sources {
  const volts = c.railVolts.slice();
  const undriven = new Set<number>();
  c.netlist.inputs.forEach((name, i) => {
    const n = c.inputNets[i]!;
    const value = vector[name] ?? 'Z';
    if (value === 'Z') undriven.add(n);
    else volts[n] = value === '1' ? c.tech.vdd : value === '0' ? 0 : NaN;
  });
  return { volts, undriven };
}

/**
 * Solves DC operating points of one compiled netlist. Reuse it across the vectors of a sweep or the
 * points of a transfer curve: the grouping is built once per choice of undriven inputs.
 */
export class DcSolver {
  private readonly networks = new Map<string, DcNetwork>();

  constructor(readonly compiled: CompiledNetlist) {}

  network(undriven: ReadonlySet<number>): DcNetwork {
    const key = [...undriven].sort((a, b) => a - b).join(',');
    let network = this.networks.get(key);
    if (network === undefined) {
      network = new DcNetwork(this.compiled, undriven);
      this.networks.set(key, network);
    }
    return network;
  }

  /** The operating point with `sources.volts` held at source nets (every other entry is ignored). */
  solve(sources: Sources, options: SolveOptions = {}): OperatingPoint {
    const c = this.compiled;
    const network = this.network(sources.undriven);
    const volts = new Float64Array(c.netCount).fill(NaN);
    for (let n = 0; n < c.netCount; n++) if (network.topology.isSource[n]) volts[n] = sources.volts[n]!;
    const none = new Float64Array(c.netCount).fill(NaN);
    const state: SolveState = {
      volts,
      raw: volts.slice(),
      current: new Float64Array(c.chCount).fill(NaN),
      start: options.start ?? none,
      stored: options.stored ?? none,
      ...(options.maxIterations === undefined ? {} : { maxIterations: options.maxIterations }),
    };
    const groups = network.groups.map((_g, k) => solveGroup(network, k, state));
    const bridges = new NodalSystem(network, network.topology.bridges, network.pos, volts, 0);
    bridges.assemble(new Float64Array(0));
    for (const e of network.topology.bridges) state.current[e] = bridges.current[e]!;
    return {
      network,
      volts,
      raw: state.raw,
      current: state.current,
      supplyCurrent: supplyCurrent(network, state.current),
      groups,
    };
  }
}

/**
 * Amperes leaving the supply rails. GMIN on each unknown net draws up to GMIN·V through whatever holds
 * it, so a total within that bound is below the model's precision and reads 0.
 */
function supplyCurrent(network: DcNetwork, current: Float64Array): number {
  const c = network.compiled;
  let top = c.tech.vdd;
  for (const v of c.railVolts) if (Number.isFinite(v)) top = Math.max(top, Math.abs(v));
  const floor = 2 * GMIN * top * c.netCount;
  let total = 0;
  for (const rail of network.supplyNets) {
    for (let i = c.netChannels.start[rail]!; i < c.netChannels.start[rail + 1]!; i++) {
      const e = c.netChannels.items[i]!;
      if (c.chA[e] === c.chB[e]) continue;
      total += c.chA[e] === rail ? current[e]! : -current[e]!;
    }
  }
  return Math.abs(total) <= floor ? 0 : total;
}

/**
 * dV/dV(source) for every net at an operating point: the slope of each net's voltage as one source
 * moves, from the Jacobians at the solution (J·dv = −∂F/∂source, group by group in order). NaN where
 * the point has no voltage; 0 for floating nets held at a stored voltage.
 */
export function slopeAt(point: OperatingPoint, source: number): Float64Array {
  const { network, volts, raw } = point;
  const c = network.compiled;
  const slope = new Float64Array(c.netCount).fill(NaN);
  for (let n = 0; n < c.netCount; n++) if (network.topology.isSource[n]) slope[n] = n === source ? 1 : 0;
  network.groups.forEach((group, k) => {
    const outcome = point.groups[k];
    if (outcome?.status !== 'solved') return;
    for (const n of outcome.floating) slope[n] = Number.isNaN(volts[n]) ? NaN : 0;
    const unknowns =
      outcome.floating.length === 0 ? group.nets : group.nets.filter((n) => !outcome.floating.includes(n));
    unknowns.forEach((n, i) => (network.pos[n] = i));
    const sys = network.system(k, unknowns.length, raw);
    sys.assemble(
      Float64Array.from(unknowns, (n) => raw[n]!),
      undefined,
      { boundary: slope, rhs: sys.rhs },
    );
    const solved = sys.solveLinear(sys.rhs, sys.step);
    unknowns.forEach((n, i) => {
      network.pos[n] = -1;
      slope[n] = solved ? sys.step[i]! : NaN;
    });
  });
  return slope;
}
