// Hot loop: indexes here are in range by construction, so `!` marks them (no run-time cost).
import type { CompiledNetlist } from '../compile/compile.ts';
import { evaluateCcc } from './evaluate.ts';
import type { Frame } from './frame.ts';
import { GroupSnapshot, mergeSteadyStates, type MergeContext } from './groupStates.ts';
import { classify, FLAG_BOUND, FLAG_OSCILLATING, LEVEL_0, LEVEL_1, LEVEL_X } from './levels.ts';
import type { NetState } from './schedule.ts';
import { GATE_NOT_TIED } from './selfGated.ts';
import type { Topology } from './topology.ts';

/**
 * Bounds of the steady-state search (docs/semantics.md §2): at most this many undecided feedback
 * nets are guessed, and at most this many element evaluations (2^nets × the group's elements) are
 * spent; past either, the nets stay X with a `limit` finding.
 */
export const MAX_FEEDBACK_GUESSES = 12;
export const MAX_FEEDBACK_WORK = 1 << 22;

/** The parts of a feedback group the search reads, built once per group. */
interface Group {
  readonly members: readonly number[];
  readonly nets: Int32Array;
  readonly elements: Int32Array;
  /** Nets of the group that gate elements of the group: where it keeps its state. */
  readonly feedback: Int32Array;
  /** Gate nets outside the group and sources tied to it: where an X could come in from outside. */
  readonly outside: Int32Array;
}

type Outcome = 'steady' | 'moves' | 'unsure';

/**
 * Resolves X that a feedback group makes up from its own unknown start. Jacobi rounds from unknown
 * charge can keep a loop at X for ever (an unknown control makes a pass device maybe-conducting, the
 * maybe path makes the control X again) although the circuit has one steady state. When a group ends
 * its rounds with feedback nets at X and every gate and source reaching it from outside is definite,
 * each 0/1 assignment of those undecided nets is evaluated once; an assignment is a steady state when
 * the evaluation reproduces it (then its voltages are settled from there). What all steady states agree
 * on is the result; nets they disagree on stay X (stored state, or a race); none at all is an
 * oscillation. Fixed points rather than simulations from each start: a start's transient fights would
 * read X where the circuit settles. A guess whose outcome depends on charge the engine does not know
 * leaves the group as it was.
 */
export class FeedbackSearch {
  private readonly groups = new Map<number, Group>();
  private readonly merge: MergeContext;

  constructor(
    private readonly c: CompiledNetlist,
    private readonly topology: Topology,
    private readonly frame: Frame,
    private readonly sccOf: Int32Array,
    /** Scratch space for one evaluation of a guess. */
    private readonly scratch: NetState,
  ) {
    const { vil, vih, vdd } = c.tech;
    const deviceName = (e: number): string => c.netlist.devices[c.chDevice[e]!]!.name;
    this.merge = { vil, vih, vdd, deviceName };
  }

  /** `settle` runs the group's Jacobi rounds on `state` from where it stands. */
  resolve(
    s: number,
    members: readonly number[],
    sourceVolts: Float64Array,
    state: NetState,
    settle: () => void,
  ): void {
    const group = this.group(s, members);
    const undecided = group.feedback.filter((n) => Number.isNaN(state.volts[n]));
    if (undecided.length === 0 || this.unknownFromOutside(group, state.volts)) return;
    if (
      undecided.length > MAX_FEEDBACK_GUESSES ||
      2 ** undecided.length * group.elements.length > MAX_FEEDBACK_WORK
    ) {
      for (const n of undecided) state.flags[n]! |= FLAG_BOUND;
      return;
    }
    const before = GroupSnapshot.take(group.nets, group.elements, state);
    const steady: GroupSnapshot[] = [];
    for (let guess = 0; guess < 2 ** undecided.length; guess++) {
      before.restore(state);
      const outcome = this.tryGuess(group, undecided, guess, sourceVolts, state, settle);
      if (outcome === 'unsure') return before.restore(state);
      if (outcome === 'steady') steady.push(GroupSnapshot.take(group.nets, group.elements, state));
    }
    before.restore(state);
    if (steady.length === 0) {
      for (const n of undecided) state.flags[n]! |= FLAG_OSCILLATING;
      return;
    }
    mergeSteadyStates(steady, state, before.anyFlag(FLAG_OSCILLATING), this.merge);
  }

