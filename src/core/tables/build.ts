import type { CompiledNetlist } from '../compile/compile.ts';
import { classify, LEVEL_Z } from '../solver/levels.ts';
import type { NetState, Schedule } from '../solver/schedule.ts';
import type { GroupShape } from './shape.ts';
import { STATE_DRIVEN, STATE_EXACT, TRIT_X, type GroupTable } from './table.ts';

/**
 * Evaluates a group for every assignment of its controls with the engine's own group evaluation
 * (`Schedule.evaluateGroup`, sweep mode) and records what it wrote. One `TableBench` serves every
 * group of a schedule: its state arrays span the netlist, and only the group's nets and its
 * controls are written before each entry.
 */
export class TableBench {
  private readonly state: NetState;
  private readonly sourceVolts: Float64Array;

  constructor(
    private readonly c: CompiledNetlist,
    private readonly schedule: Schedule,
  ) {
    this.sourceVolts = c.railVolts.slice();
    this.state = {
      volts: c.railVolts.slice(),
      driven: new Uint8Array(c.netCount),
      flags: new Uint8Array(c.netCount),
      limiter: new Int32Array(c.netCount).fill(-1),
      chCurrent: new Float64Array(c.chCount),
    };
    for (let n = 0; n < c.netCount; n++) if (!Number.isNaN(c.railVolts[n])) this.state.driven[n] = 1;
  }

  build(shape: GroupShape, ternary: boolean): GroupTable {
    const base = ternary ? 3 : 2;
    const entries = base ** shape.controls.length;
    const width = shape.nets.length;
    const table: GroupTable = {
      kind: 'table',
      shape,
      ternary,
      entries,
      states: new Uint8Array(entries * width),
      flags: new Uint8Array(entries * width),
      volts: new Float64Array(entries * width),
      current: new Uint8Array(entries),
      clean: new Uint8Array(entries),
      cleanObserved: new Uint8Array(entries),
    };
    for (let e = 0; e < entries; e++) {
      this.apply(shape, e, base);
      this.schedule.evaluateGroup(shape.index, this.sourceVolts, this.state, true);
      this.record(table, e);
    }
    return table;
  }

  /** Sets the controls to entry e's digits and the group to unknown charge, as a sweep starts it. */
  private apply(shape: GroupShape, entry: number, base: number): void {
    const { vdd } = this.c.tech;
    const { state, sourceVolts } = this;
    let rest = entry;
    for (const n of shape.controls) {
      const digit = rest % base;
      rest = (rest - digit) / base;
      const v = digit === TRIT_X ? NaN : digit * vdd;
      state.volts[n] = v;
      state.driven[n] = 1;
      if (this.schedule.topology.isSource[n]) sourceVolts[n] = v;
    }
    for (const n of shape.nets) {
      state.volts[n] = NaN;
      state.driven[n] = 0;
      state.flags[n] = 0;
      state.limiter[n] = -1;
    }
    for (const e of shape.elements) state.chCurrent[e] = 0;
  }

  private record(table: GroupTable, entry: number): void {
    const { vdd, vil, vih } = this.c.tech;
    const { state } = this;
    const { nets, elements, observed } = table.shape;
    const at = entry * nets.length;
    let clean = 1;
    let cleanObserved = 1;
    for (let i = 0; i < nets.length; i++) {
      const n = nets[i]!;
      const v = state.volts[n]!;
      const driven = state.driven[n] === 1;
      const level = driven ? classify(v, vil, vih) : LEVEL_Z;
      const exact = driven && (v === 0 || v === vdd);
      table.states[at + i] = level | (exact ? STATE_EXACT : 0) | (driven ? STATE_DRIVEN : 0);
      table.flags[at + i] = state.flags[n]!;
      table.volts[at + i] = v;
      const quiet = state.flags[n] === 0 && (exact || (!driven && Number.isNaN(v)));
      if (!quiet) {
        clean = 0;
        if (observed[i]) cleanObserved = 0;
      }
    }
    let current = 0;
    for (const e of elements) if (state.chCurrent[e] !== 0) current = 1;
    table.current[entry] = current;
    table.clean[entry] = clean & (1 - current);
    table.cleanObserved[entry] = cleanObserved & (1 - current);
  }
}
