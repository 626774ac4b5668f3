// Hot loop: indexes here are in range by construction, so `!` marks them (no run-time cost).
import type { CompiledNetlist } from '../compile/compile.ts';
import { OutcomeStore } from './memo.ts';
import type { InputVector } from '../model/design.ts';
import { currentPaths, type PathIndices } from './currentPaths.ts';
import { conductionOf } from './evaluate.ts';
import { FLAG_CHARGE_SHARED, FLAG_MAYBE, FLAG_OSCILLATING, FLAG_STATES, ON } from './levels.ts';
import { conductionOfAll, levelsOf, type Changes } from './finishArrays.ts';
import type { NetState } from './netState.ts';
import { sameVolts, Schedule } from './schedule.ts';
import type { Topology } from './topology.ts';

export { SETTLE_ROUNDS_BASE, SETTLE_ROUNDS_PER_COMPONENT } from './schedule.ts';

export interface SolveResult {
  readonly compiled: CompiledNetlist;
  readonly topology: Topology;
  readonly inputs: InputVector;
  /** Voltage of every source net this vector (rails and driven inputs); NaN elsewhere and for X. */
  readonly sourceVolts: Float64Array;
  /** Volts per net; NaN where unknown. Floating nets hold their stored charge here. */
  readonly volts: Float64Array;
  /** 1 where a net has a conducting path to a source. */
  readonly driven: Uint8Array;
  /** LEVEL_0, LEVEL_1, LEVEL_X, LEVEL_Z per net. */
  readonly levels: Uint8Array;
  /** FLAG_* bits per net. */
  readonly flags: Uint8Array;
  /** Element that set a degraded net's threshold drop, -1 otherwise. */
  readonly limiter: Int32Array;
  /** OFF, ON, MAYBE per channel element. */
  readonly conduction: Uint8Array;
  /** Amperes from A to B per channel element. */
  readonly chCurrent: Float64Array;
  /** Amperes leaving each source net (negative where current enters it). */
  readonly sourceOut: Float64Array;
  readonly paths: readonly PathIndices[];
  /** Amperes drawn from the supply rails. */
  readonly supplyCurrent: number;
  /** Watts delivered by all sources. */
  readonly staticPower: number;
  /** False when some feedback loop never settled (see FLAG_OSCILLATING). */
  readonly settled: boolean;
}

/**
 * Solves input vectors on one compiled netlist; reuse it across the vectors of a sweep or sequence.
 * Consecutive solves only re-evaluate what the changed inputs reach (see Schedule.propagate).
 */
export class Simulator {
  private readonly schedules = new Map<string, Schedule>();
  /** Component outcomes, shared by the schedules of every choice of undriven inputs. */
  private readonly outcomes = new OutcomeStore();
  private readonly supplyNets: number[];
  private lastFresh: SolveResult | null = null;

  /**
   * `incremental: false` re-evaluates every component on every solve: slower, same answers (the
   * property tests check that).
   */
  constructor(
    readonly compiled: CompiledNetlist,
    private readonly options: { readonly incremental?: boolean } = {},
  ) {
    this.supplyNets = compiled.netlist.rails
      .filter((r) => r.role === 'supply')
      .map((r) => compiled.netIndex.get(r.net) as number);
  }

  /** Solves from an unknown state: every net starts with unknown charge (sweep mode). */
  /**
   * With `recycle`, the arrays of the previous solveFresh result are reused for this one: that result
   * must not be read afterwards. Sweeps that keep only a report use it to avoid allocating per vector.
   */
  solveFresh(inputs: InputVector, options: { readonly recycle?: boolean } = {}): SolveResult {
    const result = this.run(inputs, this.lastFresh, true, options.recycle === true);
    this.lastFresh = result;
    return result;
  }

  /** Solves starting from a previous result's stored charge (sequence mode, live toggling). */
  solveNext(inputs: InputVector, previous: SolveResult): SolveResult {
    if (previous.compiled !== this.compiled)
      throw new Error('solveNext: the previous result belongs to another netlist');
    return this.run(inputs, previous, false, false);
  }

