// Hot loop: indexes here are in range by construction, so `!` marks them (no run-time cost).
import { NMOS, RESISTOR } from '../compile/compile.ts';
import type { Frame } from './frame.ts';
import { classify, FLAG_BOUND, FLAG_MAYBE, MAYBE, OFF, ON } from './levels.ts';
import { solveTrial } from './trial.ts';

/**
 * Exact handling of maybe-conducting devices (docs/semantics.md §2.7): a group with up to this many unknowns
 * (devices whose gate is X, plus inputs driven to X) is solved for every on/off combination;
 * a net is definite only if it reads the same in all of them. Past the bound the group is set to X.
 */
export const MAX_EXACT_UNKNOWNS = 10;

/** Where one evaluation writes its result, indexed by global net / element. */
export interface EvaluationTarget {
  readonly volts: Float64Array;
  readonly driven: Uint8Array;
  readonly flags: Uint8Array;
  readonly limiter: Int32Array;
  readonly chCurrent: Float64Array;
}

/**
 * The conduction rule (docs/semantics.md §2.1), in one place: a resistor always conducts; an NMOS conducts when its
 * gate reads 1 and a PMOS when it reads 0; a gate between the thresholds (or unknown, NaN) makes the
 * device maybe-conducting. Small enough for the engine to inline into the hot loops that call it.
 */
export function conductionFor(kind: number, gateVolts: number, vil: number, vih: number): number {
  if (kind === RESISTOR) return ON;
  if (gateVolts <= vil) return kind === NMOS ? OFF : ON;
  if (gateVolts >= vih) return kind === NMOS ? ON : OFF;
  return MAYBE;
}

/** Conduction of a channel element from its gate's voltage in `snapVolts`. */
export function conductionOf(frame: Frame, e: number, snapVolts: Float64Array): number {
  const { c } = frame;
  const gate = c.chGate[e]!;
  return conductionFor(c.chKind[e]!, gate >= 0 ? snapVolts[gate]! : NaN, c.tech.vil, c.tech.vih);
}

/**
 * Evaluates CCC k against the previous round's voltages and writes the new state of its nets and
 * the currents of its elements into `out`.
 */
export function evaluateCcc(
  frame: Frame,
  k: number,
  snapVolts: Float64Array,
  sourceVolts: Float64Array,
  out: EvaluationTarget,
): void {
  frame.select(k);
  if (setConduction(frame, snapVolts, sourceVolts)) {
    enumerate(frame, collectUnknowns(frame), snapVolts, out);
    return;
  }
  solveTrial(frame, snapVolts);
  writeTrial(frame, out);
}

interface Unknown {
  /** Local element: a maybe device, or the element tying the group to an X input. */
  readonly j: number;
  readonly isSource: boolean;
}

/**
 * Sets frame.on (maybe counts as on), frame.maybe and frame.sourceEndVolts for every element of the
 * selected CCC. Returns true when anything is unknown. This is the hot loop of static CMOS, so it
 * reads the typed arrays directly.
 */
function setConduction(frame: Frame, snapVolts: Float64Array, sourceVolts: Float64Array): boolean {
  const { topo, c, on, maybe, sourceEndVolts } = frame;
  const { chKind, chGate, chA, chB } = c;
  const { vil, vih } = c.tech;
  const items = topo.cccElements.items;
  const base = frame.elemStart;
  let unknown = false;
  for (let j = 0; j < frame.elemCount; j++) {
    const e = items[base + j]!;
    const gate = chGate[e]!;
    const state = conductionFor(chKind[e]!, gate >= 0 ? snapVolts[gate]! : NaN, vil, vih);
    on[j] = state === OFF ? 0 : 1;
    maybe[j] = state === MAYBE ? 1 : 0;
    const sourceEnd = topo.elemLocalA[e]! < 0 ? chA[e]! : topo.elemLocalB[e]! < 0 ? chB[e]! : -1;
    const vs = sourceEnd >= 0 ? sourceVolts[sourceEnd]! : NaN;
    sourceEndVolts[j] = vs;
    if (state === MAYBE || (sourceEnd >= 0 && vs !== vs)) unknown = true;
  }
  const self = topo.cccSelfGated;
  return self.start[frame.k] === self.start[frame.k + 1] ? unknown : trySelfGatedOn(frame);
}

/**
 * A self-gated element is tried as on whatever its gate reads (the trial switches it off when it is
 * not forward-biased), so it is never an unknown. Returns whether anything else still is. Kept out of
 * setConduction's loop: few components have one.
 */
function trySelfGatedOn(frame: Frame): boolean {
  const { start, items } = frame.topo.cccSelfGated;
  for (let p = start[frame.k]!; p < start[frame.k + 1]!; p++) {
    frame.on[items[p]!] = 1;
    frame.maybe[items[p]!] = 0;
  }
  for (let j = 0; j < frame.elemCount; j++) {
    if (frame.maybe[j] || Number.isNaN(frame.sourceEndVolts[j])) {
      const e = frame.element(j);
      if (frame.maybe[j] || frame.topo.elemLocalA[e]! < 0 || frame.topo.elemLocalB[e]! < 0) return true;
    }
  }
  return false;
}

/** The unknowns setConduction found: maybe devices and ties to inputs driven to X. */
function collectUnknowns(frame: Frame): Unknown[] {
  const { topo } = frame;
  const unknowns: Unknown[] = [];
  for (let j = 0; j < frame.elemCount; j++) {
    const e = frame.element(j);
    if (frame.maybe[j]) unknowns.push({ j, isSource: false });
    const tiedToSource = topo.elemLocalA[e]! < 0 || topo.elemLocalB[e]! < 0;
    if (tiedToSource && Number.isNaN(frame.sourceEndVolts[j])) unknowns.push({ j, isSource: true });
  }
  return unknowns;
}

