// Indexes here are in range by construction (compiled-netlist and per-net arrays), so `!` marks them (no run-time cost).
import type { CompiledNetlist } from '../compile/compile.ts';
import { OFF } from '../solver/levels.ts';
import type { SolveResult } from '../solver/simulator.ts';
import type { Topology } from '../solver/topology.ts';
import { sameValues, SignatureMap } from '../tables/signature.ts';
import { isFixed } from './leakageNetwork.ts';

/** Stored states per channel-connected component; further states are solved each time they occur. */
export const MAX_LEAKAGE_STATES = 256;

/** Solves the undriven nets that the off elements touch into `volts`; returns those nets. */
export type SettleUndriven = (
  result: SolveResult,
  elements: readonly number[],
  volts: Float64Array,
) => readonly number[];

/** One solved state of a component: its key, and the voltages its undriven nets settled at. */
interface Entry {
  readonly key: Float64Array;
  readonly nets: Int32Array;
  readonly volts: Float64Array;
}

/** What the memo keeps per topology (one per choice of undriven inputs). */
interface Tables {
  readonly sources: Int32Array;
  /** Per component: the source nets at the ends of its elements. */
  readonly sourcesAround: readonly Int32Array[];
  /** Per component: its states by key. */
  readonly states: (SignatureMap<Entry> | undefined)[];
  readonly stored: Int32Array;
  /** Per component: the state it was last found in. */
  readonly last: (Entry | undefined)[];
  /** Per component: the number of the vector that last touched it. */
  readonly seen: Int32Array;
  /** Scratch key, long enough for the largest component. */
  readonly key: Float64Array;
}

/**
 * The undriven-net solve of the leakage estimate, reused across vectors. While every source is
 * driven to a known voltage, an undriven net and the conducting devices that join it never leave its
 * channel-connected component (docs/semantics.md §2), so each component's solve depends only on its
 * own state: which of its nets are driven and at what voltage, which of its elements are off, and the
 * voltages of the sources at its ends. That state is the key; a component met again in a state it
 * has had gets its stored voltages back. Each group is solved exactly as it would be with the rest
 * of the circuit (same node order, same sums), so the figures are the same to the last bit.
 */
export class ComponentLeakageMemo {
  private readonly byTopology = new WeakMap<Topology, Tables>();
  private vector = 0;

  constructor(
    private readonly compiled: CompiledNetlist,
    private readonly settleSome: SettleUndriven,
  ) {}

  /**
   * Writes the solved voltages of the undriven nets that the off elements `pending` touch into
   * `volts`; false (nothing written) when some source is X or undriven, which can join components.
   */
  settle(result: SolveResult, pending: Int32Array, volts: Float64Array): boolean {
    const tables = this.tablesOf(result.topology);
    for (const n of tables.sources) if (!isFixed(result, n)) return false;
    const { cccOfNet } = result.topology;
    const c = this.compiled;
    this.vector++;
    for (const e of pending) {
      const a = cccOfNet[c.chA[e]!]!;
      const k = a >= 0 ? a : cccOfNet[c.chB[e]!]!;
      if (tables.seen[k] === this.vector) continue;
      tables.seen[k] = this.vector;
      this.settleComponent(result, k, tables, pending, volts);
    }
    return true;
  }

  private settleComponent(
    result: SolveResult,
    k: number,
    tables: Tables,
    pending: Int32Array,
    volts: Float64Array,
  ): void {
    const key = tables.key.subarray(0, writeKey(result, k, tables.sourcesAround[k]!, tables.key));
    const last = tables.last[k];
    // A component most often keeps its state from one vector to the next: try that before hashing.
    const hit = last && sameValues(last.key, key) ? last : tables.states[k]?.get(key);
    if (hit) {
      tables.last[k] = hit;
      for (let i = 0; i < hit.nets.length; i++) volts[hit.nets[i]!] = hit.volts[i]!;
      return;
    }
    const { cccOfNet } = result.topology;
    const c = this.compiled;
    const own = Array.from(pending).filter(
      (e) => cccOfNet[c.chA[e]!] === k || (cccOfNet[c.chA[e]!]! < 0 && cccOfNet[c.chB[e]!] === k),
    );
    const free = this.settleSome(result, own, volts);
    if (tables.stored[k]! >= MAX_LEAKAGE_STATES) return;
    tables.stored[k]!++;
    const entry: Entry = {
      key: key.slice(),
      nets: Int32Array.from(free),
      volts: Float64Array.from(free, (n) => volts[n]!),
    };
    (tables.states[k] ??= new SignatureMap<Entry>()).set(key, entry);
    tables.last[k] = entry;
  }

  private tablesOf(topology: Topology): Tables {
    let tables = this.byTopology.get(topology);
    if (!tables) {
      tables = newTables(topology, this.compiled);
      this.byTopology.set(topology, tables);
    }
    return tables;
  }
}

function newTables(topology: Topology, c: CompiledNetlist): Tables {
  const { cccNets, cccElements, cccCount, isSource } = topology;
  const sourcesAround: Int32Array[] = [];
  let longest = 0;
  for (let k = 0; k < cccCount; k++) {
    const around = new Set<number>();
    for (let i = cccElements.start[k]!; i < cccElements.start[k + 1]!; i++) {
      const e = cccElements.items[i]!;
      for (const n of [c.chA[e]!, c.chB[e]!]) if (isSource[n] === 1) around.add(n);
    }
    sourcesAround.push(Int32Array.from(around));
    const nets = cccNets.start[k + 1]! - cccNets.start[k]!;
    const elements = cccElements.start[k + 1]! - cccElements.start[k]!;
    longest = Math.max(longest, nets + around.size + Math.ceil(elements / 32));
  }
  return {
    sources: Int32Array.from(isSource.keys()).filter((n) => isSource[n] === 1),
    sourcesAround,
    states: new Array<SignatureMap<Entry> | undefined>(cccCount),
    stored: new Int32Array(cccCount),
    last: new Array<Entry | undefined>(cccCount),
    seen: new Int32Array(cccCount),
    key: new Float64Array(longest),
  };
}

/**
 * Component k's state as numbers: each net's voltage where it is fixed (NaN where not), the voltage
 * of each source at its ends, then its elements' off flags, 32 to a number. Returns the length.
 */
function writeKey(result: SolveResult, k: number, sourcesAround: Int32Array, key: Float64Array): number {
  const { cccNets, cccElements } = result.topology;
  const { volts, driven, conduction } = result;
  let p = 0;
  for (let i = cccNets.start[k]!; i < cccNets.start[k + 1]!; i++) {
    const n = cccNets.items[i]!;
    key[p++] = driven[n] === 1 ? volts[n]! : Number.NaN; // NaN either way where not fixed
  }
  for (const n of sourcesAround) key[p++] = volts[n]!;
  let bits = 0;
  let count = 0;
  for (let i = cccElements.start[k]!; i < cccElements.start[k + 1]!; i++) {
    if (conduction[cccElements.items[i]!] === OFF) bits |= 1 << count;
    if (++count === 32) {
      key[p++] = bits;
      bits = 0;
      count = 0;
    }
  }
  if (count > 0) key[p++] = bits;
  return p;
}
