// Hot loop: indexes here are in range by construction, so `!` marks them (no run-time cost).
import type { CompiledNetlist } from '../compile/compile.ts';
import { csrFrom, type Csr } from '../compile/csr.ts';
import { GATE_NOT_TIED, selfGateEnds } from './selfGated.ts';

/**
 * The static structure the scheduler walks, for one choice of which nets are sources (rails and
 * driven inputs). Nets joined by any channel element, split at sources, form channel-connected
 * components (CCCs); every dynamic group the solver ever forms lies inside one CCC. Elements whose two
 * ends are both sources belong to no CCC and are kept as bridges.
 */
export interface Topology {
  readonly isSource: Uint8Array;
  /** CCC of each net, -1 for sources. */
  readonly cccOfNet: Int32Array;
  /** Position of each net inside its CCC's net list. */
  readonly localIndex: Int32Array;
  readonly cccCount: number;
  readonly cccNets: Csr;
  /** Channel elements with at least one end in the CCC. */
  readonly cccElements: Csr;
  /** Per element: local index of its A and B ends inside its CCC, -1 where that end is a source. */
  readonly elemLocalA: Int32Array;
  readonly elemLocalB: Int32Array;
  /** Per element: its position in its CCC's element list, -1 for bridges. */
  readonly elemLocal: Int32Array;
  /** Elements joining two sources directly. */
  readonly bridges: Int32Array;
  /** Per element: which channel end its gate is tied to (GATE_TIED_A/B), when not a source. */
  readonly selfGate: Uint8Array;
  /** Per CCC: local indices of its self-gated elements (usually none). */
  readonly cccSelfGated: Csr;
  /** Every self-gated element inside a CCC, by global index. */
  readonly selfGatedElements: Int32Array;
  /** Strongly connected groups of CCCs (feedback), in evaluation order: a group only gates later ones. */
  readonly sccOrder: Csr;
  /** CCCs whose elements are gated by a net of this CCC (may include itself). */
  readonly cccDependents: Csr;
}

function find(parent: Int32Array, x: number): number {
  while (parent[x] !== x) {
    parent[x] = parent[parent[x]!]!;
    x = parent[x]!;
  }
  return x;
}

function channelComponents(c: CompiledNetlist, isSource: Uint8Array): Int32Array {
  const parent = new Int32Array(c.netCount);
  for (let i = 0; i < parent.length; i++) parent[i] = i;
  for (let e = 0; e < c.chCount; e++) {
    const a = c.chA[e]!;
    const b = c.chB[e]!;
    if (isSource[a] || isSource[b]) continue;
    const ra = find(parent, a);
    const rb = find(parent, b);
    // Union towards the smaller index so the numbering never depends on element order.
    if (ra !== rb) parent[Math.max(ra, rb)] = Math.min(ra, rb);
  }
  return parent;
}

export function buildTopology(c: CompiledNetlist, undriven: ReadonlySet<number> = new Set()): Topology {
  const isSource = new Uint8Array(c.netCount);
  for (let n = 0; n < c.netCount; n++) if (!Number.isNaN(c.railVolts[n])) isSource[n] = 1;
  for (const n of c.inputNets) if (!undriven.has(n)) isSource[n] = 1;

  const parent = channelComponents(c, isSource);
  const cccOfNet = new Int32Array(c.netCount).fill(-1);
  const localIndex = new Int32Array(c.netCount).fill(-1);
  const rootToCcc = new Map<number, number>();
  const netRows: number[] = [];
  const netItems: number[] = [];
  for (let n = 0; n < c.netCount; n++) {
    if (isSource[n]) continue;
    const root = find(parent, n);
    let id = rootToCcc.get(root);
    if (id === undefined) {
      id = rootToCcc.size;
      rootToCcc.set(root, id);
    }
    cccOfNet[n] = id;
    netRows.push(id);
    netItems.push(n);
  }
  const cccCount = rootToCcc.size;
  const cccNets = csrFrom(cccCount, netRows, netItems);
  for (let k = 0; k < cccCount; k++) {
    for (let i = cccNets.start[k]!; i < cccNets.start[k + 1]!; i++)
      localIndex[cccNets.items[i]!] = i - cccNets.start[k]!;
  }

  const elementRows: number[] = [];
  const elementItems: number[] = [];
  const bridges: number[] = [];
  for (let e = 0; e < c.chCount; e++) {
    const k = cccOfNet[c.chA[e]!]! >= 0 ? cccOfNet[c.chA[e]!]! : cccOfNet[c.chB[e]!]!;
    if (k >= 0) {
      elementRows.push(k);
      elementItems.push(e);
    } else bridges.push(e);
  }
  const cccElements = csrFrom(cccCount, elementRows, elementItems);
  const elemLocalA = new Int32Array(c.chCount);
  const elemLocalB = new Int32Array(c.chCount);
  for (let e = 0; e < c.chCount; e++) {
    elemLocalA[e] = localIndex[c.chA[e]!]!;
    elemLocalB[e] = localIndex[c.chB[e]!]!;
  }
  const elemLocal = new Int32Array(c.chCount).fill(-1);
  for (let k = 0; k < cccCount; k++) {
    for (let i = cccElements.start[k]!; i < cccElements.start[k + 1]!; i++) {
      elemLocal[cccElements.items[i]!] = i - cccElements.start[k]!;
    }
  }

  const selfGate = selfGateEnds(c, isSource);
  const selfRows: number[] = [];
  const selfItems: number[] = [];
  const selfElements: number[] = [];
  for (let e = 0; e < c.chCount; e++) {
    if (selfGate[e] === GATE_NOT_TIED || elemLocal[e]! < 0) continue;
    selfRows.push(cccOfNet[c.chA[e]!]! >= 0 ? cccOfNet[c.chA[e]!]! : cccOfNet[c.chB[e]!]!);
    selfItems.push(elemLocal[e]!);
    selfElements.push(e);
  }
  const dependents = cccDependencies(c, cccOfNet, cccElements, cccCount, selfGate);
  return {
    isSource,
    cccOfNet,
    localIndex,
    cccCount,
    cccNets,
    cccElements,
    elemLocalA,
    elemLocalB,
    elemLocal,
    bridges: Int32Array.from(bridges),
    selfGate,
    cccSelfGated: csrFrom(cccCount, selfRows, selfItems),
    selfGatedElements: Int32Array.from(selfElements),
    sccOrder: stronglyConnectedOrder(cccCount, dependents),
    cccDependents: dependents,
  };
}

