// Hot loop: indexes here are in range by construction, so `!` marks them (no run-time cost).
import { NMOS, PMOS } from '../compile/compile.ts';
import type { Frame } from './frame.ts';
import { clampPass, GATE_NOT_TIED, GATE_TIED_A } from './selfGated.ts';

/**
 * Threshold drop (docs/semantics.md §2.4) as a bottleneck path search. A high level passed by an NMOS is capped at
 * Vg − Vtn; a low level passed by a PMOS is floored at Vg + |Vtp|; PMOS (for highs), NMOS (for lows) and
 * resistors pass levels whole. Each net gets the best level over all conducting paths from the chosen
 * sources (the widest path: the weakest device on the best path sets it), written to frame.best, and
 * the element that set the drop to frame.limiter.
 *
 * `high` chooses the direction: maximise from sources at or above VDD/2, else minimise from the rest.
 * Returns false when no chosen source reaches the component.
 */
export function bottleneck(frame: Frame, root: number, snapVolts: Float64Array, high: boolean): boolean {
  const { best, limiter } = frame;
  for (let i = frame.head[root]!; i >= 0; i = frame.next[i]!) {
    best[i] = high ? -Infinity : Infinity;
    limiter[i] = -1;
  }
  const reached = propagate(frame, root, snapVolts, high, false);
  if (reached && anyDropped(frame, root, high)) {
    for (let i = frame.head[root]!; i >= 0; i = frame.next[i]!) frame.labelRank[i] = UNREACHED;
    propagate(frame, root, snapVolts, high, true);
  }
  return reached;
}

/** Whether some net's best level falls short of the best source level: only then are there limiters. */
function anyDropped(frame: Frame, root: number, high: boolean): boolean {
  const mid = frame.c.tech.vdd / 2;
  let seed = high ? -Infinity : Infinity;
  for (let j = frame.srcHead[root]!; j >= 0; j = frame.srcNext[j]!) {
    const vs = frame.sourceEndVolts[j]!;
    if (high === vs >= mid) seed = high ? Math.max(seed, vs) : Math.min(seed, vs);
  }
  for (let i = frame.head[root]!; i >= 0; i = frame.next[i]!) {
    if (!(Math.abs(frame.best[i]! - seed) <= 1e-12)) return true;
  }
  return false;
}

/** Label of a net reached along a best path with no drop at all: it has no limiter, whatever else. */
const NO_LIMITER = -1;
/** Label of a net no best path has reached yet. */
const UNREACHED = 0x7fffffff;

/** Takes level v at local net i when it beats the best so far. */
function offerLevel(frame: Frame, i: number, v: number, high: boolean): boolean {
  if (high ? v > frame.best[i]! + 1e-12 : v < frame.best[i]! - 1e-12) {
    frame.best[i] = v;
    return true;
  }
  return false;
}

/**
 * The limiter of each net, once the best levels are known: among the paths that achieve a net's best
 * level, the device that made the last drop, choosing the smallest device name when paths disagree
 * (and none when some best path has no drop). A minimum over paths, found by relaxing only along
 * edges that achieve the best level, so it never depends on the order devices are listed or visited
 * in. Level v arrives at local net i through element e from local net `from` (−1 for a source), where
 * the level was vIn.
 */
function offerLimiter(frame: Frame, i: number, v: number, vIn: number, e: number, from: number): boolean {
  const { labelRank, limiter } = frame;
  if (!(Math.abs(v - frame.best[i]!) <= 1e-12)) return false;
  const drops = Math.abs(v - vIn) > 1e-12;
  const candidate = drops ? frame.nameRanks()[e]! : from < 0 ? NO_LIMITER : labelRank[from]!;
  if (candidate >= labelRank[i]!) return false;
  labelRank[i] = candidate;
  limiter[i] = drops ? e : from < 0 ? -1 : limiter[from]!;
  return true;
}

/**
 * Offers levels from the chosen sources, then from every net whose offer was taken to its conducting
 * neighbours, until no offer is taken: levels (offerLevel) or, with `limiters`, limiters along the
 * best levels found (offerLimiter).
 */
function propagate(
  frame: Frame,
  root: number,
  snapVolts: Float64Array,
  high: boolean,
  limiters: boolean,
): boolean {
  const { c, topo, best, queue, inQueue } = frame;
  const mid = c.tech.vdd / 2;
  let qHead = 0;
  let qTail = 0;
  const size = queue.length;
  let reached = false;
  for (let j = frame.srcHead[root]!; j >= 0; j = frame.srcNext[j]!) {
    const vs = frame.sourceEndVolts[j]!;
    if (high !== vs >= mid) continue;
    reached = true;
    const e = frame.element(j);
    const local = topo.elemLocalA[e]! >= 0 ? topo.elemLocalA[e]! : topo.elemLocalB[e]!;
    const v = passed(frame, e, vs, snapVolts, high, local);
    const taken = limiters ? offerLimiter(frame, local, v, vs, e, -1) : offerLevel(frame, local, v, high);
    if (taken && !inQueue[local]) {
      inQueue[local] = 1;
      queue[qTail] = local;
      qTail = (qTail + 1) % size;
    }
  }
  while (qHead !== qTail) {
    const i = queue[qHead]!;
    qHead = (qHead + 1) % size;
    inQueue[i] = 0;
    const n = frame.net(i);
    for (let p = c.netChannels.start[n]!; p < c.netChannels.start[n + 1]!; p++) {
      const e = c.netChannels.items[p]!;
      if (!frame.on[topo.elemLocal[e]!]) continue;
      const a = topo.elemLocalA[e]!;
      const b = topo.elemLocalB[e]!;
      if (a < 0 || b < 0) continue;
      const other = a === i ? b : a;
      const v = passed(frame, e, best[i]!, snapVolts, high, other);
      const taken = limiters
        ? offerLimiter(frame, other, v, best[i]!, e, i)
        : offerLevel(frame, other, v, high);
      if (taken && !inQueue[other]) {
        inQueue[other] = 1;
        queue[qTail] = other;
        qTail = (qTail + 1) % size;
      }
    }
  }
  return reached;
}

/**
 * Level after passing `v` through element e into local net `into` (see above). Unknown gate voltages
 * pass the best case; a self-gated element follows its clamp rule (selfGated.ts).
 */
function passed(
  frame: Frame,
  e: number,
  v: number,
  snapVolts: Float64Array,
  high: boolean,
  into: number,
): number {
  const { c, topo } = frame;
  const kind = c.chKind[e]!;
  const tied = topo.selfGate[e];
  if (tied !== GATE_NOT_TIED) {
    const gateEnd = tied === GATE_TIED_A ? topo.elemLocalA[e] : topo.elemLocalB[e];
    return clampPass(kind, v, high, into === gateEnd, c.tech);
  }
  if (high && kind === NMOS) {
    const vg = snapVolts[c.chGate[e]!]!;
    return Math.min(v, (Number.isNaN(vg) ? c.tech.vdd : vg) - c.tech.vtn);
  }
  if (!high && kind === PMOS) {
    const vg = snapVolts[c.chGate[e]!]!;
    return Math.max(v, (Number.isNaN(vg) ? 0 : vg) + c.tech.vtp);
  }
  return v;
}
