import { FLAG_CONTENTION, FLAG_DEGRADED, FLAG_STATES, LEVEL_0, LEVEL_1, LEVEL_Z } from '../solver/levels.ts';
import { STATE_EXACT, STATE_LEVEL, type GroupTable } from '../tables/table.ts';
import type { Cnf } from './cnf.ts';
import type { GroupContext, GroupEncoding, LevelLits, RailLits } from './literals.ts';

/**
 * A group with a table: each literal a later group or a property reads is the function of the
 * controls that the table gives, entry by entry (docs/semantics.md §10). The controls read as "at
 * VDD" (their `high` literal); a vector where some control is neither exactly at VDD nor at 0 V is
 * outside the table and makes the group's `unknown` literal true.
 */
export function encodeTabled(cnf: Cnf, table: GroupTable, context: GroupContext): GroupEncoding {
  const { shape } = table;
  const controls = Array.from(shape.controls, (n) => context.rail(n));
  const bits = controls.map((r) => r.high);
  const unknown = cnf.or(controls.map((r) => cnf.and([-r.high, -r.low])));
  const width = shape.nets.length;
  const column = (test: (state: number, flags: number) => boolean, i: number): number => {
    const truth = new Uint8Array(table.entries);
    for (let e = 0; e < table.entries; e++)
      truth[e] = test(table.states[e * width + i]!, table.flags[e * width + i]!) ? 1 : 0;
    return cnf.truthTable(bits, truth);
  };
  const rails = new Map<number, RailLits>();
  const levels = new Map<number, LevelLits>();
  shape.nets.forEach((n, i) => {
    if (context.needsRail(n)) {
      rails.set(n, {
        high: column((s) => (s & STATE_LEVEL) === LEVEL_1 && (s & STATE_EXACT) !== 0, i),
        low: column((s) => (s & STATE_LEVEL) === LEVEL_0 && (s & STATE_EXACT) !== 0, i),
      });
    }
    if (context.needsLevel(n)) {
      levels.set(n, {
        l0: column((s) => (s & STATE_LEVEL) === LEVEL_0, i),
        l1: column((s) => (s & STATE_LEVEL) === LEVEL_1, i),
        lz: column((s) => (s & STATE_LEVEL) === LEVEL_Z, i),
        degraded: column((_, f) => (f & FLAG_DEGRADED) !== 0, i),
      });
    }
  });
  const anyNet = (test: (flags: number) => boolean): Uint8Array =>
    Uint8Array.from({ length: table.entries }, (_, e) => {
      for (let i = 0; i < width; i++) if (test(table.flags[e * width + i]!)) return 1;
      return 0;
    });
  return {
    rails,
    levels,
    unknown,
    current: cnf.truthTable(bits, table.current),
    contention: cnf.truthTable(
      bits,
      anyNet((f) => (f & FLAG_CONTENTION) !== 0),
    ),
    blocker: null,
    storedState: cnf.truthTable(
      bits,
      anyNet((f) => (f & FLAG_STATES) !== 0),
    ),
    storedNets: storedNets(table, context),
  };
}

/** The nets some entry of the table leaves holding stored state. */
function storedNets(table: GroupTable, context: GroupContext): string[] {
  const width = table.shape.nets.length;
  return Array.from(table.shape.nets, (n, i) => {
    for (let e = 0; e < table.entries; e++)
      if (table.flags[e * width + i]! & FLAG_STATES) return [context.name(n)];
    return [];
  }).flat();
}
