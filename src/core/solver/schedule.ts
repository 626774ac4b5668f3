// Hot loop: indexes here are in range by construction, so `!` marks them (no run-time cost).
import type { CompiledNetlist } from '../compile/compile.ts';
import { evaluateCcc } from './evaluate.ts';
import { FeedbackSearch } from './feedback.ts';
import { Frame } from './frame.ts';
import { FLAG_OSCILLATING } from './levels.ts';
import type { OutcomeStore } from './memo.ts';
import { OutcomeMemo } from './memo.ts';
import type { NetState } from './netState.ts';
import { buildTopology, type Topology } from './topology.ts';

/**
 * Feedback bound (docs/semantics.md §2.8): a strongly connected group of n components gets 2n + 16 rounds to
 * settle. Nets still changing then become X (flagged oscillating) and the group gets as many rounds
 * again to settle around them; if it still has not, all its nets become X.
 */
export const SETTLE_ROUNDS_BASE = 16;
export const SETTLE_ROUNDS_PER_COMPONENT = 2;

/** Everything the scheduler needs for one topology, built once and reused across vectors. */
export class Schedule {
  readonly frame: Frame;
  private readonly sccOf: Int32Array;
  private readonly selfDependent: Uint8Array;
  /** CCC of each channel element, -1 for bridges. */
  private readonly elemCcc: Int32Array;
  private readonly next: NetState;
  /** Nets that are sources in this topology, and elements with at least one end on a source. */
  readonly sourceNets: Int32Array;
  readonly sourceTies: Int32Array;
  private readonly memo: OutcomeMemo;
  private readonly feedback: FeedbackSearch;
  private readonly saved: Float64Array;
  private readonly savedDriven: Uint8Array;

  /**
   * `outcomes`: memo tables shared with the other schedules of the same simulator, `undriven` when
   * this topology leaves some input undriven (solver/memo.ts, OutcomeStore).
   */
  constructor(
    readonly c: CompiledNetlist,
    readonly topology: Topology,
    outcomes: OutcomeStore | null = null,
    undriven = false,
  ) {
    this.frame = new Frame(c, topology);
    const order = topology.sccOrder;
    this.sccOf = new Int32Array(topology.cccCount);
    for (let s = 0; s + 1 < order.start.length; s++) {
      for (let i = order.start[s]!; i < order.start[s + 1]!; i++) this.sccOf[order.items[i]!] = s;
    }
    this.selfDependent = new Uint8Array(topology.cccCount);
    const d = topology.cccDependents;
    for (let k = 0; k < topology.cccCount; k++) {
      for (let i = d.start[k]!; i < d.start[k + 1]!; i++) if (d.items[i] === k) this.selfDependent[k] = 1;
    }
    this.elemCcc = new Int32Array(c.chCount);
    for (let e = 0; e < c.chCount; e++) {
      const a = topology.cccOfNet[c.chA[e]!]!;
      this.elemCcc[e] = a >= 0 ? a : topology.cccOfNet[c.chB[e]!]!;
    }
    this.next = {
      volts: new Float64Array(c.netCount),
      driven: new Uint8Array(c.netCount),
      flags: new Uint8Array(c.netCount),
      limiter: new Int32Array(c.netCount),
      chCurrent: new Float64Array(c.chCount),
    };
    const sources: number[] = [];
    for (let n = 0; n < c.netCount; n++) if (topology.isSource[n]) sources.push(n);
    this.sourceNets = Int32Array.from(sources);
    const ties: number[] = [];
    for (let e = 0; e < c.chCount; e++)
      if (topology.isSource[c.chA[e]!] || topology.isSource[c.chB[e]!]) ties.push(e);
    this.sourceTies = Int32Array.from(ties);
    this.memo = new OutcomeMemo(c, topology, outcomes, undriven);
    // The search evaluates a guess into `next` and copies it out before the Jacobi rounds use it again.
    this.feedback = new FeedbackSearch(c, topology, this.frame, this.sccOf, this.next);
    this.saved = new Float64Array(c.netCount);
    this.savedDriven = new Uint8Array(c.netCount);
  }

  static build(c: CompiledNetlist, undriven: ReadonlySet<number>, outcomes?: OutcomeStore): Schedule {
    return new Schedule(c, buildTopology(c, undriven), outcomes ?? null, undriven.size > 0);
  }

