import type { CompiledNetlist } from '../compile/compile.ts';
import type { InputVector } from '../model/design.ts';
import { currentPaths, type PathIndices } from './currentPaths.ts';
import { conductionOf, evaluateCcc } from './evaluate.ts';
import { Frame } from './frame.ts';
import { classify, FLAG_OSCILLATING, LEVEL_Z, ON } from './levels.ts';
import { buildTopology, type Topology } from './topology.ts';

/**
 * Feedback bound (SPEC §3.8): a strongly connected group of n components gets 2n + 16 rounds to
 * settle. Nets still changing then become X (flagged oscillating) and the group gets as many rounds
 * again to settle around them; if it still has not, all its nets become X.
 */
export const SETTLE_ROUNDS_BASE = 16;
export const SETTLE_ROUNDS_PER_COMPONENT = 2;

export interface SolveResult {
  readonly compiled: CompiledNetlist;
  readonly topology: Topology;
  readonly inputs: InputVector;
  /** Volts per net; NaN where unknown. Floating nets hold their stored charge here. */
  readonly volts: Float64Array;
  /** 1 where a net has a conducting path to a source. */
  readonly driven: Uint8Array;
  /** LEVEL_0, LEVEL_1, LEVEL_X, LEVEL_Z per net. */
  readonly levels: Uint8Array;
  /** FLAG_* bits per net. */
  readonly flags: Uint8Array;
  /** Element that set a degraded net's threshold drop, -1 otherwise. */
  readonly limiter: Int32Array;
  /** OFF, ON, MAYBE per channel element. */
  readonly conduction: Uint8Array;
  /** Amperes from A to B per channel element. */
  readonly chCurrent: Float64Array;
  /** Amperes leaving each source net (negative where current enters it). */
  readonly sourceOut: Float64Array;
  readonly paths: readonly PathIndices[];
  /** Amperes drawn from the supply rails. */
  readonly supplyCurrent: number;
  /** Watts delivered by all sources. */
  readonly staticPower: number;
  /** False when some feedback loop never settled (see FLAG_OSCILLATING). */
  readonly settled: boolean;
}

interface NetState {
  volts: Float64Array;
  driven: Uint8Array;
  flags: Uint8Array;
  limiter: Int32Array;
  chCurrent: Float64Array;
}

interface Prepared {
  readonly topology: Topology;
  readonly frame: Frame;
  readonly sccOf: Int32Array;
}

/** Solves input vectors on one compiled netlist; reuse it across vectors of a sweep or sequence. */
export class Simulator {
  private readonly prepared = new Map<string, Prepared>();
  private readonly supplyNets: number[];

  constructor(readonly compiled: CompiledNetlist) {
    this.supplyNets = compiled.netlist.rails
      .filter((r) => r.role === 'supply')
      .map((r) => compiled.netIndex.get(r.net) as number);
  }

  /** Solves from an unknown state: every net starts with unknown charge (sweep mode). */
  solveFresh(inputs: InputVector): SolveResult {
    const n = this.compiled.netCount;
    return this.run(inputs, new Float64Array(n).fill(NaN), new Uint8Array(n));
  }

  /** Solves starting from a previous result's stored charge (sequence mode, live toggling). */
  solveNext(inputs: InputVector, previous: SolveResult): SolveResult {
    return this.run(inputs, previous.volts.slice(), previous.driven.slice());
  }

  private prepare(inputs: InputVector): Prepared {
    const undriven = this.compiled.netlist.inputs.filter((name) => (inputs[name] ?? 'Z') === 'Z');
    const key = undriven.join('\u0000');
    let p = this.prepared.get(key);
    if (!p) {
      const topology = buildTopology(
        this.compiled,
        new Set(undriven.map((u) => this.compiled.netIndex.get(u) as number)),
      );
      const sccOf = new Int32Array(topology.cccCount);
      const order = topology.sccOrder;
      for (let s = 0; s + 1 < order.start.length; s++) {
        for (let i = order.start[s]; i < order.start[s + 1]; i++) sccOf[order.items[i]] = s;
      }
      p = { topology, frame: new Frame(this.compiled, topology), sccOf };
      this.prepared.set(key, p);
    }
    return p;
  }

  private sourceVoltages(inputs: InputVector, topology: Topology): Float64Array {
    const c = this.compiled;
    const volts = c.railVolts.slice();
    c.inputNets.forEach((n, i) => {
      if (!topology.isSource[n]) return;
      const value = inputs[c.netlist.inputs[i]];
      volts[n] = value === '1' ? c.tech.vdd : value === '0' ? 0 : NaN;
    });
    return volts;
  }

  private run(inputs: InputVector, volts: Float64Array, driven: Uint8Array): SolveResult {
    const c = this.compiled;
    const p = this.prepare(inputs);
    const { topology } = p;
    const sourceVolts = this.sourceVoltages(inputs, topology);
    for (let n = 0; n < c.netCount; n++) {
      if (!topology.isSource[n]) continue;
      volts[n] = sourceVolts[n];
      driven[n] = 1;
    }
    const state: NetState = {
      volts,
      driven,
      flags: new Uint8Array(c.netCount),
      limiter: new Int32Array(c.netCount).fill(-1),
      chCurrent: new Float64Array(c.chCount),
    };
    let settled = true;
    const order = topology.sccOrder;
    for (let s = 0; s + 1 < order.start.length; s++) {
      const members = Array.from(order.items.subarray(order.start[s], order.start[s + 1]));
      if (members.length === 1 && !this.selfDependent(topology, members[0])) {
        evaluateCcc(p.frame, members[0], volts, sourceVolts, state);
      } else if (!this.settleLoop(p, s, members, sourceVolts, state)) {
        settled = false;
      }
    }
    return this.finish(inputs, p, sourceVolts, state, settled);
  }