/**
 * Which CCCs gate which. A self-gated element is left out: its conduction follows from its own
 * channel nets within the evaluation (see selfGated.ts), not from the previous round.
 */
function cccDependencies(
  c: CompiledNetlist,
  cccOfNet: Int32Array,
  elements: Csr,
  count: number,
  selfGate: Uint8Array,
): Csr {
  const rows: number[] = [];
  const items: number[] = [];
  // lastFor[j] === k when "j gates k" is already listed; k rises, so each row's items come sorted.
  const lastFor = new Int32Array(count).fill(-1);
  for (let k = 0; k < count; k++) {
    for (let i = elements.start[k]!; i < elements.start[k + 1]!; i++) {
      const e = elements.items[i]!;
      const g = selfGate[e] === GATE_NOT_TIED ? c.chGate[e]! : -1;
      const j = g < 0 ? -1 : cccOfNet[g]!;
      if (j < 0 || lastFor[j] === k) continue;
      lastFor[j] = k;
      rows.push(j);
      items.push(k);
    }
  }
  return csrFrom(count, rows, items);
}

/**
 * Tarjan's algorithm (iterative), returning the strongly connected groups in topological order of
 * the dependency graph: a group's members are gated only by earlier groups or by itself.
 */
export function stronglyConnectedOrder(count: number, edges: Csr): Csr {
  const index = new Int32Array(count).fill(-1);
  const low = new Int32Array(count);
  const onStack = new Uint8Array(count);
  const stack: number[] = [];
  const groups: number[][] = [];
  let next = 0;
  for (let root = 0; root < count; root++) {
    if (index[root]! >= 0) continue;
    const work: [number, number][] = [[root, edges.start[root]!]];
    index[root] = low[root] = next++;
    stack.push(root);
    onStack[root] = 1;
    while (work.length > 0) {
      const top = work[work.length - 1]!;
      const v = top[0];
      if (top[1] < edges.start[v + 1]!) {
        const w = edges.items[top[1]++]!;
        if (index[w]! < 0) {
          index[w] = low[w] = next++;
          stack.push(w);
          onStack[w] = 1;
          work.push([w, edges.start[w]!]);
        } else if (onStack[w]) low[v] = Math.min(low[v]!, index[w]!);
        continue;
      }
      work.pop();
      if (work.length > 0)
        low[work[work.length - 1]![0]] = Math.min(low[work[work.length - 1]![0]]!, low[v]!);
      if (low[v] === index[v]) {
        const group: number[] = [];
        let w: number;
        do {
          w = stack.pop() as number;
          onStack[w] = 0;
          group.push(w);
        } while (w !== v);
        groups.push(group.sort((a, b) => a - b));
      }
    }
  }
  // Tarjan emits groups in reverse topological order.
  groups.reverse();
  const rows: number[] = [];
  const items: number[] = [];
  groups.forEach((g, i) => g.forEach((k) => (rows.push(i), items.push(k))));
  return csrFrom(groups.length, rows, items);
}
