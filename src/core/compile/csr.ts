/** Compressed sparse rows: the items of row r are items[start[r] .. start[r+1]). */
export interface Csr {
  readonly start: Int32Array;
  readonly items: Int32Array;
}

/** Builds rows from (row, item) pairs; items keep their pair order within a row. */
export function csr(rows: number, pairs: readonly (readonly [number, number])[]): Csr {
  const start = new Int32Array(rows + 1);
  for (const [r] of pairs) start[r + 1]++;
  for (let r = 0; r < rows; r++) start[r + 1] += start[r];
  const fill = start.slice(0, rows);
  const items = new Int32Array(pairs.length);
  for (const [r, item] of pairs) items[fill[r]++] = item;
  return { start, items };
}
