// Hot loop: indexes here are in range by construction, so `!` marks them (no run-time cost).
import { NMOS, PMOS } from '../compile/compile.ts';
import { bottleneck } from './bottleneck.ts';
import type { Frame } from './frame.ts';
import {
  classify,
  FLAG_CHARGE_SHARED,
  FLAG_CONTENTION,
  FLAG_DEGRADED,
  FLAG_ILL_CONDITIONED,
  LEVEL_X,
} from './levels.ts';
import { solveNodal } from './nodal.ts';
import { conductsForward, GATE_TIED_A } from './selfGated.ts';

const HAS_NMOS = 1;
const HAS_PMOS = 2;
/** A self-gated element is inside: levels need the path search in both directions. */
const HAS_SELF = 4;

/** Smallest capacitance a net is given for charge sharing, so capacitance-free nets still average. */
const MIN_NET_CAP = 1e-18;
/** A floating net whose voltage moves by more than this fraction of VDD has visibly shared charge. */
const CHARGE_SHARE_FRACTION = 0.1;

/**
 * Solves the selected CCC under one fixed on/off assignment (frame.on, frame.sourceEndVolts):
 * splits it into groups joined by conducting elements, then per group applies the rule of docs/semantics.md §2:
 * no source → stored charge (shared by capacitance); one source voltage → that voltage less any
 * threshold drop; sources of several voltages → nodal analysis. Reads stored charge and gate voltages
 * from `snapVolts` (global, the previous round) and writes the frame's output arrays.
 */
export function solveTrial(frame: Frame, snapVolts: Float64Array): void {
  const { start, items } = frame.topo.cccSelfGated;
  const first = start[frame.k]!;
  const end = start[frame.k + 1]!;
  for (let p = first; p < end; p++) frame.on[items[p]!] = 1;
  solveGroups(frame, snapVolts);
  // Self-gated elements left without forward voltage are switched off and the trial solved again;
  // every pass switches at least one off, so this ends.
  while (first < end && switchOffReverse(frame, first, end)) solveGroups(frame, snapVolts);
}

/** Switches off the self-gated elements of the trial that are not forward-biased; true if any. */
function switchOffReverse(frame: Frame, first: number, end: number): boolean {
  const { topo, c } = frame;
  let changed = false;
  for (let p = first; p < end; p++) {
    const j = topo.cccSelfGated.items[p]!;
    if (!frame.on[j]) continue;
    const e = frame.element(j);
    const tiedA = topo.selfGate[e] === GATE_TIED_A;
    const other = tiedA ? topo.elemLocalB[e]! : topo.elemLocalA[e]!;
    const vGate = frame.volts[tiedA ? topo.elemLocalA[e]! : topo.elemLocalB[e]!]!;
    const vOther = other >= 0 ? frame.volts[other]! : frame.sourceEndVolts[j]!;
    if (conductsForward(c.chKind[e]!, vGate, vOther)) continue;
    frame.on[j] = 0;
    changed = true;
  }
  return changed;
}

function solveGroups(frame: Frame, snapVolts: Float64Array): void {
  groupNets(frame);
  frame.current.fill(0, 0, frame.elemCount);
  for (let i = 0; i < frame.netCount; i++) {
    if (frame.parent[i] !== i) continue;
    let lo = Infinity;
    let hi = -Infinity;
    for (let j = frame.srcHead[i]!; j >= 0; j = frame.srcNext[j]!) {
      lo = Math.min(lo, frame.sourceEndVolts[j]!);
      hi = Math.max(hi, frame.sourceEndVolts[j]!);
    }
    if (lo === Infinity) shareCharge(frame, i, snapVolts);
    else if (hi - lo < 1e-12) driveSingle(frame, i, snapVolts, lo);
    else driveMixed(frame, i, snapVolts);
  }
}

/** Union-find over conducting elements, then per-root lists of nets and of source ties. */
function groupNets(frame: Frame): void {
  const { topo, parent } = frame;
  frame.unionConducting();
  for (let i = 0; i < frame.netCount; i++) {
    parent[i] = frame.root(i);
    frame.head[i] = -1;
    frame.srcHead[i] = -1;
    frame.kinds[i] = 0;
  }
  for (let i = frame.netCount - 1; i >= 0; i--) {
    frame.next[i] = frame.head[parent[i]!]!;
    frame.head[parent[i]!] = i;
  }
  const kind = frame.c.chKind;
  for (let j = frame.elemCount - 1; j >= 0; j--) {
    if (!frame.on[j]) continue;
    const e = frame.element(j);
    const a = topo.elemLocalA[e]!;
    const b = topo.elemLocalB[e]!;
    const r = parent[a >= 0 ? a : b]!;
    frame.kinds[r]! |= kind[e] === NMOS ? HAS_NMOS : kind[e] === PMOS ? HAS_PMOS : 0;
    if (a >= 0 && b >= 0) continue;
    frame.srcNext[j] = frame.srcHead[r]!;
    frame.srcHead[r] = j;
  }
  const self = topo.cccSelfGated;
  for (let p = self.start[frame.k]!; p < self.start[frame.k + 1]!; p++) {
    const j = self.items[p]!;
    if (!frame.on[j]) continue;
    const e = frame.element(j);
    const a = topo.elemLocalA[e]!;
    frame.kinds[parent[a >= 0 ? a : topo.elemLocalB[e]!]!]! |= HAS_SELF;
  }
}

