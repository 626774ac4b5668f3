// Hot loop: indexes here are in range by construction, so `!` marks them (no run-time cost).
import type { CompiledNetlist } from '../compile/compile.ts';
import { csrFrom, type Csr } from '../compile/csr.ts';
import type { NetState } from './netState.ts';
import type { Topology } from './topology.ts';

/** Components whose outcome depends on more full-rail nets than this are never memoised. */
const MAX_KEY_NETS = 16;
/** Outcomes kept per component; past it the component is evaluated as usual. */
const MAX_ENTRIES = 729;

/**
 * One component's outcome, packed in a single array to keep memory and allocation low: for n nets
 * and m elements, volts[0..n), driven[n..2n), flags[2n..3n), limiter[3n..4n), then m currents.
 */
interface Outcome {
  readonly data: Float64Array;
  /** Some net floated: the outcome holds for unknown stored charge (sweep mode) only. */
  readonly floats: boolean;
}

type Tables = (Map<number, Outcome> | undefined)[];

/** A table of a component that undriven inputs merged, with the nets and elements it is for. */
interface MergedTable {
  readonly topology: Topology;
  readonly k: number;
  readonly outcomes: Map<number, Outcome>;
}

function sameRow(a: Csr, ka: number, b: Csr, kb: number): boolean {
  const a0 = a.start[ka]!;
  const b0 = b.start[kb]!;
  const length = a.start[ka + 1]! - a0;
  if (b.start[kb + 1]! - b0 !== length) return false;
  for (let i = 0; i < length; i++) if (a.items[a0 + i] !== b.items[b0 + i]) return false;
  return true;
}

/** Component ka of topology a is component kb of topology b: the same nets and elements, in order. */
function sameComponent(a: Topology, ka: number, b: Topology, kb: number): boolean {
  return sameRow(a.cccNets, ka, b.cccNets, kb) && sameRow(a.cccElements, ka, b.cccElements, kb);
}

/**
 * Outcome tables shared by the schedules of one simulator. Each choice of undriven inputs has its own
 * topology, but leaving an input undriven only merges the components it touches: every other
 * component is the same nets and elements, in the same order, as in the all-driven topology, and
 * replays its outcomes. Merged components share a table with equal merged components of other
 * choices, found by their first net and matched on the whole lists. The all-driven schedule keeps
 * plain tables by component, so a simulator that never leaves an input undriven pays nothing.
 */
export class OutcomeStore {
  private driven: { readonly topology: Topology; readonly tables: Tables } | null = null;
  private readonly merged = new Map<number, MergedTable[]>();

  /** The all-driven schedule's tables, by component. */
  drivenTables(topology: Topology): Tables {
    this.driven ??= { topology, tables: new Array<Map<number, Outcome> | undefined>(topology.cccCount) };
    return this.driven.tables;
  }

  /** The table of component k of a schedule with undriven inputs. */
  tableFor(topology: Topology, k: number): Map<number, Outcome> {
    const first = topology.cccNets.items[topology.cccNets.start[k]!]!;
    const d = this.driven;
    const kd = d ? d.topology.cccOfNet[first]! : -1;
    if (d && kd >= 0 && sameComponent(d.topology, kd, topology, k)) return (d.tables[kd] ??= new Map());
    const candidates = this.merged.get(first) ?? [];
    for (const t of candidates) if (sameComponent(t.topology, t.k, topology, k)) return t.outcomes;
    const outcomes = new Map<number, Outcome>();
    candidates.push({ topology, k, outcomes });
    this.merged.set(first, candidates);
    return outcomes;
  }
}

/**
 * Memoised component outcomes. A component's evaluation reads only its elements' gate voltages, the
 * voltages of the sources tied to it, and (for floating nets) its own stored charge. When every one
 * of those gates and sources sits exactly at a rail (0 or VDD), their levels form a small key and the
 * outcome can be replayed from a table: static CMOS gates then cost a table look-up per vector.
 * An outcome with a floating net depends on stored charge and is replayed in sweep mode only, where
 * stored charge is always unknown.
 */
export class OutcomeMemo {
  private readonly keyNets: Csr;
  private readonly tables: Tables;