  /** Marks dirty the components whose elements a net gates or ties to (used for changed sources). */
  markTouching(dirty: Uint8Array, n: number): void {
    const { netGates, netChannels } = this.c;
    for (let p = netGates.start[n]!; p < netGates.start[n + 1]!; p++)
      this.mark(dirty, this.elemCcc[netGates.items[p]!]!);
    for (let p = netChannels.start[n]!; p < netChannels.start[n + 1]!; p++)
      this.mark(dirty, this.elemCcc[netChannels.items[p]!]!);
  }

  private mark(dirty: Uint8Array, k: number): void {
    if (k >= 0) dirty[k] = 1;
  }

  private markGated(dirty: Uint8Array, n: number): void {
    const { netGates } = this.c;
    for (let p = netGates.start[n]!; p < netGates.start[n + 1]!; p++)
      this.mark(dirty, this.elemCcc[netGates.items[p]!]!);
  }

  /**
   * Evaluates the dirty components in feedback order. A component is re-evaluated only when a gate
   * or source it depends on changed; its result is a function of those alone (and, with `fresh`
   * false, of its own stored charge, which re-evaluation leaves as it is), so skipping it gives the
   * same answer as evaluating everything. With `fresh`, a re-evaluated component first forgets its
   * stored charge (sweep mode: every vector starts from an unknown state).
   */
  propagate(sourceVolts: Float64Array, state: NetState, dirty: Uint8Array | 'all', fresh: boolean): void {
    const order = this.topology.sccOrder;
    // With everything dirty there is nothing to track: every component is evaluated in order, and
    // the caller starts fresh solves from unknown charge already.
    const tracked = dirty !== 'all';
    for (let s = 0; s + 1 < order.start.length; s++) {
      const first = order.start[s]!;
      const end = order.start[s + 1]!;
      if (tracked && !this.anyDirty(dirty, first, end)) continue;
      if (tracked) for (let i = first; i < end; i++) this.forget(order.items[i]!, state, fresh);
      this.evaluateGroup(s, sourceVolts, state, fresh);
      if (tracked) for (let i = first; i < end; i++) this.markChangedNets(order.items[i]!, state, dirty);
    }
  }

  /**
   * Evaluates strongly connected group s (a row of `topology.sccOrder`) against the voltages now in
   * `state` (its gates outside the group, the sources tied to it) and `sourceVolts`, and writes its nets
   * and elements into `state`: one component outside any loop is evaluated once, a feedback group by
   * Jacobi rounds and the steady-state search. With `fresh`, the caller has set the group's nets to
   * unknown charge (NaN, not driven) first, as a sweep does. The one evaluation of a group: the solve
   * and the component tables (`core/tables`) both call it, so they can never disagree.
   */
  evaluateGroup(s: number, sourceVolts: Float64Array, state: NetState, fresh: boolean): void {
    const order = this.topology.sccOrder;
    const first = order.start[s]!; // s is a group of this topology: its row bounds exist
    if (this.isSimpleGroup(s)) this.evaluateOne(order.items[first]!, sourceVolts, state, fresh);
    else this.settle(s, Array.from(order.items.subarray(first, order.start[s + 1])), sourceVolts, state);
  }

  /** True when group s is one component that gates none of its own elements (no feedback). */
  isSimpleGroup(s: number): boolean {
    const order = this.topology.sccOrder;
    const first = order.start[s]!;
    return order.start[s + 1]! - first === 1 && !this.selfDependent[order.items[first]!];
  }

  /**
   * After `propagate` with `dirty`: the nets that may have changed, those of every group it
   * re-evaluated, and the sources; null past half the nets, where walking every net costs less.
   * The list is valid until the next call.
   */
  touchedNets(dirty: Uint8Array): Int32Array | null {
    const order = this.topology.sccOrder;
    const { cccNets } = this.topology;
    const out = (this.touched ??= new Int32Array(this.c.netCount));
    const limit = this.c.netCount >> 1;
    let count = 0;
    for (const n of this.sourceNets) out[count++] = n;
    for (let s = 0; s + 1 < order.start.length; s++) {
      const [first, end] = [order.start[s]!, order.start[s + 1]!];
      if (!this.anyDirty(dirty, first, end)) continue;
      for (let i = first; i < end; i++) {
        const k = order.items[i]!;
        for (let q = cccNets.start[k]!; q < cccNets.start[k + 1]!; q++) out[count++] = cccNets.items[q]!;
      }
      if (count > limit) return null;
    }
    return out.subarray(0, count);
  }

