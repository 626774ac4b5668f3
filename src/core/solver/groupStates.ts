// Hot loop: indexes here are in range by construction, so `!` marks them (no run-time cost).
import { classify, FLAG_OSCILLATING, FLAG_STATES, LEVEL_0, LEVEL_1 } from './levels.ts';
import type { NetState } from './schedule.ts';

/** The state of a feedback group's nets and elements, saved to try a guess and put back afterwards. */
export class GroupSnapshot {
  private constructor(
    readonly nets: Int32Array,
    readonly elements: Int32Array,
    readonly volts: Float64Array,
    readonly driven: Uint8Array,
    readonly flags: Uint8Array,
    readonly limiter: Int32Array,
    readonly current: Float64Array,
  ) {}

  static take(nets: Int32Array, elements: Int32Array, state: NetState): GroupSnapshot {
    const pick = <T extends Float64Array | Uint8Array | Int32Array>(from: T, into: T, at: Int32Array): T => {
      at.forEach((n, i) => (into[i] = from[n]!));
      return into;
    };
    return new GroupSnapshot(
      nets,
      elements,
      pick(state.volts, new Float64Array(nets.length), nets),
      pick(state.driven, new Uint8Array(nets.length), nets),
      pick(state.flags, new Uint8Array(nets.length), nets),
      pick(state.limiter, new Int32Array(nets.length), nets),
      pick(state.chCurrent, new Float64Array(elements.length), elements),
    );
  }

  restore(state: NetState): void {
    this.nets.forEach((n, i) => {
      state.volts[n] = this.volts[i]!;
      state.driven[n] = this.driven[i]!;
      state.flags[n] = this.flags[i]!;
      state.limiter[n] = this.limiter[i]!;
    });
    this.elements.forEach((e, j) => (state.chCurrent[e] = this.current[j]!));
  }

  anyFlag(flag: number): boolean {
    return this.flags.some((f) => (f & flag) !== 0);
  }
}

/** What the merge needs to know about the cell. */
export interface MergeContext {
  readonly vil: number;
  readonly vih: number;
  readonly vdd: number;
  /** Name of a channel element's device, to break ties in the limiter without regard to order. */
  readonly deviceName: (element: number) => string;
}

/**
 * Writes what every steady state of a group agrees on into `state` (docs/semantics.md §2). A net
 * on whose level and drive all agree takes the worst voltage among them (the lowest high, the highest
 * low, the middlemost X) and every state's flags; a net they disagree on is X, flagged FLAG_STATES
 * (and FLAG_OSCILLATING when the group was racing). An element's current is kept where all agree.
 */
export function mergeSteadyStates(
  states: readonly GroupSnapshot[],
  state: NetState,
  racing: boolean,
  ctx: MergeContext,
): void {
  const [first] = states;
  if (first === undefined) return; // no steady state: nothing they agree on
  first.nets.forEach((n, i) => {
    const key = (s: GroupSnapshot): string => `${classify(s.volts[i]!, ctx.vil, ctx.vih)}${s.driven[i]}`;
    const agree = states.every((s) => key(s) === key(first));
    if (!agree) {
      state.volts[n] = NaN;
      state.driven[n] = states.some((s) => s.driven[i] === 1) ? 1 : 0;
      state.flags[n] = FLAG_STATES | (racing ? FLAG_OSCILLATING : 0);
      state.limiter[n] = -1;
      return;
    }
    const chosen = worstOf(states, i, ctx);
    state.volts[n] = chosen.volts[i]!;
    state.driven[n] = chosen.driven[i]!;
    state.flags[n] = states.reduce((f, s) => f | s.flags[i]!, 0);
    state.limiter[n] = chosen.limiter[i]!;
  });
  first.elements.forEach((e, j) => {
    const a = first.current[j]!;
    const same = states.every((s) => Math.abs(s.current[j]! - a) <= 1e-9 * Math.max(Math.abs(a), 1e-30));
    state.chCurrent[e] = same ? a : 0;
  });
}

/** The state with the worst voltage on local net i; equal voltages go by the limiter's device name. */
function worstOf(states: readonly GroupSnapshot[], i: number, ctx: MergeContext): GroupSnapshot {
  const level = classify(states[0]!.volts[i]!, ctx.vil, ctx.vih);
  const badness = (v: number): number =>
    level === LEVEL_1 ? -v : level === LEVEL_0 ? v : -Math.abs(v - ctx.vdd / 2);
  const rank = (s: GroupSnapshot): string => (s.limiter[i]! < 0 ? '\uffff' : ctx.deviceName(s.limiter[i]!));
  let best = states[0]!;
  for (const s of states) {
    const d = badness(s.volts[i]!) - badness(best.volts[i]!);
    if (d > 1e-12 || (Math.abs(d) <= 1e-12 && rank(s) < rank(best))) best = s;
  }
  return best;
}
