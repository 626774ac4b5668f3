// Indexes here are in range by construction (compiled-netlist and per-net arrays), so `!` marks them (no run-time cost).
import { LuDecomposition, Matrix } from 'ml-matrix';
import type { CompiledNetlist } from '../compile/compile.ts';
import { OFF } from '../solver/levels.ts';
import type { SolveResult } from '../solver/simulator.ts';

/** A conductance between two nets, siemens. */
export interface Stamp {
  readonly a: number;
  readonly b: number;
  readonly g: number;
}

/** True where a net holds its solved voltage in the leakage network: driven, and not X. */
export function isFixed(result: SolveResult, net: number): boolean {
  return result.driven[net] === 1 && !Number.isNaN(result.volts[net]);
}

/**
 * Solves the undriven nets that the off transistors `stamps` touch, writing their voltages into
 * `volts` (a copy of the solved voltages) and returning them. The undriven nets are those at the ends
 * of the stamps and every undriven net joined to them by a conducting device: a floating stack joint
 * two conducting devices away still carries the leakage current through. `localOf` is −1 for every
 * net on entry and on return.
 */
export function settleUndriven(
  c: CompiledNetlist,
  result: SolveResult,
  stamps: readonly Stamp[],
  volts: Float64Array,
  localOf: Int32Array,
): readonly number[] {
  const free: number[] = [];
  const mark = (n: number): void => {
    if (localOf[n]! < 0 && !isFixed(result, n)) localOf[n] = free.push(n) - 1;
  };
  for (const s of stamps) {
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
      if (result.conduction[e] === OFF || isFixed(result, other)) continue;
      mark(other);
      joins.push([n, other]);
    }
  }
  solveFreeNets(stamps, joins, volts, free, localOf);
  for (const n of free) localOf[n] = -1;
  return free;
}

/**
 * Sets the voltage of every free net from Kirchhoff's current law over the leakage conductances,
 * the other nets' voltages held fixed. `localOf[net]` numbers the free nets 0..free.length−1 (−1 for
 * fixed nets); `joins` pairs free nets joined by a conducting device, which share one voltage.
 *
 * Joined nets are merged into one node before anything is solved: a conducting device is some
 * 10^6 times stronger than a leaking one, and kept as a conductance it would make the matrix
 * nearly singular. What is left is a network of leakage conductances of like size. Each connected
 * group of nodes is solved on its own: a lone node as the conductance-weighted mean of its
 * neighbours, a pair (the joints of a stack of three off transistors) in closed form, a larger
 * group by ml-matrix's LU. A group with no conductance to a fixed net carries no current; its nets
 * are set to 0 V. Every other group's matrix is a weighted Laplacian plus positive ties to fixed
 * nets, so it is symmetric positive definite and the LU never meets a zero pivot.
 */
export function solveFreeNets(
  stamps: readonly Stamp[],
  joins: readonly (readonly [number, number])[],
  volts: Float64Array,
  free: readonly number[],
  localOf: Int32Array,
): void {
  const node = mergeJoined(
    free.length,
    joins.map(([a, b]) => [localOf[a]!, localOf[b]!] as const),
  );
  const nodeCount = node.reduce((m, v) => Math.max(m, v + 1), 0);
  const touching: Stamp[][] = Array.from({ length: nodeCount }, () => []);
  const group = new DisjointSets(nodeCount);
  const tied = new Uint8Array(nodeCount);
  for (const s of stamps) {
    const na = localOf[s.a]! >= 0 ? node[localOf[s.a]!]! : -1;
    const nb = localOf[s.b]! >= 0 ? node[localOf[s.b]!]! : -1;
    if (na === nb) continue; // both ends on one node (or both fixed): no current through the network
    if (na >= 0) touching[na]!.push(s);
    if (nb >= 0) touching[nb]!.push(s);
    if (na >= 0 && nb >= 0) group.union(na, nb);
    else tied[na >= 0 ? na : nb] = 1;
  }
  const members: number[][] = Array.from({ length: nodeCount }, () => []);
  for (let k = 0; k < nodeCount; k++) members[group.find(k)]!.push(k);
  const nodeVolts = new Float64Array(nodeCount);
  const view: NodeView = { touching, node, localOf, volts, nodeVolts };
  for (const nodes of members) {
    if (nodes.length === 0 || !nodes.some((k) => tied[k] === 1)) continue; // floats: stays at 0 V
    if (nodes.length === 1) solveLone(nodes[0]!, view);
    else if (nodes.length === 2) solvePair(nodes[0]!, nodes[1]!, view);
    else solveGroup(nodes, view);
  }
  free.forEach((net, local) => (volts[net] = nodeVolts[node[local]!]!));
}