/**
 * Splits the unknowns by the group (joined by on or maybe elements) they belong to, then steps all
 * groups through their combinations together: combination i gives group g the low bits of i. Groups
 * are independent, so each one sees each of its own combinations.
 */
function enumerate(frame: Frame, unknowns: Unknown[], snapVolts: Float64Array, out: EvaluationTarget): void {
  const groupOf = groupsUnderMaybe(frame);
  const byGroup = new Map<number, Unknown[]>();
  for (const u of unknowns) {
    const g = groupOf(u.j);
    byGroup.set(g, [...(byGroup.get(g) ?? []), u]);
  }
  const overBound = new Set<number>();
  let width = 0;
  for (const [g, list] of byGroup) {
    if (list.length > MAX_EXACT_UNKNOWNS) overBound.add(g);
    else width = Math.max(width, list.length);
  }
  const merge = new TrialMerge(frame);
  for (let combo = 0; combo < 1 << width; combo++) {
    for (const [g, list] of byGroup) {
      list.forEach((u, bit) => setUnknown(frame, u, overBound.has(g) ? 0 : (combo >> bit) & 1));
    }
    solveTrial(frame, snapVolts);
    merge.add();
  }
  merge.finish(overBound, groupOf);
  writeTrial(frame, out);
}

function setUnknown(frame: Frame, u: Unknown, bit: number): void {
  if (u.isSource) frame.sourceEndVolts[u.j] = bit ? frame.c.tech.vdd : 0;
  else frame.on[u.j] = bit;
}

/** Group (root local net) of each local element's channel under "on or maybe" conduction. */
function groupsUnderMaybe(frame: Frame): (j: number) => number {
  const { topo } = frame;
  frame.unionConducting(); // maybe elements are on here
  const roots = Int32Array.from({ length: frame.netCount }, (_, i) => frame.root(i));
  return (j) => {
    const e = frame.element(j);
    const a = topo.elemLocalA[e]!;
    return roots[a >= 0 ? a : topo.elemLocalB[e]!]!;
  };
}

/**
 * Accumulates trials: a net keeps its value when every trial agrees on its level and on whether it
 * is driven; otherwise it becomes X (flagged maybe). Currents are those of the first trial, where
 * every maybe device is off: only definitely conducting paths carry reported current.
 */
class TrialMerge {
  private readonly volts: Float64Array;
  private readonly driven: Uint8Array;
  private readonly flags: Uint8Array;
  private readonly limiter: Int32Array;
  private readonly level: Uint8Array;
  private readonly agree: Uint8Array;
  private readonly anyDriven: Uint8Array;
  private readonly current: Float64Array;
  private trials = 0;

  constructor(private readonly frame: Frame) {
    this.volts = new Float64Array(frame.netCount);
    this.driven = new Uint8Array(frame.netCount);
    this.flags = new Uint8Array(frame.netCount);
    this.limiter = new Int32Array(frame.netCount);
    this.level = new Uint8Array(frame.netCount);
    this.agree = new Uint8Array(frame.netCount).fill(1);
    this.anyDriven = new Uint8Array(frame.netCount);
    this.current = new Float64Array(frame.elemCount);
  }

  add(): void {
    const f = this.frame;
    const { vil, vih } = f.c.tech;
    for (let i = 0; i < f.netCount; i++) {
      const level = classify(f.volts[i]!, vil, vih);
      this.anyDriven[i]! |= f.driven[i]!;
      if (this.trials === 0) {
        this.volts[i] = f.volts[i]!;
        this.driven[i] = f.driven[i]!;
        this.flags[i] = f.flags[i]!;
        this.limiter[i] = f.limiter[i]!;
        this.level[i] = level;
      } else if (level !== this.level[i] || f.driven[i] !== this.driven[i]) {
        this.agree[i] = 0;
      } else {
        this.flags[i]! |= f.flags[i]!;
      }
    }
    if (this.trials === 0) this.current.set(f.current.subarray(0, f.elemCount));
    this.trials++;
  }

  /** Writes the merged result back into the frame's output arrays. */
  finish(overBound: ReadonlySet<number>, groupOf: (j: number) => number): void {
    const f = this.frame;
    const bounded = new Set<number>();
    for (let j = 0; j < f.elemCount; j++) {
      if (!overBound.has(groupOf(j))) continue;
      const e = f.element(j);
      for (const local of [f.topo.elemLocalA[e]!, f.topo.elemLocalB[e]!]) if (local >= 0) bounded.add(local);
    }
    for (let i = 0; i < f.netCount; i++) {
      const definite = this.agree[i] && !bounded.has(i);
      const unknown = !definite;
      f.volts[i] = unknown ? NaN : this.volts[i]!;
      // An unknown net counts as driven when some combination drives it (it reads X, not Z).
      f.driven[i] = unknown ? this.anyDriven[i]! : this.driven[i]!;
      f.limiter[i] = unknown ? -1 : this.limiter[i]!;
      f.flags[i] = unknown ? FLAG_MAYBE | (bounded.has(i) ? FLAG_BOUND : 0) : this.flags[i]!;
    }
    f.current.set(this.current);
  }
}

function writeTrial(frame: Frame, out: EvaluationTarget): void {
  for (let i = 0; i < frame.netCount; i++) {
    const n = frame.net(i);
    out.volts[n] = frame.volts[i]!;
    out.driven[n] = frame.driven[i]!;
    out.flags[n] = frame.flags[i]!;
    out.limiter[n] = frame.limiter[i]!;
  }
  for (let j = 0; j < frame.elemCount; j++) out.chCurrent[frame.element(j)] = frame.current[j]!;
}