  private touched: Int32Array | null = null;

  private anyDirty(dirty: Uint8Array, first: number, end: number): boolean {
    const items = this.topology.sccOrder.items;
    for (let i = first; i < end; i++) if (dirty[items[i]!]) return true;
    return false;
  }

  /** Marks dirty what component k's changed nets gate. */
  private markChangedNets(k: number, state: NetState, dirty: Uint8Array): void {
    const { cccNets } = this.topology;
    for (let q = cccNets.start[k]!; q < cccNets.start[k + 1]!; q++) {
      const n = cccNets.items[q]!;
      if (!sameVolts(this.saved[n]!, state.volts[n]!) || this.savedDriven[n] !== state.driven[n])
        this.markGated(dirty, n);
    }
  }

  /** Evaluates one component outside any feedback loop, replaying a memoised outcome when it can. */
  private evaluateOne(k: number, sourceVolts: Float64Array, state: NetState, fresh: boolean): void {
    const key = this.memo.key(k, state.volts);
    if (key >= 0 && this.memo.replay(k, key, fresh, state)) return;
    evaluateCcc(this.frame, k, state.volts, sourceVolts, state);
    if (key >= 0) this.memo.store(k, key, fresh, state);
  }

  /** Remembers a component's values (to see what changed) and, in fresh mode, clears its charge. */
  private forget(k: number, state: NetState, fresh: boolean): void {
    const { cccNets } = this.topology;
    for (let q = cccNets.start[k]!; q < cccNets.start[k + 1]!; q++) {
      const n = cccNets.items[q]!;
      this.saved[n] = state.volts[n]!;
      this.savedDriven[n] = state.driven[n]!;
      if (fresh) {
        state.volts[n] = NaN;
        state.driven[n] = 0;
      }
    }
  }

  /**
   * Jacobi rounds over one feedback group: every dirty component is evaluated against the same
   * snapshot, then all results are committed at once, so the outcome never depends on the order of
   * components (a race shows up as a no-steady-state result rather than a winner picked by order).
   * Feedback nets the rounds leave at X are then resolved by the steady-state search (feedback.ts).
   */
  private settle(s: number, members: number[], sourceVolts: Float64Array, state: NetState): void {
    this.jacobi(s, members, sourceVolts, state);
    this.feedback.resolve(s, members, sourceVolts, state, () => this.jacobi(s, members, sourceVolts, state));
  }

  private jacobi(s: number, members: number[], sourceVolts: Float64Array, state: NetState): void {
    const { topology, next } = this;
    const frozen = new Set<number>();
    const limit = SETTLE_ROUNDS_BASE + SETTLE_ROUNDS_PER_COMPONENT * members.length;
    let dirty = new Set(members);
    for (let round = 1; dirty.size > 0 && round <= 2 * limit; round++) {
      for (const k of dirty)
        evaluateCcc(this.frame, k, state.volts, sourceVolts, { ...next, chCurrent: state.chCurrent });
      const changed = commit(topology, dirty, next, state, frozen);
      if (round >= limit) for (const n of changed) freezeUnknown(state, frozen, n);
      dirty = new Set();
      for (const n of changed) {
        const k = topology.cccOfNet[n]!;
        const d = topology.cccDependents;
        for (let i = d.start[k]!; i < d.start[k + 1]!; i++)
          if (this.sccOf[d.items[i]!] === s) dirty.add(d.items[i]!);
      }
    }
    if (dirty.size > 0) {
      for (const k of members) forEachNet(topology, k, (n) => freezeUnknown(state, frozen, n));
    }
  }
}

function forEachNet(topology: Topology, k: number, visit: (n: number) => void): void {
  for (let i = topology.cccNets.start[k]!; i < topology.cccNets.start[k + 1]!; i++)
    visit(topology.cccNets.items[i]!);
}

export function sameVolts(a: number, b: number): boolean {
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
      if (!sameVolts(state.volts[n]!, next.volts[n]!) || state.driven[n] !== next.driven[n]) changed.push(n);
      state.volts[n] = next.volts[n]!;
      state.driven[n] = next.driven[n]!;
      state.flags[n] = next.flags[n]!;
      state.limiter[n] = next.limiter[n]!;
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
