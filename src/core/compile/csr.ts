// Indexes here are in range by construction (compiled-netlist and per-net arrays), so `!` marks them (no run-time cost).
/** Compressed sparse rows: the items of row r are items[start[r] .. start[r+1]). */
export interface Csr {
  readonly start: Int32Array;
  readonly items: Int32Array;
}

/**
 * Builds rows from parallel lists: entry i puts items[i] in row rows[i]. Items keep their list order
 * within a row. Two passes over flat arrays, so building a netlist's adjacency allocates no tuples.
 */
export function csrFrom(rowCount: number, rows: ArrayLike<number>, items: ArrayLike<number>): Csr {
  const start = new Int32Array(rowCount + 1);
  for (let i = 0; i < rows.length; i++) start[rows[i]! + 1]!++;
  for (let r = 0; r < rowCount; r++) start[r + 1]! += start[r]!;
  const fill = start.slice(0, rowCount);
  const out = new Int32Array(rows.length);
  for (let i = 0; i < rows.length; i++) out[fill[rows[i]!]!++] = items[i]!;
  return { start, items: out };
}

/** Builds rows from (row, item) pairs; items keep their pair order within a row. */
export function csr(rowCount: number, pairs: readonly (readonly [number, number])[]): Csr {
  return csrFrom(
    rowCount,
    pairs.map((p) => p[0]),
    pairs.map((p) => p[1]),
  );
}
