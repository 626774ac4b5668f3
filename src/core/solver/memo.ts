// Hot loop: indexes here are in range by construction, so `!` marks them (no run-time cost).
import type { CompiledNetlist } from '../compile/compile.ts';
import { csrFrom, type Csr } from '../compile/csr.ts';
import type { NetState } from './schedule.ts';
import type { Topology } from './topology.ts';

/** Components whose outcome depends on more full-rail nets than this are never memoised. */
const MAX_KEY_NETS = 16;
/** Outcomes kept per component; past it the component is evaluated as usual. */
const MAX_ENTRIES = 256;

/**
 * One component's outcome, packed in a single array to keep memory and allocation low: for n nets
 * and m elements, volts[0..n), driven[n..2n), flags[2n..3n), limiter[3n..4n), then m currents.
 */
interface Outcome {
  readonly data: Float64Array;
  /** Some net floated: the outcome holds for unknown stored charge (sweep mode) only. */
  readonly floats: boolean;
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
  private readonly tables: (Map<number, Outcome> | undefined)[];

  constructor(
    private readonly c: CompiledNetlist,
    private readonly topology: Topology,
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
    this.tables = new Array(topology.cccCount);
  }

  /** The key of component k's current inputs, or -1 when some input is not exactly at a rail. */
  key(k: number, volts: Float64Array): number {
    const { start, items } = this.keyNets;
    const vdd = this.c.tech.vdd;
    let key = 0;
    for (let i = start[k]!; i < start[k + 1]!; i++) {
      const n = items[i]!;
      if (n < 0) return -1;
      const v = volts[n];
      if (v === vdd) key |= 1 << (i - start[k]!);
      else if (v !== 0) return -1;
    }
    return key;
  }

  /** Replays a stored outcome into the state; false when there is none usable. */
  replay(k: number, key: number, fresh: boolean, state: NetState): boolean {
    const outcome = this.tables[k]?.get(key);
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
    const table = (this.tables[k] ??= new Map());
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
