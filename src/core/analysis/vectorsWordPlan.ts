/**
 * The bit-parallel plan of a sweep (docs/semantics.md §2.10): 32 vectors per Int32 word, each net a
 * word whose bit j is 1 when vector j holds the net at VDD. Every group of the engine is read from
 * its binary component table (core/tables) as Boolean functions of its controls: per net, "at VDD"
 * and "floating", and per group "this entry is not clean", which sends the vector back to the scalar
 * engine. Functions are evaluated word-wise, by Shannon expansion over the controls for small
 * groups and entry by entry for larger ones. No code is generated: the tables are data.
 */
import type { CompiledNetlist } from '../compile/compile.ts';
import { FLAG_DEGRADED, LEVEL_1, LEVEL_Z } from '../solver/levels.ts';
import type { ComponentTables } from '../tables/componentTables.ts';
import { STATE_EXACT, STATE_LEVEL, type GroupTable } from '../tables/table.ts';
import { observationOf } from './observation.ts';

/** Groups of at most this many controls are evaluated by Shannon expansion (2^k word muxes). */
const SHANNON_MAX_CONTROLS = 6;

/** A Boolean function of a group's controls, as its 2^k entries' bits (0 or -1 per entry). */
export interface WordFunction {
  /** -1 or 0 when the function is constant, else null. */
  readonly constant: number | null;
  /** Per entry: -1 where the function is 1, 0 where it is 0. */
  readonly leaves: Int32Array;
}

export interface GroupStep {
  readonly controls: Int32Array;
  /** Group nets whose words are needed (read by later groups or reported), and their functions. */
  readonly nets: Int32Array;
  readonly high: readonly WordFunction[];
  /** Floating with unknown charge (only nets no gate or output reads can be, in a clean entry). */
  readonly floating: readonly (WordFunction | null)[];
  /** Entries the scalar engine must solve: not clean, or an observed net not exactly at a rail. */
  readonly fallback: WordFunction;
}

export interface WordPlan {
  readonly steps: readonly GroupStep[];
  /** Rails at VDD: their word is all ones (rails at 0 V stay 0). */
  readonly highRails: Int32Array;
}

/** Why a sweep cannot take the bit-parallel path, or null when it can. */
export function wordPlanRefusal(c: CompiledNetlist, tables: ComponentTables, vectors: number): string | null {
  const { topology } = tables.schedule;
  if (topology.bridges.length > 0) return 'an element joins two sources';
  for (const v of c.railVolts)
    if (!Number.isNaN(v) && v !== 0 && v !== c.tech.vdd) return 'a rail off 0 V and VDD';
  let entries = 0;
  for (const shape of tables.shapes) entries += 2 ** shape.controls.length;
  // Tables cost one group evaluation per entry: worth it only when the sweep is much longer.
  if (entries * 4 > vectors) return 'tables larger than the sweep';
  for (const shape of tables.shapes) {
    const table = tables.binary(shape.index);
    if (table.kind === 'none') return table.reason;
  }
  return null;
}

/** The plan for the nets in `wanted` (reported nets); call wordPlanRefusal first. */
export function wordPlan(c: CompiledNetlist, tables: ComponentTables, wanted: Int32Array): WordPlan | null {
  const reported = new Uint8Array(c.netCount);
  for (const n of wanted) reported[n] = 1;
  const needed = reported.slice();
  for (const shape of tables.shapes) for (const n of shape.controls) needed[n] = 1;
  const known = new Uint8Array(c.netCount);
  for (let n = 0; n < c.netCount; n++) if (!Number.isNaN(c.railVolts[n])) known[n] = 1;
  for (const n of c.inputNets) known[n] = 1;
  const steps: GroupStep[] = [];
  for (const shape of tables.shapes) {
    for (const n of shape.controls) if (!known[n]) return null; // a gate no group or input drives
    const table = tables.binary(shape.index);
    if (table.kind === 'none') return null;
    steps.push(groupStep(c, table, needed, reported));
    for (const n of shape.nets) known[n] = 1;
  }
  for (const n of wanted) if (!known[n]) return null;
  const highRails = Int32Array.from(
    [...c.railVolts.keys()].filter((n) => c.railVolts[n] === c.tech.vdd && c.tech.vdd > 0),
  );
  return { steps, highRails };
}

