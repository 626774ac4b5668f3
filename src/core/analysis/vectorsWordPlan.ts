// Indexes read here are in range by construction (tables and compiled arrays), so `!` marks them.
/**
 * The bit-parallel plan of a sweep (docs/semantics.md §2.10): 32 vectors per Int32 word, each net a
 * word whose bit j is 1 when vector j holds the net at VDD. Every group of the engine is read from
 * its binary component table (core/tables) as Boolean functions of its controls: per net, "at VDD"
 * and "floating", and per group "this entry is not clean", which sends the vector back to the scalar
 * engine. The functions become one word program (wordProgram.ts), run block by block.
 */
import type { CompiledNetlist } from '../compile/compile.ts';
import { FLAG_DEGRADED, LEVEL_1, LEVEL_Z } from '../solver/levels.ts';
import type { ComponentTables } from '../tables/componentTables.ts';
import { STATE_EXACT, STATE_LEVEL, type GroupTable } from '../tables/table.ts';
import { observationOf } from './observation.ts';
import { ONES, WordProgram, ZERO } from './wordProgram.ts';

export interface WordPlan {
  readonly program: WordProgram;
  /** The slot of each input, in `inputNets` order. */
  readonly inputSlots: Int32Array;
  /** Per reported net: references (wordProgram.ts) to its "at VDD" and "floating" words. */
  readonly high: Int32Array;
  readonly floating: Int32Array;
  /** The slot whose bits are the vectors the scalar engine must solve. */
  readonly fallback: number;
  /** The reference to each needed net's "at VDD" word (for expected functions). */
  readonly netSlots: Int32Array;
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
  for (const { controls } of tables.shapes)
    for (let i = 0; i < controls.length; i++) needed[controls[i]!] = 1;
  const program = new WordProgram();
  const known = new Uint8Array(c.netCount);
  const netSlots = new Int32Array(c.netCount);
  const floating = new Int32Array(c.netCount);
  for (let n = 0; n < c.netCount; n++) {
    const v = c.railVolts[n]!;
    if (Number.isNaN(v)) continue;
    netSlots[n] = v === c.tech.vdd && v > 0 ? ONES : ZERO;
    known[n] = 1;
  }
  const inputSlots = Int32Array.from(c.inputNets, (n) => ((known[n] = 1), (netSlots[n] = program.slot())));
  const fallback = program.slot();
  const leaves = new LeafCache(c, reported);
  for (const shape of tables.shapes) {
    const controls = new Int32Array(shape.controls.length);
    for (let i = 0; i < controls.length; i++) {
      const n = shape.controls[i]!;
      if (known[n] !== 1) return null; // a gate no group or input drives
      controls[i] = netSlots[n]!;
    }
    const table = tables.binary(shape.index);
    if (table.kind === 'none') return null;
    if (program.full) return null; // past MAX_WORD_SLOTS: the engine sweeps instead
    program.orInto(fallback, program.fromLeaves(leaves.fallback(table), controls));
    for (let i = 0; i < shape.nets.length; i++) {
      const n = shape.nets[i]!;
      if (needed[n] !== 1) continue;
      if (program.full) return null;
      netSlots[n] = program.fromLeaves(leaves.level(table, i, LEVEL_1), controls);
      floating[n] = program.fromLeaves(leaves.level(table, i, LEVEL_Z), controls);
      known[n] = 1;
    }
  }
  if (wanted.some((n) => known[n] !== 1)) return null;
  const high = Int32Array.from(wanted, (n) => netSlots[n]!);
  const float = Int32Array.from(wanted, (n) => floating[n]!);
  return { program, inputSlots, high, floating: float, fallback, netSlots };
}

/**
 * The leaves of each table's functions, worked out once per table: groups identical up to renaming
 * share one table (core/tables), and so their leaves. A group's fallback also depends on which of
 * its nets are reported, so those leaves are kept per pattern of reported positions.
 */
class LeafCache {
  private readonly levels = new WeakMap<GroupTable['states'], Map<number, Int32Array>>();
  private readonly fallbacks = new WeakMap<GroupTable['states'], Map<string, Int32Array>>();

  constructor(
    private readonly c: CompiledNetlist,
    private readonly reported: Uint8Array,
  ) {}

  level(table: GroupTable, i: number, level: number): Int32Array {
    return remembered(this.levels, table, 4 * i + level, () => levelLeaves(table, i, level));
  }

  fallback(table: GroupTable): Int32Array {
    let pattern = '';
    const { nets } = table.shape;
    for (let i = 0; i < nets.length; i++) pattern += this.reported[nets[i]!] === 1 ? '1' : '0';
    return remembered(this.fallbacks, table, pattern, () => fallbackLeaves(this.c, table, this.reported));
  }
}

function remembered<K>(
  cache: WeakMap<GroupTable['states'], Map<K, Int32Array>>,
  table: GroupTable,
  key: K,
  make: () => Int32Array,
): Int32Array {
  let byKey = cache.get(table.states);
  if (byKey === undefined) cache.set(table.states, (byKey = new Map()));
  let leaves = byKey.get(key);
  if (leaves === undefined) byKey.set(key, (leaves = make()));
  return leaves;
}

/** Per entry, -1 where net position i of the group is at `level` (the table's level bits). */
function levelLeaves(table: GroupTable, i: number, level: number): Int32Array {
  const { entries, states, shape } = table;
  const width = shape.nets.length;
  const mask = STATE_LEVEL;
  const leaves = new Int32Array(entries);
  for (let e = 0; e < entries; e++) leaves[e] = (states[e * width + i]! & mask) === level ? -1 : 0;
  return leaves;
}

/** Per entry, -1 where the scalar engine must solve the vector: a current, or a net not quiet. */
function fallbackLeaves(c: CompiledNetlist, table: GroupTable, reported: Uint8Array): Int32Array {
  const quiet = quietNets(c, table, reported);
  const leaves = new Int32Array(table.entries);
  for (let e = 0; e < table.entries; e++) leaves[e] = table.current[e] !== 0 || !quiet(e) ? -1 : 0;
  return leaves;
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
  // Read once: the loop below runs for every entry of every group.
  const [degraded, exactBit, levelMask, levelZ, vdd] = [
    FLAG_DEGRADED,
    STATE_EXACT,
    STATE_LEVEL,
    LEVEL_Z,
    c.tech.vdd,
  ];
  return (e) => {
    for (let i = 0; i < width; i++) {
      const n = shape.nets[i]!;
      const at = e * width + i;
      const flag = flags[at]!;
      const exact = (states[at]! & exactBit) !== 0;
      const seen = observed[n] === 1;
      if ((flag & ~degraded) !== 0 || (seen && (flag !== 0 || !exact))) return false;
      const v = volts[at]!;
      const floatingUnknown = (states[at]! & levelMask) === levelZ && Number.isNaN(v);
      // A report writes 0 V for a 0 level: -0 would not read back as plain (Object.is).
      const plain = exact && (Object.is(v, 0) || v === vdd);
      if (reported[n] === 1 && !plain && !floatingUnknown) return false;
    }
    return true;
  };
}