/** What the group solvers read: stamps per node, and how nets map onto nodes. */
interface NodeView {
  readonly touching: readonly (readonly Stamp[])[];
  /** Node of each free net's local number. */
  readonly node: Int32Array;
  readonly localOf: Int32Array;
  /** Voltages of the fixed nets. */
  readonly volts: Float64Array;
  /** Voltages being found, one per node. */
  readonly nodeVolts: Float64Array;
}

/** The node at the far end of a stamp from `k`: a node number, or −1 with the fixed net's voltage. */
function farEnd(s: Stamp, k: number, view: NodeView): { node: number; volts: number } {
  const la = view.localOf[s.a]!;
  const nodeA = la >= 0 ? view.node[la] : -1;
  const other = nodeA === k ? s.b : s.a;
  const lo = view.localOf[other]!;
  return lo >= 0 ? { node: view.node[lo]!, volts: 0 } : { node: -1, volts: view.volts[other]! };
}

function solveLone(k: number, view: NodeView): void {
  let weighted = 0;
  let total = 0;
  for (const s of view.touching[k]!) {
    weighted += s.g * farEnd(s, k, view).volts;
    total += s.g;
  }
  view.nodeVolts[k] = weighted / total;
}

/** Two coupled nodes: [gx+gxy, −gxy; −gxy, gy+gxy]·v = b solved by Cramer's rule. */
function solvePair(x: number, y: number, view: NodeView): void {
  let gx = 0;
  let gy = 0;
  let gxy = 0;
  let bx = 0;
  let by = 0;
  for (const s of view.touching[x]!) {
    const far = farEnd(s, x, view);
    if (far.node === y) gxy += s.g;
    else {
      gx += s.g;
      bx += s.g * far.volts;
    }
  }
  for (const s of view.touching[y]!) {
    const far = farEnd(s, y, view);
    if (far.node === x) continue; // counted from x's side
    gy += s.g;
    by += s.g * far.volts;
  }
  const det = (gx + gxy) * (gy + gxy) - gxy * gxy;
  view.nodeVolts[x] = (bx * (gy + gxy) + gxy * by) / det;
  view.nodeVolts[y] = (by * (gx + gxy) + gxy * bx) / det;
}

function solveGroup(nodes: readonly number[], view: NodeView): void {
  const position = new Map(nodes.map((k, p) => [k, p]));
  const g = Matrix.zeros(nodes.length, nodes.length);
  const b = Matrix.zeros(nodes.length, 1);
  nodes.forEach((k, p) => {
    for (const s of view.touching[k]!) {
      const far = farEnd(s, k, view);
      g.set(p, p, g.get(p, p) + s.g);
      if (far.node < 0) b.set(p, 0, b.get(p, 0) + s.g * far.volts);
      else g.set(p, position.get(far.node) as number, g.get(p, position.get(far.node) as number) - s.g);
    }
  });
  const x = new LuDecomposition(g).solve(b);
  nodes.forEach((k, p) => (view.nodeVolts[k] = x.get(p, 0)));
}

/** Numbers the classes of `count` items joined by `pairs`: 0, 1, … in order of first item. */
function mergeJoined(count: number, pairs: readonly (readonly [number, number])[]): Int32Array {
  const sets = new DisjointSets(count);
  for (const [a, b] of pairs) sets.union(a, b);
  const node = new Int32Array(count).fill(-1);
  const numberOf = new Int32Array(count).fill(-1);
  let next = 0;
  for (let i = 0; i < count; i++) {
    const r = sets.find(i);
    if (numberOf[r]! < 0) numberOf[r] = next++;
    node[i] = numberOf[r]!;
  }
  return node;
}

class DisjointSets {
  private readonly parent: Int32Array;
  constructor(count: number) {
    this.parent = Int32Array.from({ length: count }, (_, i) => i);
  }
  find(i: number): number {
    const p = this.parent;
    while (p[i] !== i) i = p[i] = p[p[i]!]!;
    return i;
  }
  union(a: number, b: number): void {
    this.parent[this.find(a)] = this.find(b);
  }
}