  private selfDependent(topology: Topology, k: number): boolean {
    const d = topology.cccDependents;
    for (let i = d.start[k]; i < d.start[k + 1]; i++) if (d.items[i] === k) return true;
    return false;
  }

  /**
   * Jacobi rounds over one feedback group: every dirty component is evaluated against the same
   * snapshot, then all results are committed at once, so the outcome never depends on the order
   * of components (a race shows up as a no-steady-state result rather than a winner picked by order).
   */
  private settleLoop(
    p: Prepared,
    s: number,
    members: number[],
    sourceVolts: Float64Array,
    state: NetState,
  ): boolean {
    const c = this.compiled;
    const { topology } = p;
    const next: NetState = {
      volts: new Float64Array(c.netCount),
      driven: new Uint8Array(c.netCount),
      flags: new Uint8Array(c.netCount),
      limiter: new Int32Array(c.netCount),
      chCurrent: state.chCurrent,
    };
    const frozen = new Set<number>();
    const limit = SETTLE_ROUNDS_BASE + SETTLE_ROUNDS_PER_COMPONENT * members.length;
    let dirty = new Set(members);
    for (let round = 1; dirty.size > 0 && round <= 2 * limit; round++) {
      for (const k of dirty) evaluateCcc(p.frame, k, state.volts, sourceVolts, next);
      const changed = commit(topology, dirty, next, state, frozen);
      if (round >= limit) for (const n of changed) freezeUnknown(state, frozen, n);
      dirty = new Set();
      for (const n of changed) {
        const k = topology.cccOfNet[n];
        const d = topology.cccDependents;
        for (let i = d.start[k]; i < d.start[k + 1]; i++)
          if (p.sccOf[d.items[i]] === s) dirty.add(d.items[i]);
      }
    }
    if (dirty.size > 0) {
      for (const k of members) forEachNet(topology, k, (n) => freezeUnknown(state, frozen, n));
    }
    return frozen.size === 0;
  }

  private finish(
    inputs: InputVector,
    p: Prepared,
    sourceVolts: Float64Array,
    state: NetState,
    settled: boolean,
  ): SolveResult {
    const c = this.compiled;
    const { topology, frame } = p;
    const { volts, driven, chCurrent } = state;
    for (const e of topology.bridges) {
      const on = conductionOf(frame, e, volts) === ON;
      const dv = sourceVolts[c.chA[e]] - sourceVolts[c.chB[e]];
      chCurrent[e] = on && Number.isFinite(dv) ? dv / c.chOhms[e] : 0;
    }
    const conduction = Uint8Array.from({ length: c.chCount }, (_, e) => conductionOf(frame, e, volts));
    const levels = new Uint8Array(c.netCount);
    for (let n = 0; n < c.netCount; n++) {
      levels[n] = driven[n] || topology.isSource[n] ? classify(volts[n], c.tech.vil, c.tech.vih) : LEVEL_Z;
    }
    const sourceOut = new Float64Array(c.netCount);
    for (let e = 0; e < c.chCount; e++) {
      if (topology.isSource[c.chA[e]]) sourceOut[c.chA[e]] += chCurrent[e];
      if (topology.isSource[c.chB[e]]) sourceOut[c.chB[e]] -= chCurrent[e];
    }
    let staticPower = 0;
    for (let n = 0; n < c.netCount; n++) {
      if (topology.isSource[n] && Number.isFinite(volts[n])) staticPower += volts[n] * sourceOut[n];
    }
    const supplyCurrent = this.supplyNets.reduce((sum, n) => sum + sourceOut[n], 0);
    return {
      compiled: c,
      topology,
      inputs,
      volts,
      driven,
      levels,
      flags: state.flags,
      limiter: state.limiter,
      conduction,
      chCurrent,
      sourceOut,
      paths: currentPaths(c, topology.isSource, volts, chCurrent, sourceOut),
      supplyCurrent,
      staticPower,
      settled,
    };
  }
}

function forEachNet(topology: Topology, k: number, visit: (n: number) => void): void {
  for (let i = topology.cccNets.start[k]; i < topology.cccNets.start[k + 1]; i++)
    visit(topology.cccNets.items[i]);
}

function sameVolts(a: number, b: number): boolean {
  return Number.isNaN(a) ? Number.isNaN(b) : Math.abs(a - b) <= 1e-7;
}

/** Copies the evaluated components' nets into the live state; returns the nets whose value changed. */
function commit(
  topology: Topology,
  evaluated: Set<number>,
  next: NetState,
  state: NetState,
  frozen: Set<number>,
): number[] {
  const changed: number[] = [];
  for (const k of evaluated) {
    forEachNet(topology, k, (n) => {
      if (frozen.has(n)) return;
      if (!sameVolts(state.volts[n], next.volts[n]) || state.driven[n] !== next.driven[n]) changed.push(n);
      state.volts[n] = next.volts[n];
      state.driven[n] = next.driven[n];
      state.flags[n] = next.flags[n];
      state.limiter[n] = next.limiter[n];
    });
  }
  return changed;
}

function freezeUnknown(state: NetState, frozen: Set<number>, n: number): void {
  frozen.add(n);
  state.volts[n] = NaN;
  state.driven[n] = 1;
  state.flags[n] = FLAG_OSCILLATING;
  state.limiter[n] = -1;
}