function groupStep(
  c: CompiledNetlist,
  table: GroupTable,
  needed: Uint8Array,
  reported: Uint8Array,
): GroupStep {
  const { shape, entries, states } = table;
  const width = shape.nets.length;
  const state = (e: number, i: number): number => states[e * width + i] as number;
  const positions = [...shape.nets.keys()].filter((i) => needed[shape.nets[i] as number] === 1);
  const quiet = quietNets(c, table, reported);
  return {
    controls: shape.controls,
    nets: Int32Array.from(positions, (i) => shape.nets[i] as number),
    high: positions.map((i) => wordFunction(entries, (e) => (state(e, i) & STATE_LEVEL) === LEVEL_1)),
    floating: positions.map((i) => {
      const f = wordFunction(entries, (e) => (state(e, i) & STATE_LEVEL) === LEVEL_Z);
      return f.constant === 0 ? null : f;
    }),
    fallback: wordFunction(entries, (e) => table.current[e] !== 0 || !quiet(e)),
  };
}

/**
 * Whether entry e leaves nothing for a row to show (docs/semantics.md §3): no flag the findings read
 * (a degraded level counts only on an observed net), every observed net exactly at a rail, and every
 * reported net at the voltage its level implies (a rail, or floating with unknown charge).
 */
function quietNets(c: CompiledNetlist, table: GroupTable, reported: Uint8Array): (e: number) => boolean {
  const { observed } = observationOf(c);
  const { shape, states, flags, volts } = table;
  const width = shape.nets.length;
  return (e) => {
    for (let i = 0; i < width; i++) {
      const n = shape.nets[i] as number;
      const at = e * width + i;
      const flag = flags[at] as number;
      const exact = ((states[at] as number) & STATE_EXACT) !== 0;
      const seen = observed[n] === 1;
      if ((flag & ~FLAG_DEGRADED) !== 0 || (seen && (flag !== 0 || !exact))) return false;
      const v = volts[at] as number;
      const floatingUnknown = ((states[at] as number) & STATE_LEVEL) === LEVEL_Z && Number.isNaN(v);
      // A report writes 0 V for a 0 level: -0 would not read back as plain (Object.is).
      const plain = exact && (Object.is(v, 0) || v === c.tech.vdd);
      if (reported[n] === 1 && !plain && !floatingUnknown) return false;
    }
    return true;
  };
}

function wordFunction(entries: number, bit: (entry: number) => boolean): WordFunction {
  const leaves = new Int32Array(entries);
  for (let e = 0; e < entries; e++) leaves[e] = bit(e) ? -1 : 0;
  const first = leaves[0] as number;
  const constant = leaves.every((x) => x === first) ? first : null;
  return { constant, leaves };
}

/**
 * Evaluates a group's functions for one word of vectors: `controls` holds each control's word
 * (bit j: control at VDD in vector j). A group without controls has only constant functions.
 */
export class WordEvaluator {
  private readonly scratch = new Int32Array(1 << (SHANNON_MAX_CONTROLS - 1));
  private readonly entries = new Int32Array(32);
  private controls: Int32Array = new Int32Array(0);
  private k = 0;

  /** Starts a group: its first k controls' words; large groups get each lane's entry number once. */
  begin(controls: Int32Array, k: number): void {
    this.controls = controls;
    this.k = k;
    if (k <= SHANNON_MAX_CONTROLS) return;
    const { entries } = this;
    entries.fill(0);
    for (let i = 0; i < k; i++) {
      const word = controls[i]!;
      for (let j = 0; j < 32; j++) entries[j]! |= ((word >>> j) & 1) << i;
    }
  }

  value(f: WordFunction): number {
    if (f.constant !== null) return f.constant;
    return this.k <= SHANNON_MAX_CONTROLS ? this.expand(f.leaves) : this.lookUp(f.leaves);
  }

  /**
   * f = c_i ? f|c_i=1 : f|c_i=0, folding the lowest control first (entry bit i is control i); the
   * first fold reads the leaves, the rest fold the scratch words in place. Indices are in range by
   * construction (2^k leaves, 2^(k-1) scratch words).
   */
  private expand(leaves: Int32Array): number {
    const s = this.scratch;
    const { controls, k } = this;
    const c0 = controls[0]!;
    let n = leaves.length >> 1;
    for (let p = 0; p < n; p++) s[p] = (leaves[2 * p]! & ~c0) | (leaves[2 * p + 1]! & c0);
    for (let i = 1; i < k; i++) {
      const c = controls[i]!;
      n >>= 1;
      for (let p = 0; p < n; p++) s[p] = (s[2 * p]! & ~c) | (s[2 * p + 1]! & c);
    }
    return s[0]!;
  }

  private lookUp(leaves: Int32Array): number {
    const { entries } = this;
    let word = 0;
    for (let j = 0; j < 32; j++) word |= leaves[entries[j]!]! & (1 << j);
    return word;
  }
}
