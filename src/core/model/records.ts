/**
 * Records keyed by names the user typed. A net may be called `__proto__`, `constructor` or
 * `toString`: on a plain object such a key reads the prototype's member when absent, and
 * assigning `__proto__` replaces the prototype instead of storing a value. Records made here have
 * no prototype, and reads go through `own`, so every name is just a name.
 */

/** An empty record with no prototype. */
export function nameRecord<V>(): Record<string, V> {
  return Object.create(null) as Record<string, V>;
}

/** A prototype-free record from [name, value] pairs (later pairs win). */
export function recordOf<V>(entries: Iterable<readonly [string, V]>): Record<string, V> {
  const out = nameRecord<V>();
  for (const [k, v] of entries) out[k] = v;
  return out;
}

/** The record's own value for `name`, never an inherited member. */
export function own<V>(record: Readonly<Record<string, V>>, name: string): V | undefined {
  return Object.hasOwn(record, name) ? record[name] : undefined;
}