  /** Evaluates the group once with the undecided nets at the guessed levels; settles a steady guess. */
  private tryGuess(
    group: Group,
    undecided: Int32Array,
    guess: number,
    sourceVolts: Float64Array,
    state: NetState,
    settle: () => void,
  ): Outcome {
    const { vdd } = this.c.tech;
    undecided.forEach((n, bit) => (state.volts[n] = (guess >> bit) & 1 ? vdd : 0));
    const { scratch } = this;
    for (const k of group.members) evaluateCcc(this.frame, k, state.volts, sourceVolts, scratch);
    const once = this.compare(undecided, guess, scratch.volts);
    if (once !== 'steady') return once;
    for (const n of group.nets) {
      state.volts[n] = scratch.volts[n]!;
      state.driven[n] = scratch.driven[n]!;
      state.flags[n] = scratch.flags[n]!;
      state.limiter[n] = scratch.limiter[n]!;
    }
    settle();
    if (group.nets.some((n) => (state.flags[n]! & FLAG_OSCILLATING) !== 0)) return 'unsure';
    return this.compare(undecided, guess, state.volts) === 'steady' ? 'steady' : 'unsure';
  }

  /** Steady when every undecided net reads its guess; moves when one definitely reads otherwise. */
  private compare(undecided: Int32Array, guess: number, volts: Float64Array): Outcome {
    const { vil, vih } = this.c.tech;
    let unknown = false;
    for (let bit = 0; bit < undecided.length; bit++) {
      const v = volts[undecided[bit]!]!;
      if (Number.isNaN(v)) unknown = true;
      else if (classify(v, vil, vih) !== ((guess >> bit) & 1 ? LEVEL_1 : LEVEL_0)) return 'moves';
    }
    return unknown ? 'unsure' : 'steady';
  }

  private unknownFromOutside(group: Group, volts: Float64Array): boolean {
    const { vil, vih } = this.c.tech;
    return group.outside.some((n) => classify(volts[n]!, vil, vih) === LEVEL_X);
  }

  private group(s: number, members: readonly number[]): Group {
    let group = this.groups.get(s);
    if (!group) {
      group = describeGroup(this.c, this.topology, this.sccOf, s, members);
      this.groups.set(s, group);
    }
    return group;
  }
}

function describeGroup(
  c: CompiledNetlist,
  topology: Topology,
  sccOf: Int32Array,
  s: number,
  members: readonly number[],
): Group {
  const { cccNets, cccElements, cccOfNet, isSource, selfGate } = topology;
  const nets: number[] = [];
  const elements: number[] = [];
  const feedback = new Set<number>();
  const outside = new Set<number>();
  for (const k of members) {
    for (let i = cccNets.start[k]!; i < cccNets.start[k + 1]!; i++) nets.push(cccNets.items[i]!);
    for (let i = cccElements.start[k]!; i < cccElements.start[k + 1]!; i++) {
      const e = cccElements.items[i]!;
      elements.push(e);
      for (const end of [c.chA[e]!, c.chB[e]!]) if (isSource[end]) outside.add(end);
      const g = c.chGate[e]!;
      if (g < 0 || selfGate[e] !== GATE_NOT_TIED) continue;
      if (cccOfNet[g]! >= 0 && sccOf[cccOfNet[g]!] === s) feedback.add(g);
      else outside.add(g);
    }
  }
  const sorted = (set: Set<number>): Int32Array => Int32Array.from([...set].sort((a, b) => a - b));
  return {
    members,
    nets: Int32Array.from(nets),
    elements: Int32Array.from(elements),
    feedback: sorted(feedback),
    outside: sorted(outside),
  };
}