  constructor(
    private readonly c: CompiledNetlist,
    private readonly topology: Topology,
    /** Where tables come from: with `undriven`, shared through the store (see OutcomeStore). */
    private readonly shared: OutcomeStore | null = null,
    private readonly undriven = false,
  ) {
    // Per component, its distinct gate nets and tied source nets in first-seen order; a component
    // with too many gets the single entry -1 (never memoised).
    const rows: number[] = [];
    const items: number[] = [];
    const seenFor = new Int32Array(c.netCount).fill(-1);
    const { cccElements } = topology;
    for (let k = 0; k < topology.cccCount; k++) {
      const first = items.length;
      const add = (n: number): void => {
        if (seenFor[n] === k) return;
        seenFor[n] = k;
        rows.push(k);
        items.push(n);
      };
      for (let i = cccElements.start[k]!; i < cccElements.start[k + 1]!; i++) {
        const e = cccElements.items[i]!;
        // A self-gated element's gate is one of the component's own nets, which it solves itself.
        if (c.chGate[e]! >= 0 && topology.selfGate[e] === 0) add(c.chGate[e]!);
        if (topology.isSource[c.chA[e]!]) add(c.chA[e]!);
        if (topology.isSource[c.chB[e]!]) add(c.chB[e]!);
      }
      if (items.length - first > MAX_KEY_NETS) {
        rows.length = items.length = first;
        rows.push(k);
        items.push(-1);
      }
    }
    this.keyNets = csrFrom(topology.cccCount, rows, items);
    this.tables =
      shared && !undriven
        ? shared.drivenTables(topology)
        : new Array<Map<number, Outcome> | undefined>(topology.cccCount);
  }

  /**
   * The key of component k's current inputs: one base-3 digit per input, 0 for 0 V, 1 for VDD and 2
   * for unknown (NaN: an input driven to X, a floating or X gate). -1 when some input sits at any
   * other voltage. An unknown input is as good a key as a rail: the evaluation reads only these
   * voltages, and an unknown gate makes its device maybe-conducting whatever made it unknown
   * (docs/semantics.md §2 items 1 and 7), so sweeps with undriven or X inputs replay too.
   */
  key(k: number, volts: Float64Array): number {
    const { start, items } = this.keyNets;
    const vdd = this.c.tech.vdd;
    let key = 0;
    for (let i = start[k + 1]! - 1; i >= start[k]!; i--) {
      const n = items[i]!;
      if (n < 0) return -1;
      const v = volts[n]!;
      if (v === vdd) key = key * 3 + 1;
      else if (v === 0) key *= 3;
      else if (Number.isNaN(v)) key = key * 3 + 2;
      else return -1;
    }
    return key;
  }

  private tableOf(k: number): Map<number, Outcome> {
    return (this.tables[k] ??=
      this.shared && this.undriven ? this.shared.tableFor(this.topology, k) : new Map());
  }

  /** Replays a stored outcome into the state; false when there is none usable. */
  replay(k: number, key: number, fresh: boolean, state: NetState): boolean {
    const outcome = this.tableOf(k).get(key);
    if (!outcome || (outcome.floats && !fresh)) return false;
    const { cccNets, cccElements } = this.topology;
    const n0 = cccNets.start[k]!;
    const count = cccNets.start[k + 1]! - n0;
    const { data } = outcome;
    for (let i = 0; i < count; i++) {
      const n = cccNets.items[n0 + i]!;
      state.volts[n] = data[i]!;
      state.driven[n] = data[count + i]!;
      state.flags[n] = data[2 * count + i]!;
      state.limiter[n] = data[3 * count + i]!;
    }
    const e0 = cccElements.start[k]!;
    const elements = cccElements.start[k + 1]! - e0;
    for (let j = 0; j < elements; j++) state.chCurrent[cccElements.items[e0 + j]!] = data[4 * count + j]!;
    return true;
  }

  /** Stores the outcome just evaluated for component k. */
  store(k: number, key: number, fresh: boolean, state: NetState): void {
    const table = this.tableOf(k);
    if (table.size >= MAX_ENTRIES) return;
    const { cccNets, cccElements } = this.topology;
    const n0 = cccNets.start[k]!;
    const count = cccNets.start[k + 1]! - n0;
    const e0 = cccElements.start[k]!;
    const elements = cccElements.start[k + 1]! - e0;
    let floats = false;
    const data = new Float64Array(4 * count + elements);
    for (let i = 0; i < count; i++) {
      const n = cccNets.items[n0 + i]!;
      data[i] = state.volts[n]!;
      data[count + i] = state.driven[n]!;
      data[2 * count + i] = state.flags[n]!;
      data[3 * count + i] = state.limiter[n]!;
      if (state.driven[n] === 0) floats = true;
    }
    if (floats && !fresh) return;
    for (let j = 0; j < elements; j++) data[4 * count + j] = state.chCurrent[cccElements.items[e0 + j]!]!;
    table.set(key, { data, floats });
  }
}