  /**
   * The schedule of vectors that drive every input, as the sweep's solves use it: the component
   * tables of a sweep evaluate their groups with it (core/tables), so nothing is built twice.
   */
  drivenSchedule(): Schedule {
    return this.scheduleFor([]);
  }

  private schedule(inputs: InputVector): Schedule {
    const names = this.compiled.netlist.inputs;
    // Nearly every vector drives all inputs: find that out without building the key.
    let anyUndriven = false;
    for (const name of names) if ((inputs[name] ?? 'Z') === 'Z') anyUndriven = true;
    return this.scheduleFor(anyUndriven ? names.filter((name) => (inputs[name] ?? 'Z') === 'Z') : []);
  }

  /** The schedule with these inputs undriven, built once. */
  private scheduleFor(undriven: readonly string[]): Schedule {
    const key = undriven.join('\u0000');
    let s = this.schedules.get(key);
    if (!s) {
      // The all-driven schedule first: the others replay its memo tables (solver/memo.ts).
      if (undriven.length > 0) this.scheduleFor([]);
      s = Schedule.build(
        this.compiled,
        new Set(undriven.map((u) => this.compiled.netIndex.get(u) as number)),
        this.outcomes,
      );
      this.schedules.set(key, s);
    }
    return s;
  }

  private sourceVoltages(inputs: InputVector, topology: Topology): Float64Array {
    const c = this.compiled;
    const volts = c.railVolts.slice();
    for (let i = 0; i < c.inputNets.length; i++) {
      const n = c.inputNets[i]!;
      if (!topology.isSource[n]) continue;
      const value = inputs[c.netlist.inputs[i]!];
      volts[n] = value === '1' ? c.tech.vdd : value === '0' ? 0 : NaN;
    }
    return volts;
  }

  private run(inputs: InputVector, base: SolveResult | null, fresh: boolean, recycle: boolean): SolveResult {
    const c = this.compiled;
    const schedule = this.schedule(inputs);
    const { topology } = schedule;
    const sourceVolts = this.sourceVoltages(inputs, topology);
    const sameTopology = base !== null && base.topology === topology;
    const incremental = sameTopology && this.options.incremental !== false;
    const reuse = sameTopology && recycle;
    const copy = <T extends Float64Array | Uint8Array | Int32Array>(a: T): T =>
      reuse ? a : (a.slice() as T);
    // Charge is carried from the base when it is incremental or when a sequence continues from it;
    // a full fresh solve starts from unknown charge everywhere.
    const carry = base !== null && (incremental || !fresh);
    const blank = <T extends Float64Array | Uint8Array | Int32Array>(
      old: T | undefined,
      make: () => T,
      value: number,
    ): T => (reuse && old !== undefined ? old : make()).fill(value) as T;
    const state: NetState = {
      volts: carry ? copy(base.volts) : blank(base?.volts, () => new Float64Array(c.netCount), NaN),
      driven: carry ? copy(base.driven) : blank(base?.driven, () => new Uint8Array(c.netCount), 0),
      flags: incremental ? copy(base.flags) : blank(base?.flags, () => new Uint8Array(c.netCount), 0),
      limiter: incremental ? copy(base.limiter) : blank(base?.limiter, () => new Int32Array(c.netCount), -1),
      chCurrent: incremental
        ? copy(base.chCurrent)
        : blank(base?.chCurrent, () => new Float64Array(c.chCount), 0),
    };
    let dirty: Uint8Array | 'all' = 'all';
    if (incremental) {
      dirty = new Uint8Array(topology.cccCount);
      this.markChanged(schedule, base, sourceVolts, dirty, fresh);
    }
    for (const n of schedule.sourceNets) {
      state.volts[n] = sourceVolts[n]!;
      state.driven[n] = 1;
      state.flags[n] = 0;
    }
    schedule.propagate(sourceVolts, state, dirty, fresh);
    // Only the nets of re-evaluated groups and the sources can have changed: levels and conduction
    // are then updated there alone, from the base's.
    const nets = dirty === 'all' ? null : schedule.touchedNets(dirty);
    const changes = nets === null || base === null ? null : { base, nets };
    return this.finish(inputs, schedule, sourceVolts, state, reuse ? base : null, changes);
  }

