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
  const { c, topo, best, limiter, queue, inQueue } = frame;
  const mid = c.tech.vdd / 2;
  for (let i = frame.head[root]; i >= 0; i = frame.next[i]) {
    best[i] = high ? -Infinity : Infinity;
    limiter[i] = -1;
  }
  let qHead = 0;
  let qTail = 0;
  const size = queue.length;
  let reached = false;
  for (let j = frame.srcHead[root]; j >= 0; j = frame.srcNext[j]) {
    const vs = frame.sourceEndVolts[j];
    if (high !== vs >= mid) continue;
    const e = frame.element(j);
    const local = topo.elemLocalA[e] >= 0 ? topo.elemLocalA[e] : topo.elemLocalB[e];
    if (offer(frame, local, passed(frame, e, vs, snapVolts, high, local), vs, e, high)) {
      if (!inQueue[local]) {
        inQueue[local] = 1;
        queue[qTail] = local;
        qTail = (qTail + 1) % size;
      }
    }
    reached = true;
  }
  while (qHead !== qTail) {
    const i = queue[qHead];
    qHead = (qHead + 1) % size;
    inQueue[i] = 0;
    const n = frame.net(i);
    for (let p = c.netChannels.start[n]; p < c.netChannels.start[n + 1]; p++) {
      const e = c.netChannels.items[p];
      const j = topo.elemLocal[e];
      if (!frame.on[j]) continue;
      const a = topo.elemLocalA[e];
      const b = topo.elemLocalB[e];
      if (a < 0 || b < 0) continue;
      const other = a === i ? b : a;
      const v = passed(frame, e, best[i], snapVolts, high, other);
      if (offer(frame, other, v, best[i], e, high, limiter[i])) {
        if (!inQueue[other]) {
          inQueue[other] = 1;
          queue[qTail] = other;
          qTail = (qTail + 1) % size;
        }
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
  const kind = c.chKind[e];
  const tied = topo.selfGate[e];
  if (tied !== GATE_NOT_TIED) {
    const gateEnd = tied === GATE_TIED_A ? topo.elemLocalA[e] : topo.elemLocalB[e];
    return clampPass(kind, v, high, into === gateEnd, c.tech);
  }
  if (high && kind === NMOS) {
    const vg = snapVolts[c.chGate[e]];
    return Math.min(v, (Number.isNaN(vg) ? c.tech.vdd : vg) - c.tech.vtn);
  }
  if (!high && kind === PMOS) {
    const vg = snapVolts[c.chGate[e]];
    return Math.max(v, (Number.isNaN(vg) ? 0 : vg) + c.tech.vtp);
  }
  return v;
}

/**
 * Records a better level for local net i; the limiter is e when e itself dropped the level. Among
 * equally good paths the limiter with the smallest device name wins, so results never depend on the
 * order devices are listed in; a changed limiter is propagated like a changed level.
 */
function offer(
  frame: Frame,
  i: number,
  v: number,
  vIn: number,
  e: number,
  high: boolean,
  inherited = -1,
): boolean {
  const limiter = Math.abs(v - vIn) > 1e-12 ? e : inherited;
  const better = high ? v > frame.best[i] + 1e-12 : v < frame.best[i] - 1e-12;
  if (better) {
    frame.best[i] = v;
    frame.limiter[i] = limiter;
    return true;
  }
  const tie = Math.abs(v - frame.best[i]) <= 1e-12;
  if (!tie || limiter < 0 || limiter === frame.limiter[i]) return false;
  if (frame.limiter[i] >= 0 && deviceName(frame, limiter) >= deviceName(frame, frame.limiter[i]))
    return false;
  frame.limiter[i] = limiter;
  return true;
}

function deviceName(frame: Frame, e: number): string {
  return frame.c.netlist.devices[frame.c.chDevice[e]].name;
}