/**
 * No path to a source (docs/semantics.md §2.6): a lone net keeps its charge; joined nets share it,
 * V = ΣCi·Vi / ΣCi. A member with unknown charge could hold anything from 0 to VDD, so the result is an
 * interval; it is known when both ends of the interval read as the same level.
 */
function shareCharge(frame: Frame, root: number, snapVolts: Float64Array): void {
  const { c } = frame;
  let members = 0;
  let cTotal = 0;
  let qKnown = 0;
  let cUnknown = 0;
  for (let i = frame.head[root]!; i >= 0; i = frame.next[i]!) {
    const n = frame.net(i);
    const cap = Math.max(c.netCap[n]!, MIN_NET_CAP);
    const v = snapVolts[n]!;
    members++;
    cTotal += cap;
    if (Number.isNaN(v)) cUnknown += cap;
    else qKnown += cap * v;
  }
  let shared = qKnown / cTotal;
  if (cUnknown > 0) {
    const upper = (qKnown + cUnknown * c.tech.vdd) / cTotal;
    const same = classify(shared, c.tech.vil, c.tech.vih) === classify(upper, c.tech.vil, c.tech.vih);
    shared = same && classify(shared, c.tech.vil, c.tech.vih) !== LEVEL_X ? (shared + upper) / 2 : NaN;
  }
  for (let i = frame.head[root]!; i >= 0; i = frame.next[i]!) {
    const before = snapVolts[frame.net(i)]!;
    const v = members === 1 ? before : shared;
    frame.volts[i] = v;
    frame.driven[i] = 0;
    frame.limiter[i] = -1;
    const moved =
      !Number.isNaN(before) && (Number.isNaN(v) || Math.abs(v - before) > CHARGE_SHARE_FRACTION * c.tech.vdd);
    frame.flags[i] = members > 1 && moved ? FLAG_CHARGE_SHARED : 0;
  }
}

/**
 * One source voltage (the fast path): every net takes it, less any threshold drop. Only an NMOS can
 * drop a high level and only a PMOS a low one, so a pull-up of PMOS devices or a pull-down of NMOS
 * devices (all of static CMOS) skips the path search.
 */
function driveSingle(frame: Frame, root: number, snapVolts: Float64Array, vs: number): void {
  const high = vs >= frame.c.tech.vdd / 2;
  if ((frame.kinds[root]! & ((high ? HAS_NMOS : HAS_PMOS) | HAS_SELF)) === 0) {
    for (let i = frame.head[root]!; i >= 0; i = frame.next[i]!) {
      frame.volts[i] = vs;
      frame.driven[i] = 1;
      frame.flags[i] = 0;
      frame.limiter[i] = -1;
    }
    return;
  }
  bottleneck(frame, root, snapVolts, high);
  for (let i = frame.head[root]!; i >= 0; i = frame.next[i]!) {
    const v = frame.best[i]!;
    // Unreached: only a self-gated element's blocked direction leads here, and the trial switches it
    // off and solves again.
    const reached = Number.isFinite(v);
    frame.volts[i] = reached ? v : NaN;
    frame.driven[i] = reached ? 1 : 0;
    frame.flags[i] = reached && Math.abs(v - vs) > 1e-9 ? FLAG_DEGRADED : 0;
  }
}

/**
 * Sources of several voltages: nodal analysis gives the divider voltages and currents; the result is
 * then clamped by the threshold-drop limits of the high and the low sources (a net reached by the
 * high side only through NMOS cannot rise above Vg − Vtn). Currents stay those of the resistive model.
 */
function driveMixed(frame: Frame, root: number, snapVolts: Float64Array): void {
  const { c } = frame;
  if (!solveNodal(frame, root)) return markIllConditioned(frame, root);
  const resistive = new Map<number, number>();
  for (let i = frame.head[root]!; i >= 0; i = frame.next[i]!) resistive.set(i, frame.volts[i]!);
  const highLimit = new Map<number, [number, number]>();
  if (bottleneck(frame, root, snapVolts, true)) {
    for (let i = frame.head[root]!; i >= 0; i = frame.next[i]!)
      highLimit.set(i, [frame.best[i]!, frame.limiter[i]!]);
  }
  const hasLow = bottleneck(frame, root, snapVolts, false);
  for (let i = frame.head[root]!; i >= 0; i = frame.next[i]!) {
    let v = resistive.get(i) as number;
    let limiter = -1;
    const [cap, capBy] = highLimit.get(i) ?? [Infinity, -1];
    // A limit is infinite where a self-gated element blocks every path from that side.
    if (Number.isFinite(cap) && v > cap) [v, limiter] = [cap, capBy];
    const floor = frame.best[i]!;
    if (hasLow && Number.isFinite(floor) && v < floor) [v, limiter] = [floor, frame.limiter[i]!];
    frame.volts[i] = v;
    frame.driven[i] = 1;
    frame.limiter[i] = limiter;
    let flags = limiter >= 0 ? FLAG_DEGRADED : 0;
    if (classify(v, c.tech.vil, c.tech.vih) === LEVEL_X) flags |= FLAG_CONTENTION;
    frame.flags[i] = flags;
  }
}

/** A group the nodal solve could not trust: its nets are X, flagged, and carry no current. */
function markIllConditioned(frame: Frame, root: number): void {
  for (let i = frame.head[root]!; i >= 0; i = frame.next[i]!) {
    frame.volts[i] = NaN;
    frame.driven[i] = 1;
    frame.flags[i] = FLAG_ILL_CONDITIONED;
    frame.limiter[i] = -1;
  }
}
