// Hot loop: indexes here are in range by construction, so `!` marks them (no run-time cost).
import type { CompiledNetlist } from '../compile/compile.ts';
import type { Topology } from './topology.ts';

/**
 * Scratch space for solving one channel-connected component (CCC) under one on/off assignment of
 * its elements. Arrays are indexed by local net index (position in the CCC's net list) or local
 * element index, and sized for the largest CCC so nothing is allocated per vector.
 */
export class Frame {
  // Inputs of a trial.
  /** Per local element: 1 when it conducts in this trial. */
  readonly on: Uint8Array;
  /** Per local element: 1 when its gate is at X (it is also marked on). */
  readonly maybe: Uint8Array;
  /** Per local element: voltage of its source end in this trial (X inputs are enumerated). */
  readonly sourceEndVolts: Float64Array;
  // Outputs of a trial.
  readonly volts: Float64Array;
  readonly driven: Uint8Array;
  readonly flags: Uint8Array;
  /** Global element that set the threshold drop of a degraded net, -1 otherwise. */
  readonly limiter: Int32Array;
  /** Current from A to B per local element, amperes. */
  readonly current: Float64Array;
  // Work arrays.
  readonly parent: Int32Array;
  readonly best: Float64Array;
  readonly queue: Int32Array;
  readonly inQueue: Uint8Array;
  /** Linked lists of a component's nets and of the elements tying it to sources. */
  readonly head: Int32Array;
  readonly next: Int32Array;
  readonly srcHead: Int32Array;
  readonly srcNext: Int32Array;
  /** Per component root: bit 1 when a conducting NMOS is inside, bit 2 for a PMOS. */
  readonly kinds: Uint8Array;
  /** Per local net: name rank of its limiter while the limiters are found (bottleneck.ts). */
  readonly labelRank: Int32Array;
  private ranks: Int32Array | null = null;
  /** Per component: 1 once its elements are ranked. */
  private ranked = new Uint8Array(0);

  k = 0;
  netStart = 0;
  netCount = 0;
  elemStart = 0;
  elemCount = 0;

  constructor(
    readonly c: CompiledNetlist,
    readonly topo: Topology,
  ) {
    let maxNets = 1;
    let maxElems = 1;
    for (let k = 0; k < topo.cccCount; k++) {
      maxNets = Math.max(maxNets, topo.cccNets.start[k + 1]! - topo.cccNets.start[k]!);
      maxElems = Math.max(maxElems, topo.cccElements.start[k + 1]! - topo.cccElements.start[k]!);
    }
    this.on = new Uint8Array(maxElems);
    this.maybe = new Uint8Array(maxElems);
    this.sourceEndVolts = new Float64Array(maxElems);
    this.current = new Float64Array(maxElems);
    this.volts = new Float64Array(maxNets);
    this.driven = new Uint8Array(maxNets);
    this.flags = new Uint8Array(maxNets);
    this.limiter = new Int32Array(maxNets);
    this.parent = new Int32Array(maxNets);
    this.best = new Float64Array(maxNets);
    this.queue = new Int32Array(maxNets + 1);
    this.inQueue = new Uint8Array(maxNets);
    this.head = new Int32Array(maxNets);
    this.next = new Int32Array(maxNets);
    this.srcHead = new Int32Array(maxNets);
    this.srcNext = new Int32Array(maxElems);
    this.kinds = new Uint8Array(maxNets);
    this.labelRank = new Int32Array(maxNets);
  }

  /**
   * Per global element: its position among the elements of its own channel-connected component
   * sorted by device name, equal names in element order. Limiters compare ranks within the selected
   * component only (bottleneck.ts), so a component is ranked the first time it asks, and a cell
   * whose levels never drop ranks nothing.
   */
  nameRanks(): Int32Array {
    if (this.ranks === null) {
      this.ranks = new Int32Array(this.c.chCount);
      this.ranked = new Uint8Array(this.topo.cccCount);
    }
    if (this.ranked[this.k] === 0) {
      this.ranked[this.k] = 1;
      this.rankComponent(this.ranks, this.elemStart, this.elemCount);
    }
    return this.ranks;
  }

  private rankComponent(ranks: Int32Array, first: number, count: number): void {
    const { c } = this;
    const name = (e: number): string => c.netlist.devices[c.chDevice[e]!]!.name;
    const order = Array.from(this.topo.cccElements.items.subarray(first, first + count));
    order.sort((x, y) => {
      const [a, b] = [name(x), name(y)];
      return a < b ? -1 : a > b ? 1 : x - y;
    });
    order.forEach((e, r) => (ranks[e] = r));
  }

  select(k: number): void {
    this.k = k;
    this.netStart = this.topo.cccNets.start[k]!;
    this.netCount = this.topo.cccNets.start[k + 1]! - this.netStart;
    this.elemStart = this.topo.cccElements.start[k]!;
    this.elemCount = this.topo.cccElements.start[k + 1]! - this.elemStart;
  }

  /** Global net of local net i. */
  net(i: number): number {
    return this.topo.cccNets.items[this.netStart + i]!;
  }

  /** Global element of local element j. */
  element(j: number): number {
    return this.topo.cccElements.items[this.elemStart + j]!;
  }

  /** Union-find over the selected CCC: nets joined by elements marked on (maybe counts as on). */
  unionConducting(): void {
    const { topo, parent } = this;
    for (let i = 0; i < this.netCount; i++) parent[i] = i;
    for (let j = 0; j < this.elemCount; j++) {
      if (!this.on[j]) continue;
      const e = this.element(j);
      const a = topo.elemLocalA[e]!;
      const b = topo.elemLocalB[e]!;
      if (a < 0 || b < 0) continue;
      const ra = this.root(a);
      const rb = this.root(b);
      // Union towards the smaller index: the grouping never depends on element order.
      if (ra !== rb) parent[Math.max(ra, rb)] = Math.min(ra, rb);
    }
  }

  root(i: number): number {
    const p = this.parent;
    while (p[i] !== i) {
      p[i] = p[p[i]!]!;
      i = p[i]!;
    }
    return i;
  }
}