  /**
   * What an incremental solve must re-evaluate: components touched by a source whose voltage changed
   * and, when carrying state, those whose last result was an event rather than a state (charge just
   * shared, a loop that did not settle, a value made unknown by maybe devices or by several steady
   * states), since evaluating them
   * again from the state they left need not repeat it.
   */
  private markChanged(
    schedule: Schedule,
    base: SolveResult,
    sourceVolts: Float64Array,
    dirty: Uint8Array,
    fresh: boolean,
  ): void {
    for (const n of schedule.sourceNets) {
      if (!sameVolts(sourceVolts[n]!, base.sourceVolts[n]!)) schedule.markTouching(dirty, n);
    }
    if (fresh) return;
    const { cccOfNet } = schedule.topology;
    for (let n = 0; n < base.flags.length; n++) {
      if (
        cccOfNet[n]! >= 0 &&
        base.flags[n]! & (FLAG_CHARGE_SHARED | FLAG_OSCILLATING | FLAG_MAYBE | FLAG_STATES)
      )
        dirty[cccOfNet[n]!] = 1;
    }
  }

  /**
   * Derives levels, conduction and source currents; `recycled` lends its arrays for them, and with
   * `changes` only the changed nets' levels and the conduction of what they gate are worked out.
   */
  private finish(
    inputs: InputVector,
    schedule: Schedule,
    sourceVolts: Float64Array,
    state: NetState,
    recycled: SolveResult | null,
    changes: Changes | null,
  ): SolveResult {
    const c = this.compiled;
    const { topology, frame } = schedule;
    const { volts, driven, chCurrent, flags } = state;
    for (const e of topology.bridges) {
      const on = conductionOf(frame, e, volts) === ON;
      const dv = sourceVolts[c.chA[e]!]! - sourceVolts[c.chB[e]!]!;
      chCurrent[e] = on && Number.isFinite(dv) ? dv / c.chOhms[e]! : 0;
    }
    const from = (a: Uint8Array | undefined, size: number): Uint8Array =>
      recycled ? a! : changes === null ? new Uint8Array(size) : a!.slice();
    const levels = levelsOf(
      c,
      topology,
      state,
      from(changes?.base.levels ?? recycled?.levels, c.netCount),
      changes,
    );
    let settled = true;
    for (let n = 0; n < flags.length; n++) if (flags[n]! & FLAG_OSCILLATING) settled = false;
    // Only source nets ever hold a current, so a recycled array needs only those cleared.
    const sourceOut = recycled ? recycled.sourceOut : new Float64Array(c.netCount);
    if (recycled) for (const n of schedule.sourceNets) sourceOut[n] = 0;
    for (const e of schedule.sourceTies) {
      const i = chCurrent[e]!;
      if (i === 0) continue;
      if (topology.isSource[c.chA[e]!]) sourceOut[c.chA[e]!]! += i;
      if (topology.isSource[c.chB[e]!]) sourceOut[c.chB[e]!]! -= i;
    }
    let staticPower = 0;
    for (const n of schedule.sourceNets)
      if (Number.isFinite(volts[n])) staticPower += volts[n]! * sourceOut[n]!;
    const supplyCurrent = this.supplyNets.reduce((sum, n) => sum + sourceOut[n]!, 0);
    return {
      compiled: c,
      topology,
      inputs,
      sourceVolts,
      volts,
      driven,
      levels,
      flags,
      limiter: state.limiter,
      conduction: conductionOfAll(
        c,
        topology,
        volts,
        from(changes?.base.conduction ?? recycled?.conduction, c.chCount),
        changes,
      ),
      chCurrent,
      sourceOut,
      paths: currentPaths(c, topology.isSource, schedule.sourceNets, volts, chCurrent, sourceOut),
      supplyCurrent,
      staticPower,
      settled,
    };
  }
}
